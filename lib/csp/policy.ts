import { uploadCspSources } from "@/lib/uploads/hosts";

type Env = Record<string, string | undefined>;

/**
 * The one Content-Security-Policy of every page; only the script sources differ: a per-request
 * nonce (with 'strict-dynamic') for pages rendered per request, 'self' plus the hashes of the
 * page's own inline scripts for prerendered pages (lib/csp/prerendered-pages.ts).
 */
export function pagePolicy(scriptSources: string[], env: Env = process.env): string {
  const dev = env.NODE_ENV === "development";
  // Photos are served by, and uploaded straight from the browser to, the upload service.
  const uploads = uploadCspSources(env);
  return [
    "default-src 'self'",
    `script-src ${[...scriptSources, ...(dev ? ["'unsafe-eval'"] : [])].join(" ")}`,
    // Style attributes (charts, next/font) need inline styles; scripts stay nonce- or hash-only.
    "style-src 'self' 'unsafe-inline'",
    `img-src 'self' blob: data: ${uploads.img.join(" ")}`,
    "font-src 'self'",
    `connect-src 'self' ${uploads.connect.join(" ")}`,
    // The inspection run's service worker (app/sw.ts); 'strict-dynamic' would otherwise refuse it.
    "worker-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** Script sources of a page rendered for this request. */
export const nonceSources = (nonce: string): string[] => [`'self'`, `'nonce-${nonce}'`, "'strict-dynamic'"];

/** Script sources of a prerendered page: its files from this origin and exactly its inline scripts. */
export const hashSources = (hashes: string[]): string[] => ["'self'", ...hashes.map((h) => `'${h}'`)];
