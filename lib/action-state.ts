/** The one shape every server action returns to its form. Never carries secrets or passwords. */
export type ActionState = {
  ok: boolean;
  message?: string;
  fieldErrors?: Record<string, string[] | undefined>;
  /** Echo of non-secret fields so the form keeps what the user typed. */
  values?: Record<string, string>;
};

export const initialActionState: ActionState = { ok: false };

/** Plain string values of a form, without the fields named in `secret`. */
export function echoValues(form: FormData, secret: readonly string[] = []): Record<string, string> {
  // Keys are the client's: Object.fromEntries defines own properties, so "__proto__" stays a key.
  return Object.fromEntries(
    [...form.entries()].filter((e): e is [string, string] => typeof e[1] === "string" && !secret.includes(e[0]) && !e[0].startsWith("$ACTION")),
  );
}
