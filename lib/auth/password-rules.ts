import { dictionary } from "@zxcvbn-ts/language-common";

/**
 * argon2id with m = 19456 KiB, t = 2, p = 1: the OWASP / ASVS appendix C minimum.
 * The library's defaults are weaker, so every parameter is explicit.
 */
export const ARGON2_PARAMS = {
  algorithm: 2, // Algorithm.Argon2id (const enums cannot cross isolatedModules)
  memoryCost: 19456,
  timeCost: 2,
  parallelism: 1,
  outputLen: 32,
} as const;

export const PASSWORD_MIN = 8;
export const PASSWORD_MAX = 256;

// ~49k most common passwords from the @zxcvbn-ts/language-common list.
const COMMON = new Set(dictionary["passwords-common"].map((p: string) => p.toLowerCase()));

/** Returns an error message, or null when the password is acceptable. No composition rules (ASVS 6.2). */
export function passwordProblem(password: string): string | null {
  const length = [...password].length;
  if (length < PASSWORD_MIN) return `Use at least ${PASSWORD_MIN} characters.`;
  if (length > PASSWORD_MAX) return `Use at most ${PASSWORD_MAX} characters.`;
  if (COMMON.has(password.toLowerCase())) return "This password is on a list of commonly used passwords; choose another.";
  return null;
}

