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
  const out: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (typeof value === "string" && !secret.includes(key) && !key.startsWith("$ACTION")) out[key] = value;
  }
  return out;
}
