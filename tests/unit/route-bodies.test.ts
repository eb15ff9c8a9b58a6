import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT, routeFiles } from "../app-files";

// Every route reads its body through readJsonBody/readBodyText (lib/http.ts), which refuse a body
// over the limit before reading it whole: `req.json()`/`req.text()` would read any size.
describe("request bodies", () => {
  it("no route handler reads a body without the size limit", () => {
    const unbounded = routeFiles().filter((file) => /\b(req|request)\.(json|text|arrayBuffer|formData|blob)\(/.test(readFileSync(path.join(ROOT, file), "utf8")));
    expect(unbounded).toEqual([]);
  });
});
