import "server-only";
import { createHmac, hkdfSync, randomBytes, timingSafeEqual } from "node:crypto";

/**
 * Links to photo files (hardening #8). Photos are stored private at the upload service; a page
 * gets `/photo-files/{id}/{variant}?exp=…&sig=…`, an app route that checks the link's expiry and
 * HMAC and then the viewer's membership of the photo's shop before it streams the file. So a link
 * copied out of a page stops working at `exp` and never works without a session of that shop.
 *
 * `exp` is rounded up to a step of a quarter of the lifetime, so the same photo keeps the same URL
 * for a while (browser cache hits across list refreshes) and every URL lives between 1 and 1¼
 * lifetimes. PHOTO_URL_TTL_S sets the lifetime (default 15 min); the HMAC key: see signingKey.
 */
export const PHOTO_VARIANTS = ["full", "thumb"] as const;
export type PhotoVariant = (typeof PHOTO_VARIANTS)[number];

const DEFAULT_TTL_S = 15 * 60;
const MAX_TTL_S = 24 * 60 * 60;

export function isPhotoVariant(value: string): value is PhotoVariant {
  return (PHOTO_VARIANTS as readonly string[]).includes(value);
}

export function photoUrlTtlS(): number {
  const configured = Number(process.env.PHOTO_URL_TTL_S);
  return Number.isFinite(configured) && configured >= 5 ? Math.min(Math.round(configured), MAX_TTL_S) : DEFAULT_TTL_S;
}

// On globalThis: Next.js bundles this module separately for pages and route handlers, and they
// must sign and check with the same key.
const PROCESS_KEY = Symbol.for("presswright.photo-link-key");
type KeyHolder = { [PROCESS_KEY]?: Buffer };

/**
 * PHOTO_URL_SECRET when set; otherwise a key derived (HKDF-SHA-256, its own label) from the upload
 * service's token, which every instance of the app already holds — so links work across instances
 * and restarts without another secret to manage; with neither, a random key for this process.
 */
function signingKey(): Buffer {
  const holder = globalThis as KeyHolder;
  const cached = holder[PROCESS_KEY];
  if (cached) return cached;
  const configured = process.env.PHOTO_URL_SECRET;
  const token = process.env.UPLOADTHING_TOKEN;
  const key =
    configured && configured.length >= 32
      ? Buffer.from(configured, "utf8")
      : token
        ? Buffer.from(hkdfSync("sha256", token, "presswright", "photo-file-links v1", 32))
        : randomBytes(32);
  holder[PROCESS_KEY] = key;
  return key;
}

function signature(photoId: string, variant: PhotoVariant, exp: number): string {
  return createHmac("sha256", signingKey()).update(`photo-file\n${photoId}\n${variant}\n${exp}`).digest("base64url");
}

/** The link a signed-in page shows for one photo file, and when it stops working. */
export function photoFileUrl(photoId: string, variant: PhotoVariant, now = Date.now()): { url: string; expiresAt: Date } {
  const ttl = photoUrlTtlS();
  const step = Math.max(1, Math.ceil(ttl / 4));
  const exp = Math.ceil((now / 1000 + ttl) / step) * step;
  const url = `/photo-files/${encodeURIComponent(photoId)}/${variant}?exp=${exp}&sig=${signature(photoId, variant, exp)}`;
  return { url, expiresAt: new Date(exp * 1000) };
}

export type PhotoLinkCheck = { ok: true; secondsLeft: number } | { ok: false; reason: "invalid" | "expired" };

/** Checks a link's signature (constant time) and then its expiry. */
export function checkPhotoFileLink(photoId: string, variant: PhotoVariant, exp: string | null, sig: string | null, now = Date.now()): PhotoLinkCheck {
  if (!exp || !/^\d{1,12}$/.test(exp) || !sig) return { ok: false, reason: "invalid" };
  const expected = Buffer.from(signature(photoId, variant, Number(exp)));
  const given = Buffer.from(sig);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return { ok: false, reason: "invalid" };
  const secondsLeft = Number(exp) - Math.floor(now / 1000);
  return secondsLeft > 0 ? { ok: true, secondsLeft } : { ok: false, reason: "expired" };
}
