/** Raised when this server cannot sign: production without a chain key (answered 503). */
export class SigningUnavailableError extends Error {
  constructor() {
    super("Signing is not set up on this server (INSPECTION_CHAIN_KEY is missing). Ask the administrator.");
    this.name = "SigningUnavailableError";
  }
}

// Outside production only, so local runs and tests work without set-up; production refuses to sign.
export const LOCAL_DEVELOPMENT_KEY = "presswright-local-development-chain-key-not-secret";

/**
 * The HMAC key of the inspection chain. It lives in the environment, never in the database, so
 * someone who can rewrite rows cannot recompute the links. At least 32 characters in production.
 */
export function inspectionChainKey(env: NodeJS.ProcessEnv = process.env): string {
  const key = env.INSPECTION_CHAIN_KEY;
  if (key && (key.length >= 32 || env.NODE_ENV !== "production")) return key;
  if (env.NODE_ENV === "production") throw new SigningUnavailableError();
  return LOCAL_DEVELOPMENT_KEY;
}
