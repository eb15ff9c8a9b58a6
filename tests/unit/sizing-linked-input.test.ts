import { describe, expect, it } from "vitest";
import { linkedInput } from "@/components/sizing/linked-input";
import { sizingHref } from "@/components/sizing/links";
import { FULL_SIZING_INPUT } from "../fixtures/sizing-inputs";

const paramsOf = (href: string) => new URL(href, "http://x.invalid").searchParams;

describe("linkedInput (the sizing page's ?input=&name=)", () => {
  it("reads back what sizingHref wrote", () => {
    expect(linkedInput(paramsOf(sizingHref(FULL_SIZING_INPUT, " Shop press ")))).toEqual({ input: FULL_SIZING_INPUT, name: "Shop press" });
  });

  it("gives null for no input, broken JSON, an input the schema refuses or an over-long link", () => {
    expect(linkedInput(paramsOf("/sizing"))).toBeNull();
    expect(linkedInput(paramsOf("/sizing?input=%7Bnot-json"))).toBeNull();
    expect(linkedInput(paramsOf(`/sizing?input=${encodeURIComponent(JSON.stringify({ cylinders: { boreMm: -1 } }))}`))).toBeNull();
    expect(linkedInput(new URLSearchParams({ input: " ".repeat(20_001) }))).toBeNull();
  });

  it("cuts the name to 100 characters", () => {
    expect(linkedInput(paramsOf(sizingHref(FULL_SIZING_INPUT, "n".repeat(150))))?.name).toHaveLength(100);
  });
});
