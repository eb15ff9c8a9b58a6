import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT } from "../../app-files";

/** Every .ts/.tsx file under the folders that hold server code. */
function sources(dir: string): string[] {
  return readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((entry) => {
    const rel = path.join(dir, entry.name);
    if (entry.isDirectory()) return sources(rel);
    return /\.tsx?$/.test(entry.name) ? [rel] : [];
  });
}

// A prerendered public page's CSP lists the sha256 of the inline scripts of its build-time HTML
// (proxy.ts). Revalidating the root path or layout re-renders those pages at run time with other
// inline scripts, which the browser then refuses: the page stops working. lib/revalidate.ts has the
// one safe way to refresh every signed-in page.
describe("prerendered public pages", () => {
  it("are never revalidated through the root path or layout", () => {
    const offenders = ["app", "components", "lib"]
      .flatMap(sources)
      .filter((file) => /revalidatePath\(\s*["'`]\/["'`]/.test(readFileSync(path.join(ROOT, file), "utf8")));
    expect(offenders).toEqual([]);
  });
});
