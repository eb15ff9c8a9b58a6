import "server-only";
import sharp, { type Metadata, type Sharp } from "sharp";
import { PhotoRejectedError, checkUploadSize } from "./limits";

/**
 * Decoding limit. Photos from 50-megapixel phone sensors (8160 × 6120 = 49.9 MP) and cameras fit
 * (bigger phone modes produce files over the 8 MB limit anyway); decoded they take up to 200 MB,
 * the most one upload may cost a small server. The file size limit alone does not bound this: a
 * 20000 × 20000 PNG of one colour (400 MP, over 1 GB decoded) compresses to a few hundred
 * kilobytes. sharp's own default (268 MP) is far above what a photo needs.
 */
export const MAX_INPUT_PIXELS = 50_000_000;
export const FULL_MAX_EDGE = 2560;
export const THUMB_MAX_EDGE = 400;

/**
 * Output is JPEG: every browser and image tool reads it, photos of welds and fittings need no
 * transparency, and encoding it costs a fraction of WebP's (on a 12 MP photo WebP took about four
 * times as long as the whole JPEG pipeline), which keeps the pipeline near a bare resize.
 * Quality 82 is visually clean for photos at a third of the bytes of quality 95.
 */
const FULL_QUALITY = 82;
const THUMB_QUALITY = 78;

export type EncodedPhoto = { data: Buffer; width: number; height: number; format: "jpeg"; bytes: number };
export type ProcessedPhoto = { full: EncodedPhoto; thumb: EncodedPhoto };

const ACCEPTED_FORMATS = new Set(["jpeg", "png", "webp"]);
const NOT_A_PHOTO = "This file is not a photo we can read. Upload a JPEG, PNG or WebP image.";

/** Magic numbers: anything else never reaches sharp's parsers (SVG, TIFF, HEIF, GIF…). */
function sniffFormat(b: Buffer): "jpeg" | "png" | "webp" | null {
  if (b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return "jpeg";
  if (b.length >= 8 && b.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return "png";
  if (b.length >= 12 && b.toString("latin1", 0, 4) === "RIFF" && b.toString("latin1", 8, 12) === "WEBP") return "webp";
  return null;
}

/** Reads the header only (no pixels), so the size check happens before any large decode. */
async function readHeader(input: Buffer): Promise<{ hasAlpha: boolean }> {
  if (!sniffFormat(input)) throw new PhotoRejectedError("not-an-image", NOT_A_PHOTO);
  let meta: Metadata;
  try {
    meta = await sharp(input, { limitInputPixels: false }).metadata();
  } catch {
    throw new PhotoRejectedError("damaged", "The photo file is damaged or incomplete.");
  }
  if (!ACCEPTED_FORMATS.has(meta.format) || meta.format !== sniffFormat(input)) {
    throw new PhotoRejectedError("unsupported-format", NOT_A_PHOTO);
  }
  if (meta.width * meta.height > MAX_INPUT_PIXELS) {
    throw new PhotoRejectedError(
      "too-many-pixels",
      `The image is ${meta.width} × ${meta.height} pixels; the limit is ${MAX_INPUT_PIXELS / 1_000_000} megapixels.`,
    );
  }
  return { hasAlpha: meta.hasAlpha };
}

async function encode(input: Buffer, maxEdge: number, quality: number, hasAlpha: boolean): Promise<EncodedPhoto> {
  // failOn "error" refuses truncated or corrupt pixel data but tolerates the harmless warnings
  // some cameras' JPEGs raise. .rotate() applies the EXIF orientation before the EXIF is dropped.
  let pipeline: Sharp = sharp(input, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "error" })
    .rotate()
    .resize({ width: maxEdge, height: maxEdge, fit: "inside", withoutEnlargement: true });
  if (hasAlpha) pipeline = pipeline.flatten({ background: "#ffffff" });
  // No withMetadata(): sharp writes no EXIF, GPS, XMP, IPTC or ICC and converts to sRGB.
  const { data, info } = await pipeline.jpeg({ quality }).toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height, format: "jpeg", bytes: info.size };
}

/**
 * Turns an uploaded photo into the two images we store: at most 2560 px and a 400 px thumbnail,
 * upright, re-encoded as JPEG without any of the original's metadata (location included).
 * Throws PhotoRejectedError, with a message for the uploader, for anything that is not a readable
 * JPEG, PNG or WebP within the limits.
 */
export async function processPhoto(bytes: Uint8Array): Promise<ProcessedPhoto> {
  checkUploadSize(bytes.byteLength);
  const input = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const { hasAlpha } = await readHeader(input);
  try {
    // Two pipelines in parallel: the thumbnail decodes a JPEG at 1/8 scale, cheaper than
    // shrinking the full-size result.
    const [full, thumb] = await Promise.all([
      encode(input, FULL_MAX_EDGE, FULL_QUALITY, hasAlpha),
      encode(input, THUMB_MAX_EDGE, THUMB_QUALITY, hasAlpha),
    ]);
    return { full, thumb };
  } catch {
    throw new PhotoRejectedError("damaged", "The photo file is damaged or incomplete.");
  }
}
