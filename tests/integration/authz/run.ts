// Shared by the matrix and CSRF tests: finding every route and action on disk, loading a route's
// handlers, and sending one Call to a handler the way a browser on the app's own page would.
import { readFileSync } from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";
import { projectFiles, ROOT } from "../../app-files";
import type { Call, Method, Outcome } from "./matrix";

export const ORIGIN = "http://127.0.0.1:3000";
const HTTP_METHODS = ["GET", "HEAD", "OPTIONS", "POST", "PUT", "PATCH", "DELETE"] as const;

/** Every exported function name of every "use server" file under app/ and lib/. */
export function serverActionExports(): { file: string; name: string }[] {
  const files = [...projectFiles("app"), ...projectFiles("lib")].filter((f) => /\.tsx?$/.test(f));
  return files.flatMap((file) => {
    const text = readFileSync(path.join(ROOT, file), "utf8");
    if (!/^\s*["']use server["']/.test(text.replace(/^(\s*\/\/.*\n|\s*\/\*[\s\S]*?\*\/\s*\n)*/, ""))) return [];
    return [...text.matchAll(/^export\s+(?:async\s+function|function|const|let)\s+([A-Za-z0-9_$]+)/gm)].map((m) => ({ file, name: m[1]! }));
  });
}

type Handler = (req: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
const modules = import.meta.glob<Record<string, unknown>>("/app/**/route.ts");

/** The handlers a route file exports, by HTTP method. */
export async function routeHandlers(file: string): Promise<Partial<Record<Method | "HEAD" | "OPTIONS", Handler>>> {
  const load = modules[`/${file}`];
  if (!load) throw new Error(`route not found by import.meta.glob: ${file}`);
  const mod = await load();
  return Object.fromEntries(HTTP_METHODS.filter((m) => typeof mod[m] === "function").map((m) => [m, mod[m] as Handler]));
}

/** Sends `call` to the handler; mutating requests carry the app's own Origin unless `headers` override it. */
export async function send(file: string, method: Method, call: Call, cookie: string | null, headers: Record<string, string> = {}): Promise<Response> {
  const handler = (await routeHandlers(file))[method];
  if (!handler) throw new Error(`${file} exports no ${method}`);
  const base: Record<string, string> = { host: "127.0.0.1:3000" };
  if (method !== "GET") base.origin = ORIGIN;
  const body = call.raw ?? (call.body === undefined ? undefined : JSON.stringify(call.body));
  if (body !== undefined) base["content-type"] = "application/json";
  if (cookie) base.cookie = cookie;
  const all = Object.fromEntries(Object.entries({ ...base, ...call.headers, ...headers }).filter(([, v]) => v !== ""));
  const req = new NextRequest(`${ORIGIN}${call.path}`, { method, headers: all, body });
  return handler(req, { params: Promise.resolve(call.params ?? {}) });
}

export function outcomeOf(status: number): Outcome | `${number}` {
  return status >= 200 && status < 300 ? "2xx" : (String(status) as `${number}`);
}
