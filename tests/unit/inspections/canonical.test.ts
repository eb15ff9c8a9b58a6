import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { canonicalJson } from "@/lib/inspections/canonical";

describe("canonical JSON (RFC 8785 rules)", () => {
  it("sorts keys by UTF-16 code units whatever the insertion order", () => {
    // RFC 8785 §3.2.3 sorting example (keys recalled from memory): "\r", "1", "\u0080", "\u00f6", "\u20ac", "😀", "\ufb33".
    const value = { "\u20ac": "Euro Sign", "\r": "Carriage Return", "\ufb33": "Hebrew Letter Dalet With Dagesh", "1": "One", "😀": "Emoji: Grinning Face", "\u0080": "Control", "\u00f6": "Latin Small Letter O With Diaeresis" };
    const keys = Object.keys(JSON.parse(canonicalJson(value)) as object);
    // JSON.parse puts the integer-like key "1" first in any case; check the order of the rest.
    expect(canonicalJson(value).indexOf('"\\r"')).toBeLessThan(canonicalJson(value).indexOf('"1"'));
    expect(keys.filter((k) => k !== "1")).toEqual(["\r", "\u0080", "\u00f6", "\u20ac", "😀", "\ufb33"]);
    expect(canonicalJson({ b: 1, a: { d: 2, c: 3 } })).toBe('{"a":{"c":3,"d":2},"b":1}');
  });

  it("formats numbers as ECMAScript does (RFC 8785 §3.2.2.3 / appendix B examples)", () => {
    // Values and expected texts from RFC 8785's number examples (recalled from memory).
    const cases: [number, string][] = [
      [0, "0"],
      [-0, "0"],
      [1e30, "1e+30"],
      [4.5, "4.5"],
      [0.002, "0.002"],
      [1e-7, "1e-7"],
      [333333333.3333333, "333333333.3333333"],
      [9007199254740992, "9007199254740992"],
      [1e21, "1e+21"],
      [1e20, "100000000000000000000"],
      [5e-324, "5e-324"],
    ];
    for (const [n, text] of cases) expect(canonicalJson(n)).toBe(text);
    expect(() => canonicalJson(Number.NaN)).toThrow();
    expect(() => canonicalJson(Number.POSITIVE_INFINITY)).toThrow();
  });

  it("keeps Unicode as it is (no normalisation: a changed byte changes the text) and refuses lone surrogates", () => {
    const composed = "Soudure fissurée";
    const decomposed = composed.normalize("NFD");
    expect(canonicalJson(composed)).not.toBe(canonicalJson(decomposed));
    expect(canonicalJson("€ 😀 \u0000")).toBe('"€ 😀 \\u0000"');
    expect(() => canonicalJson("\ud800")).toThrow();
    expect(() => canonicalJson({ note: "a\udc00b" })).toThrow();
  });

  it("drops undefined members and is stable under any key order (property)", () => {
    expect(canonicalJson({ a: undefined, b: null })).toBe('{"b":null}');
    fc.assert(
      fc.property(fc.dictionary(fc.string(), fc.oneof(fc.integer(), fc.double({ noNaN: true, noDefaultInfinity: true }), fc.string(), fc.boolean(), fc.constant(null))), (obj) => {
        const reversed = Object.fromEntries(Object.entries(obj).reverse());
        const text = canonicalJson(obj);
        expect(canonicalJson(reversed)).toBe(text);
        // Round trip: parsing the canonical text and canonicalising again changes nothing.
        expect(canonicalJson(JSON.parse(text) as never)).toBe(text);
      }),
    );
  });
});
