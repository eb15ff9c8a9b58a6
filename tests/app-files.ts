// The app's routes and pages as files on disk, for tests that must cover every one of them
// (tests/integration/authz, tests/e2e/headers.test.ts): a new file without a test row fails there.
import { readdirSync } from "node:fs";
import path from "node:path";

export const ROOT = path.resolve(__dirname, "..");

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    return e.isDirectory() ? (e.name === "node_modules" ? [] : walk(full)) : [full];
  });
}

/** Files under `dir` (relative to the project, "/"-separated), sorted. */
export function projectFiles(dir: string): string[] {
  return walk(path.join(ROOT, dir))
    .map((f) => path.relative(ROOT, f).split(path.sep).join("/"))
    .sort();
}

/** Every app/**\/route.ts. */
export const routeFiles = (): string[] => projectFiles("app").filter((f) => f.endsWith("/route.ts"));

/** Every app/**\/page.tsx. */
export const pageFiles = (): string[] => projectFiles("app").filter((f) => f.endsWith("/page.tsx"));
