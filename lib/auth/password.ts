import "server-only";
import { hash, verify } from "@node-rs/argon2";
import { ARGON2_PARAMS } from "./password-rules";

export { ARGON2_PARAMS };

export function hashPassword(password: string): Promise<string> {
  return hash(password.normalize("NFKC"), ARGON2_PARAMS);
}

export async function verifyPassword(storedHash: string, password: string): Promise<boolean> {
  try {
    return await verify(storedHash, password.normalize("NFKC"));
  } catch {
    return false;
  }
}

/** True when a stored hash was made with weaker or different parameters and should be redone. */
export function needsRehash(storedHash: string): boolean {
  const m = /^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=(\d+)\$/.exec(storedHash);
  if (!m) return true;
  return (
    Number(m[1]) !== ARGON2_PARAMS.memoryCost ||
    Number(m[2]) !== ARGON2_PARAMS.timeCost ||
    Number(m[3]) !== ARGON2_PARAMS.parallelism
  );
}

// A fixed hash to verify against when the e-mail is unknown, so both answers take the same time.
let dummyHash: Promise<string> | undefined;
export function timingDummyHash(): Promise<string> {
  dummyHash ??= hashPassword("presswright-timing-equaliser");
  return dummyHash;
}
