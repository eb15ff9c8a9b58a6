// fast-check arbitraries for fuzzing JSON request bodies: values of a schema's shape (from the zod
// schema's JSON Schema, so a changed schema changes what is generated), and hostile variants of
// them — prototype keys at every level, SQL metacharacters, CR/LF, huge strings, deep nesting,
// wrong types, unicode edge cases, numbers JSON.stringify cannot write (-0, 1e999, huge ints).
import fc from "fast-check";
import { z } from "zod";

/** A JSON token written verbatim by toJsonText (numbers JSON.stringify would rewrite or refuse). */
export class RawJson {
  constructor(readonly text: string) {}
  /** fast-check prints counterexamples with this (a 5000-deep value would overflow its printer). */
  [fc.toStringMethod](): string {
    return this.text.length > 60 ? `RawJson(${JSON.stringify(this.text.slice(0, 30))}… ${this.text.length} chars)` : `RawJson(${this.text})`;
  }
}

/** JSON text of a value that may hold RawJson tokens and own `__proto__` keys; no recursion limit worth naming (bodies nest ≤ 5000). */
export function toJsonText(value: unknown): string {
  if (value instanceof RawJson) return value.text;
  if (Array.isArray(value)) return `[${value.map(toJsonText).join(",")}]`;
  if (value !== null && typeof value === "object") {
    return `{${Object.keys(value).map((k) => `${JSON.stringify(k)}:${toJsonText((value as Record<string, unknown>)[k])}`).join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}

/** Sets an own, enumerable property even for `__proto__` (plain assignment would change the prototype). */
function setOwn(target: Record<string, unknown>, key: string, value: unknown): void {
  Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
}

function clone(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(clone);
  if (value !== null && typeof value === "object" && !(value instanceof RawJson)) {
    const out: Record<string, unknown> = {};
    for (const k of Object.keys(value)) setOwn(out, k, clone((value as Record<string, unknown>)[k]));
    return out;
  }
  return value;
}

// --- text ---------------------------------------------------------------------------------------

/** Pieces that break naive SQL, e-mail headers, HTML, templates or unicode handling. */
export const HOSTILE_PIECES = [
  "'", '"', ";--", "\\", "%", "_", "\u0000", "\r", "\n", "\r\n", "`", "/*", "*/", "' OR '1'='1", "\\'",
  "\r\nBcc: victim@example.com", "\nSubject: injected", "<script>alert(1)</script>", "&amp;", "${x}", "{{x}}",
  "\u202e", "\u200f", "\u0627\u0644\u0639\u0631\u0628\u064a\u0629", "e\u0301", "\u0301", "\ud83d\ude00", "\ud835\udd18", "\ufeff", "\u2028", "\u00a0",
  "\u0085", " ", "\t",
];
/** Lone surrogates: not text at all, refused by every JSON route (lib/http.ts), so only in hostile values. */
const LONE_SURROGATES = ["\ud800", "\udfff", "a\ud83d"];

const hostileUnit = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...HOSTILE_PIECES) },
  { weight: 3, arbitrary: fc.string({ unit: "grapheme", minLength: 1, maxLength: 1 }) },
  { weight: 1, arbitrary: fc.string({ unit: "binary", minLength: 1, maxLength: 1 }) },
  { weight: 3, arbitrary: fc.constantFrom("a", "b", "Z", "0", "7", "-") },
);

/** Text of about `min`..`max` UTF-16 units, mostly hostile pieces; now and then exactly at the limit or one past it. */
function textArb(min: number, max: number | undefined): fc.Arbitrary<string> {
  const cap = Math.min(max ?? 300, 300);
  const short = fc.array(hostileUnit, { minLength: min, maxLength: Math.max(min, Math.min(cap, 12)) }).map((a) => a.join(""));
  if (max === undefined) return short;
  const atLimit = fc.tuple(fc.constantFrom(max, max + 1), fc.constantFrom("x", "'", "\u00e9", "%")).map(([n, c]) => c.repeat(n));
  return fc.oneof({ weight: 6, arbitrary: short }, { weight: 1, arbitrary: atLimit });
}

// --- JSON Schema → arbitrary --------------------------------------------------------------------

export type JsonSchema = {
  type?: string;
  properties?: Record<string, JsonSchema>;
  required?: string[];
  items?: JsonSchema;
  minItems?: number;
  maxItems?: number;
  minLength?: number;
  maxLength?: number;
  pattern?: string;
  format?: string;
  enum?: unknown[];
  const?: unknown;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
};

/** The JSON Schema of what a zod schema accepts (its input side; refinements are not represented). */
export function inputJsonSchema(schema: z.core.$ZodType): JsonSchema {
  return z.toJSONSchema(schema, { io: "input", unrepresentable: "any" }) as JsonSchema;
}

/** A calendar date up to yesterday (records of work done cannot be in the future). */
export const pastDateArb = fc.date({ min: new Date("1990-01-01T00:00:00Z"), max: new Date(Date.now() - 86_400_000), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10));

