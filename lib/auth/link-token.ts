import { generateSessionToken, parseSessionToken, secretMatches } from "./session-token";

/**
 * Single-use links (invitations, password resets) use the session token's shape: `id.secret` in
 * the link, only SHA-256(secret) stored, compared in constant time.
 */
export const newLinkToken = generateSessionToken;
export const parseLinkToken = parseSessionToken;
export const linkSecretMatches = secretMatches;
