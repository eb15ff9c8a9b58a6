/**
 * Canonical JSON for signed records, after RFC 8785 (JSON Canonicalization Scheme): object keys
 * sorted by UTF-16 code units, no whitespace, numbers as ECMAScript prints them (JSON.stringify
 * already does: shortest round-trip form, `1e+21`, `-0` → `0`), strings escaped as JSON.stringify
 * escapes them. Strings are not Unicode-normalised here — a changed byte must change the output;
 * input is normalised to NFC where it is written (lib/validation/inspection.ts).
 */
export type CanonicalValue = null | boolean | number | string | CanonicalValue[] | { [key: string]: CanonicalValue | undefined };

const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function canonicalJson(value: CanonicalValue): string {
  if (value === null || typeof value === "boolean") return JSON.stringify(value);
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new TypeError("Canonical JSON has no NaN or Infinity.");
    return JSON.stringify(value);
  }
  if (typeof value === "string") {
    if (LONE_SURROGATE.test(value)) throw new TypeError("Canonical JSON refuses lone surrogates.");
    return JSON.stringify(value);
  }
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  const keys = Object.keys(value)
    .filter((k) => value[k] !== undefined)
    // Default sort compares UTF-16 code units, which is what RFC 8785 §3.2.3 asks for.
    .sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(value[k] as CanonicalValue)}`).join(",")}}`;
}
