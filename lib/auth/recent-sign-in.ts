/** Signing an inspection needs a sign-in at most this long ago (reliability-and-security.md: "within the last few minutes"). */
export const RECENT_SIGN_IN_MS = 15 * 60 * 1000;

/** Raised when an action needs a fresh sign-in (answered 401 with `reauthenticate: true`). */
export class ReauthRequiredError extends Error {
  constructor() {
    super("Signing is the record of evidence: sign in again first (your sign-in is more than 15 minutes old).");
    this.name = "ReauthRequiredError";
  }
}

export function assertRecentSignIn(signedInAt: Date, now = new Date()): void {
  if (now.getTime() - signedInAt.getTime() > RECENT_SIGN_IN_MS) throw new ReauthRequiredError();
}