const dateArb = fc.date({ min: new Date("1990-01-01T00:00:00Z"), max: new Date("2090-12-31T00:00:00Z"), noInvalidDate: true });

function numberArb(s: JsonSchema): fc.Arbitrary<number> {
  const min = s.minimum ?? s.exclusiveMinimum ?? -1e6;
  const max = s.maximum ?? s.exclusiveMaximum ?? 1e6;
  if (s.type === "integer") return fc.integer({ min: Math.max(Math.ceil(min), Number.MIN_SAFE_INTEGER), max: Math.min(Math.floor(max), Number.MAX_SAFE_INTEGER) });
  const inside = fc.double({ min, max, noNaN: true, noDefaultInfinity: true, minExcluded: s.exclusiveMinimum !== undefined, maxExcluded: s.exclusiveMaximum !== undefined });
  const edges = [s.minimum, s.maximum, s.exclusiveMinimum, s.exclusiveMaximum, 0, 1].filter((v): v is number => v !== undefined);
  return fc.oneof({ weight: 4, arbitrary: inside }, { weight: 1, arbitrary: fc.constantFrom(...edges) });
}

function stringArb(s: JsonSchema): fc.Arbitrary<string> {
  if (s.format === "date") return dateArb.map((d) => d.toISOString().slice(0, 10));
  if (s.format === "date-time") return dateArb.map((d) => d.toISOString());
  if (s.format === "email") return fc.emailAddress();
  if (s.pattern) return fc.stringMatching(new RegExp(s.pattern));
  return textArb(s.minLength ?? 0, s.maxLength);
}

/** Values of the schema's shape (every optional key sometimes absent), with hostile text inside its limits. */
export function fromJsonSchema(s: JsonSchema): fc.Arbitrary<unknown> {
  if ("const" in s) return fc.constant(s.const);
  if (s.enum) return fc.constantFrom(...s.enum);
  const alternatives = s.anyOf ?? s.oneOf;
  if (alternatives) return fc.oneof(...alternatives.map(fromJsonSchema));
  switch (s.type) {
    case "object": {
      if (!s.properties) return fc.constant({});
      const keys = Object.keys(s.properties);
      const required = keys.filter((k) => s.required?.includes(k));
      return fc.record(Object.fromEntries(keys.map((k) => [k, fromJsonSchema(s.properties![k]!)])), { requiredKeys: required });
    }
    case "array": {
      const minLength = s.minItems ?? 0;
      return fc.array(fromJsonSchema(s.items ?? {}), { minLength, maxLength: Math.min(s.maxItems ?? minLength + 4, minLength + 4) });
    }
    case "string":
      return stringArb(s);
    case "number":
    case "integer":
      return numberArb(s);
    case "boolean":
      return fc.boolean();
    case "null":
      return fc.constant(null);
    default:
      return fc.jsonValue({ maxDepth: 2 });
  }
}

export const fromZod = (schema: z.core.$ZodType): fc.Arbitrary<unknown> => fromJsonSchema(inputJsonSchema(schema));

// --- hostile variants ---------------------------------------------------------------------------

export const PROTOTYPE_KEYS = ["__proto__", "constructor", "prototype"] as const;
const ODD_KEYS = [...PROTOTYPE_KEYS, "toString", "hasOwnProperty", "valueOf", "", "shopId", "id", "role", "signedBy", "userId", "createdAt"];

/** Nesting `depth` arrays or objects deep, as JSON text (under the body size limit). */
function nested(depth: number, kind: "array" | "object"): RawJson {
  return new RawJson(kind === "array" ? `${"[".repeat(depth)}1${"]".repeat(depth)}` : `${'{"a":'.repeat(depth)}1${"}".repeat(depth)}`);
}

function pollutionAttempt(key: (typeof PROTOTYPE_KEYS)[number]): unknown {
  const out: Record<string, unknown> = {};
  setOwn(out, key, key === "constructor" ? { prototype: { polluted: "yes" } } : { polluted: "yes" });
  return out;
}

/** Text as a form field can carry it (no lone surrogates: a form is sent as UTF-8): breakers and huge strings. */
export const hostileFormText: fc.Arbitrary<string> = fc.oneof(
  textArb(0, 120),
  fc.array(fc.constantFrom(...HOSTILE_PIECES), { minLength: 1, maxLength: 20 }).map((a) => a.join("")),
  fc.constantFrom(101, 1_001, 20_001).chain((n) => fc.constantFrom("x", "\u00e9", "\ud83d\ude00", "'").map((c) => c.repeat(n))),
);

