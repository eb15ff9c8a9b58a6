// HMAC-SHA256 signatures in the SDK's format: "hmac-sha256=" + hex (@uploadthing/shared crypto).
import { createHmac, timingSafeEqual } from "node:crypto";

const PREFIX = "hmac-sha256=";

export function sign(message, apiKey) {
  return PREFIX + createHmac("sha256", apiKey).update(message).digest("hex");
}

/** Constant-time comparison of a received signature with the expected one. */
export function verify(message, signature, apiKey) {
  if (typeof signature !== "string" || !signature.startsWith(PREFIX)) return false;
  const expected = Buffer.from(sign(message, apiKey));
  const given = Buffer.from(signature);
  return expected.length === given.length && timingSafeEqual(expected, given);
}

/** Constant-time equality for the API key header. */
export function sameSecret(given, expected) {
  if (typeof given !== "string") return false;
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

/**
 * Checks a signed URL as the SDK builds it: the signature covers the full URL string before
 * "&signature=", with the host the client addressed. `expires` is epoch milliseconds.
 * Returns null when valid, else { status, error }.
 */
export function checkSignedUrl(req, apiKey, now = Date.now()) {
  const full = `http://${req.headers.host ?? ""}${req.url}`;
  const cut = full.lastIndexOf("&signature=");
  if (cut < 0) return { status: 403, error: "Missing signature" };
  const params = new URL(full).searchParams;
  const expires = Number(params.get("expires"));
  if (!params.get("expires") || !Number.isFinite(expires)) return { status: 403, error: "Missing expiry" };
  if (!verify(full.slice(0, cut), params.get("signature"), apiKey)) return { status: 403, error: "Invalid signature" };
  if (now > expires) return { status: 403, error: "URL expired" };
  return null;
}

/** Builds a signed URL the way generateSignedURL does, for /v6/requestFileAccess. */
export function signUrl(base, apiKey, ttlSeconds, now = Date.now()) {
  const url = new URL(base);
  url.searchParams.append("expires", String(now + ttlSeconds * 1000));
  url.searchParams.append("signature", sign(url.toString(), apiKey));
  return url.href;
}
