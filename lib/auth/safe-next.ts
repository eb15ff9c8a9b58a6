/**
 * The one check for a `next` path followed after sign-in (or any other redirect back into the
 * app). A value is followed only when, resolved with the URL parser against our own origin, it
 * stays on that origin. Backslashes and control characters (raw or percent-encoded) are refused
 * outright: browsers read "/\evil.example" and "/<TAB>/evil.example" as "//evil.example".
 * Pure: used by server actions, pages and the proxy alike.
 */
const PLACEHOLDER_ORIGIN = "https://app.presswright.invalid";
const FORBIDDEN = /[\\\u0000-\u001f\u007f]|%5c|%[01][0-9a-f]|%7f/i;
const MAX_LENGTH = 2048;

export const DEFAULT_NEXT_PATH = "/dashboard";

export function safeNextPath(raw: unknown, fallback: string = DEFAULT_NEXT_PATH): string {
  if (typeof raw !== "string" || raw.length === 0 || raw.length > MAX_LENGTH) return fallback;
  if (!raw.startsWith("/") || raw.startsWith("//") || FORBIDDEN.test(raw)) return fallback;
  let url: URL;
  try {
    url = new URL(raw, PLACEHOLDER_ORIGIN);
  } catch {
    return fallback;
  }
  if (url.origin !== PLACEHOLDER_ORIGIN) return fallback;
  const path = `${url.pathname}${url.search}${url.hash}`;
  // A path the parser normalised into "//…" would be protocol-relative once sent as Location.
  return path.startsWith("//") ? fallback : path;
}
