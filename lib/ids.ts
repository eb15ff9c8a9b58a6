import { encodeBase32LowerCaseNoPadding } from "@oslojs/encoding";

/** A random public id: 15 bytes (120 bits) in 24 lowercase base32 characters — unguessable, URL-safe. */
export function newId(): string {
  const bytes = new Uint8Array(15);
  crypto.getRandomValues(bytes);
  return encodeBase32LowerCaseNoPadding(bytes);
}

export const ID_PATTERN = /^[a-z2-7]{24}$/;