export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  // Text: SQL, header and markup breakers; huge strings (over every field limit, one over the body limit).
  fc.constantFrom(...HOSTILE_PIECES, ...LONE_SURROGATES),
  fc.array(fc.constantFrom(...HOSTILE_PIECES, ...LONE_SURROGATES), { minLength: 1, maxLength: 20 }).map((a) => a.join("")),
  fc.constantFrom(1_001, 4_001, 20_000, 70_000).chain((n) => fc.constantFrom("x", "\u00e9", "\ud83d\ude00", "'").map((c) => c.repeat(n))),
  // Numbers and number-like strings.
  fc.constantFrom<unknown>(
    new RawJson("-0"), new RawJson("1e308"), new RawJson("-1e308"), new RawJson("1e999"), new RawJson("-1e999"),
    new RawJson("123456789012345678901234567890"), new RawJson("0.1e-400"), new RawJson("9007199254740993"),
    "NaN", "Infinity", "-Infinity", "1e308", "0x10", "12", "", " ", -1, 0, 1.5, Number.MAX_SAFE_INTEGER + 2, Number.MIN_VALUE, -Number.MAX_VALUE,
  ),
  // Wrong types.
  fc.constantFrom<unknown>(null, true, false, [], {}, [1, "a"], { a: 1 }, [[[]]]),
  // Deep nesting.
  fc.tuple(fc.constantFrom(1_000, 5_000), fc.constantFrom("array" as const, "object" as const)).map(([d, k]) => nested(d, k)),
  // Prototype pollution.
  fc.constantFrom(...PROTOTYPE_KEYS).map(pollutionAttempt),
);

type Path = (string | number)[];

/** Every path in a JSON value (the root is []), objects and arrays as well as leaves. */
function paths(value: unknown, at: Path = []): Path[] {
  const out: Path[] = [at];
  if (Array.isArray(value)) value.forEach((v, i) => out.push(...paths(v, [...at, i])));
  else if (value !== null && typeof value === "object" && !(value instanceof RawJson)) {
    for (const k of Object.keys(value)) out.push(...paths((value as Record<string, unknown>)[k], [...at, k]));
  }
  return out;
}

function at(value: unknown, path: Path): unknown {
  return path.reduce<unknown>((v, k) => (v as Record<string | number, unknown>)[k], value);
}

type Mutation = { pick: number; op: "replace" | "add-key" | "drop"; key: string; value: unknown };

const mutationArb: fc.Arbitrary<Mutation> = fc.record({
  pick: fc.nat(),
  op: fc.constantFrom("replace" as const, "replace" as const, "add-key" as const, "drop" as const),
  key: fc.constantFrom(...ODD_KEYS),
  value: hostileValue,
});

function applyMutation(body: unknown, m: Mutation): unknown {
  const all = paths(body);
  const path = all[m.pick % all.length]!;
  if (m.op === "replace" && path.length === 0) return m.value;
  const parentPath = m.op === "add-key" ? path : path.slice(0, -1);
  const target = at(body, parentPath);
  if (target === null || typeof target !== "object" || target instanceof RawJson) return m.op === "add-key" ? body : m.value;
  const key = m.op === "add-key" ? m.key : path[path.length - 1]!;
  if (Array.isArray(target)) {
    if (m.op === "drop") target.splice(Number(key), 1);
    else if (typeof key === "number") target[key] = m.value;
    else target.push(m.value);
  } else if (m.op === "drop") delete (target as Record<string, unknown>)[String(key)];
  else setOwn(target as Record<string, unknown>, String(key), m.value);
  return body;
}

/** One to three hostile mutations of a well-shaped body. */
export function hostileVariant(valid: fc.Arbitrary<unknown>): fc.Arbitrary<unknown> {
  return fc.tuple(valid, fc.array(mutationArb, { minLength: 1, maxLength: 3 })).map(([body, ms]) => ms.reduce(applyMutation, clone(body)));
}

/** Whole bodies that are not a JSON object at all, sent as bytes. */
export const RAW_BODIES: { name: string; bytes: string | Uint8Array<ArrayBuffer> }[] = [
  { name: "empty", bytes: "" },
  { name: "null", bytes: "null" },
  { name: "an array", bytes: "[]" },
  { name: "a string", bytes: '"{}"' },
  { name: "truncated", bytes: '{"a":' },
  { name: "trailing garbage", bytes: "{} x" },
  { name: "invalid UTF-8", bytes: new Uint8Array([0x7b, 0x22, 0xff, 0xfe, 0x22, 0x3a, 0x31, 0x7d]) },
  { name: "a UTF-8 byte-order mark", bytes: "\ufeff{}" },
  { name: "duplicate __proto__ keys", bytes: '{"__proto__":{"polluted":"yes"},"__proto__":{"polluted":"yes"}}' },
  { name: "30 000 nested arrays (under the size limit)", bytes: "[".repeat(30_000) + "]".repeat(30_000) },
  { name: "100 000 nested arrays (over the size limit)", bytes: "[".repeat(100_000) + "]".repeat(100_000) },
  { name: "a 1 MB string", bytes: `{"a":"${"x".repeat(1_000_000)}"}` },
];
