/**
 * The message to the owner of an address someone tried to sign up with again (hardening #6).
 * The sign-up form answers the same way whether or not an address has an account; only the
 * address's owner learns about the attempt, here. Written in our own words; no shop is involved
 * (the attempt concerns the person's account), so the message names the account holder instead.
 */
const ESCAPES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };
const escapeHtml = (text: string): string => text.replace(/[&<>"']/g, (c) => ESCAPES[c] ?? c);

/**
 * `signInUrl` comes from the configured APP_URL only, never from a request's Host header (which a
 * caller could set to lead the owner to another site); without it the message names no link.
 */
export function signUpAttemptEmail(input: { displayName: string; signInUrl: string | null }): { subject: string; text: string; html: string } {
  const subject = "Someone tried to create a Presswright account with your address";
  const text = [
    `Hello ${input.displayName},`,
    "",
    "Someone just tried to create a new Presswright account with this e-mail address. Your address already has an account, so nothing was created and nothing about your account changed.",
    "",
    input.signInUrl ? `If it was you, sign in instead: ${input.signInUrl}` : "If it was you, sign in instead with your existing password.",
    "If it was not you, you can ignore this message.",
  ].join("\n");
  const html = [
    `<p>Hello ${escapeHtml(input.displayName)},</p>`,
    "<p>Someone just tried to create a new Presswright account with this e-mail address. Your address already has an account, so nothing was created and nothing about your account changed.</p>",
    input.signInUrl
      ? `<p>If it was you, <a href="${escapeHtml(input.signInUrl)}">sign in instead</a>.</p>`
      : "<p>If it was you, sign in instead with your existing password.</p>",
    "<p>If it was not you, you can ignore this message.</p>",
  ].join("\n");
  return { subject, text, html };
}
