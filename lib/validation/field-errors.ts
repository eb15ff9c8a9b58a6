/**
 * The one way zod issues become `fieldErrors` (API 400s and action states alike). Keys come from
 * input — an unknown key such as "constructor" or "__proto__" is named in its own entry — so they
 * are collected in a Map and only then turned into a plain object with Object.fromEntries, which
 * defines own properties: no inherited name (toString, hasOwnProperty…) is ever read or written.
 * Works for issues from classic zod and zod/mini (the same core issue shape).
 */
export type FieldErrors = Record<string, string[]>;

type Issue = { code?: string; path: readonly PropertyKey[]; message: string; keys?: readonly string[] };

/** Messages by dotted path ("spec.boreMm"); issues about the whole input go under `rootKey`. */
export function fieldErrorsOf(issues: readonly Issue[], rootKey = "form"): FieldErrors {
  const byKey = new Map<string, string[]>();
  const add = (path: readonly PropertyKey[], message: string): void => {
    const key = path.map(String).join(".") || rootKey;
    const list = byKey.get(key);
    if (list) list.push(message);
    else byKey.set(key, [message]);
  };
  for (const issue of issues) {
    if (issue.code === "unrecognized_keys" && issue.keys?.length) {
      for (const key of issue.keys) add([...issue.path, key], `Unknown field "${key}".`);
    } else {
      add(issue.path, issue.message);
    }
  }
  return Object.fromEntries(byKey);
}

/** Every message, flattened, for pages that list them rather than mark fields. */
export function allMessages(errors: FieldErrors): string[] {
  return Object.values(errors).flat();
}
