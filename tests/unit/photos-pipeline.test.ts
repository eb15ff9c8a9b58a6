// The photo pipeline: what it strips, how it orients, what it refuses (reliability-and-security.md,
// uploads). Inputs are generated in code (tests/fixtures/images.ts), never read from disk.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { MAX_PHOTO_BYTES, PhotoRejectedError, checkUploadSize } from "@/lib/photos/limits";
import { FULL_MAX_EDGE, THUMB_MAX_EDGE, processPhoto } from "@/lib/photos/pipeline";
import { GPS_EXIF, flatPng, noisyJpeg } from "../fixtures/images";

/** Whether a TIFF-structured EXIF block has a GPS IFD pointer (tag 0x8825), in its byte order. */
function hasGpsPointer(exif: Buffer): boolean {
  const littleEndian = exif.toString("latin1", 6, 8) === "II"; // after the "Exif\0\0" prefix
  return exif.includes(Buffer.from(littleEndian ? [0x25, 0x88] : [0x88, 0x25]));
}

async function rejection(input: Uint8Array): Promise<PhotoRejectedError> {
  const error: unknown = await processPhoto(input).then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(PhotoRejectedError);
  return error as PhotoRejectedError;
}

describe("processPhoto", () => {
  it("drops EXIF (with GPS), XMP and IPTC from both outputs", async () => {
    const input = await noisyJpeg(640, 480, GPS_EXIF);
    const before = await sharp(input).metadata();
    expect(before.exif?.toString("latin1")).toContain("Presswright Test Camera");
    expect(hasGpsPointer(before.exif!)).toBe(true);

    const { full, thumb } = await processPhoto(input);
    for (const out of [full, thumb]) {
      const meta = await sharp(out.data).metadata();
      expect(meta.format).toBe("jpeg");
      expect([meta.exif, meta.xmp, meta.iptc, meta.icc]).toEqual([undefined, undefined, undefined, undefined]);
      expect(out.data.includes(Buffer.from("Presswright Test Camera"))).toBe(false);
      expect(out.bytes).toBe(out.data.length);
    }
  });

  it("turns an orientation-6 photo upright, swapping width and height", async () => {
    // Stored 600 × 400 with "rotate 90° clockwise to view": upright it is 400 wide, 600 high.
    const input = await sharp(await noisyJpeg(600, 400)).withMetadata({ orientation: 6 }).jpeg().toBuffer();
    expect((await sharp(input).metadata()).orientation).toBe(6);
    const { full, thumb } = await processPhoto(input);
    expect([full.width, full.height]).toEqual([400, 600]);
    const meta = await sharp(full.data).metadata();
    expect([meta.width, meta.height, meta.orientation]).toEqual([400, 600, undefined]);
    expect([thumb.width, thumb.height]).toEqual([Math.round((THUMB_MAX_EDGE * 400) / 600), THUMB_MAX_EDGE]);
  });

  it("fits large photos within 2560 px and never enlarges small ones", async () => {
    const large = await processPhoto(await noisyJpeg(3200, 2000));
    expect([large.full.width, large.full.height]).toEqual([FULL_MAX_EDGE, 1600]);
    expect([large.thumb.width, large.thumb.height]).toEqual([THUMB_MAX_EDGE, 250]);
    const small = await processPhoto(await noisyJpeg(320, 200));
    expect([small.full.width, small.full.height, small.thumb.width]).toEqual([320, 200, 320]);
  });

  it("accepts PNG and WebP, flattening transparency onto white", async () => {
    const transparent = { create: { width: 50, height: 30, channels: 4 as const, background: { r: 0, g: 0, b: 0, alpha: 0 } } };
    for (const input of [await sharp(transparent).png().toBuffer(), await sharp(transparent).webp().toBuffer()]) {
      const { full } = await processPhoto(input);
      const { data } = await sharp(full.data).raw().toBuffer({ resolveWithObject: true });
      expect(Math.min(...data)).toBeGreaterThan(240);
    }
  });

  it("refuses a text file named .jpg and an SVG, by content", async () => {
    const text = new TextEncoder().encode("Press 3 service notes: replace the ram seal.\n");
    expect((await rejection(text)).reason).toBe("not-an-image");
    const svg = new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10"/></svg>');
    const refused = await rejection(svg);
    expect(refused.reason).toBe("not-an-image");
    expect(refused.message).toBe("This file is not a photo we can read. Upload a JPEG, PNG or WebP image.");
  });

  it("refuses a truncated JPEG", async () => {
    const whole = await noisyJpeg(400, 300);
    const truncated = whole.subarray(0, Math.floor(whole.length * 0.6));
    // The header survives, so this is refused while decoding the pixels, not by the header check.
    expect((await sharp(truncated).metadata()).width).toBe(400);
    expect((await rejection(truncated)).reason).toBe("damaged");
  });

  it("refuses a 20000 × 20000 PNG before decoding it", async () => {
    const bomb = await flatPng(20_000, 20_000);
    expect(bomb.length).toBeLessThan(MAX_PHOTO_BYTES);
    expect(await sharp(bomb, { limitInputPixels: false }).metadata()).toMatchObject({ format: "png", width: 20_000, height: 20_000 });
    const refused = await rejection(bomb);
    expect(refused.reason).toBe("too-many-pixels");
    expect(refused.message).toBe("The image is 20000 × 20000 pixels; the limit is 50 megapixels.");
  });
});

describe("checkUploadSize", () => {
  it("accepts exactly the limit and refuses one byte more, and empty files", () => {
    expect(() => checkUploadSize(MAX_PHOTO_BYTES)).not.toThrow();
    expect(() => checkUploadSize(MAX_PHOTO_BYTES + 1)).toThrow(new PhotoRejectedError("too-large", "The photo is 8.0 MB; the limit is 8.0 MB."));
    expect(() => checkUploadSize(0)).toThrow(PhotoRejectedError);
  });

  it("is applied by processPhoto before anything is decoded", async () => {
    const oversized = new Uint8Array(MAX_PHOTO_BYTES + 1);
    oversized.set([0xff, 0xd8, 0xff]);
    expect((await rejection(oversized)).reason).toBe("too-large");
  });
});
