import type { NextConfig } from "next";
import { distDirOf } from "./lib/dist-dir";
import { isLocalUploadService, photoImagePatterns } from "./lib/uploads/hosts";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  distDir: distDirOf(process.env),
  reactStrictMode: true,
  experimental: {
    // forbidden() and forbidden.tsx render our 403 page.
    authInterrupts: true,
    // integrity="sha256-…" on every script file Next puts in a page; inline scripts are hashed
    // into prerendered pages' CSP by proxy.ts (lib/csp/prerendered-pages.ts).
    sri: { algorithm: "sha256" },
  },
  // esbuild bundles the inspection run's service worker at build time (app/serwist/[path]/route.ts).
  serverExternalPackages: ["@node-rs/argon2", "mysql2", "esbuild"],
  images: {
    // Photos come from the upload service's file host only (lib/uploads/hosts.ts).
    remotePatterns: photoImagePatterns(process.env),
    // Next refuses loopback image hosts (an SSRF guard); the local fake is one, production never is.
    dangerouslyAllowLocalIP: isLocalUploadService(process.env),
  },
  async headers() {
    const https = (process.env.APP_URL ?? "").startsWith("https://");
    const common = [
      { key: "X-Content-Type-Options", value: "nosniff" },
      { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
      { key: "X-Frame-Options", value: "DENY" },
      { key: "Permissions-Policy", value: "camera=(self), geolocation=(), microphone=()" },
      ...(https ? [{ key: "Strict-Transport-Security", value: "max-age=63072000; includeSubDomains" }] : []),
    ];
    return [
      { source: "/:path*", headers: common },
      // Signed-in pages and the API carry personal data: never cache them anywhere.
      {
        source: "/(dashboard|presses|inspections|bookings|shop|account|api)(.*)",
        headers: [{ key: "Cache-Control", value: "no-store" }],
      },
    ];
  },
};

export default nextConfig;
