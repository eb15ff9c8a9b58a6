import { sha256 } from "@oslojs/crypto/sha2";
import { constantTimeEqual } from "@oslojs/crypto/subtle";
import { encodeBase32LowerCaseNoPadding } from "@oslojs/encoding";
import { newId } from "@/lib/ids";

/** A new session's parts: the cookie carries `id.secret`; only SHA-256(secret) is ever stored. */
export function generateSessionToken(): { id: string; secret: string; token: string; secretHash: Buffer } {
  const id = newId();
  const bytes = new Uint8Array(32);
  crypto.getRandomValues(bytes);
  const secret = encodeBase32LowerCaseNoPadding(bytes);
  return { id, secret, token: `${id}.${secret}`, secretHash: hashSecret(secret) };
}

export function hashSecret(secret: string): Buffer {
  return Buffer.from(sha256(new TextEncoder().encode(secret)));
}

export function parseSessionToken(token: string): { id: string; secret: string } | null {
  const parts = token.split(".");
  if (parts.length !== 2) return null;
  const [id, secret] = parts as [string, string];
  if (!/^[a-z2-7]{24}$/.test(id) || !/^[a-z2-7]{52}$/.test(secret)) return null;
  return { id, secret };
}

export function secretMatches(secret: string, storedHash: Uint8Array): boolean {
  return constantTimeEqual(hashSecret(secret), storedHash);
}
