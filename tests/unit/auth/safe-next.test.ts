// safeNextPath (lib/auth/safe-next.ts): only paths that stay on our origin. The variants are the
// WHATWG URL parser's known lenient spots (backslash as slash, tab/CR/LF stripped, control
// characters) plus plain absolute and protocol-relative URLs; the browser test repeats the
// dangerous ones against the real sign-in flow.
import { describe, expect, it } from "vitest";
import { DEFAULT_NEXT_PATH, safeNextPath } from "@/lib/auth/safe-next";

describe("safeNextPath", () => {
  it.each([
    "/\\evil.example/x",
    "/\t/evil.example",
    "/\n/evil.example",
    "/\r\n/evil.example",
    "//evil.example",
    "///evil.example",
    "/\\\\evil.example",
    "\\\\evil.example",
    "/%5Cevil.example",
    "/%09/evil.example",
    "https://evil.example/",
    "https:evil.example",
    "javascript:alert(1)",
    "/\u0000/evil.example",
    "/\u007f/evil.example",
    "evil.example",
    "",
    "/" + "a".repeat(3000),
  ])("refuses %j", (raw) => {
    expect(safeNextPath(raw)).toBe(DEFAULT_NEXT_PATH);
  });

  it("refuses what is not a string", () => {
    expect(safeNextPath(undefined)).toBe(DEFAULT_NEXT_PATH);
    expect(safeNextPath(["/presses"])).toBe(DEFAULT_NEXT_PATH);
    expect(safeNextPath(null, "")).toBe("");
  });

  it.each([
    ["/presses", "/presses"],
    ["/presses/abc?tab=parts#history", "/presses/abc?tab=parts#history"],
    ["/presses/../account", "/account"],
    ["/a/%2F%2Fb", "/a/%2F%2Fb"],
  ])("follows %j as %j", (raw, expected) => {
    expect(safeNextPath(raw)).toBe(expected);
  });
});
