import { describe, expect, it } from "vitest";
import { parseIso4406 } from "@/lib/service/iso4406";

describe("parseIso4406", () => {
  it("accepts codes from published examples", () => {
    // Precision Filtration, "Understanding ISO Codes": 492/149/15 particles per mL → 16/14/11.
    expect(parseIso4406("16/14/11")).toEqual({ ok: true, code: [16, 14, 11] });
    // Womack Machine Supply, ISO cleanliness levels: targets 20/18/15 and 18/16/13.
    expect(parseIso4406(" 20/18/15 ")).toMatchObject({ ok: true });
    expect(parseIso4406("18/18/13")).toMatchObject({ ok: true });
  });
  it("refuses codes that increase with particle size (hydraulics-reference trap 11)", () => {
    expect(parseIso4406("16/18/13")).toMatchObject({ ok: false });
    expect(parseIso4406("18/16/17")).toMatchObject({ ok: false });
  });
  it("refuses malformed text and numbers off the scale", () => {
    for (const bad of ["18/16", "18-16-13", "a/b/c", "18/16/13/", "30/16/13"]) expect(parseIso4406(bad).ok).toBe(false);
  });
});
