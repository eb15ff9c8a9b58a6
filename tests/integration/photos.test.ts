// Photos through the real upload route (app/api/uploadthing) and the upload service fake: the
// pipeline strips location data and stores only the re-encoded files; what it refuses leaves
// nothing behind; the middleware decides who may attach to what (issue 5, reliability-and-security.md).
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { createComponent } from "@/lib/data/components";
import { createPress } from "@/lib/data/press-edits";
import { MAX_PHOTO_BYTES } from "@/lib/photos/limits";
import { componentInputSchema } from "@/lib/validation/press";
import { GPS_EXIF, flatPng, noisyJpeg } from "../fixtures/images";
import { jpegFile, photoRows, refusal, servePhotoFile, setupPhotoUploads, storedKeys, upload } from "./photos-context";

const ctx = setupPhotoUploads();
const gauge = (pressId: string, label: string) =>
  createComponent({ userId: ctx.manager.userId }, pressId, componentInputSchema.parse({ kind: "gauge", label, spec: { rangeBar: 250 } }));

describe("the upload pipeline", () => {
  it("stores a GPS-tagged JPEG re-encoded without EXIF, XMP or IPTC, and deletes the original", async () => {
    const original = await noisyJpeg(1200, 900, GPS_EXIF);
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const before = await storedKeys(ctx);

    const [result] = await upload(ctx, ctx.member, [jpegFile(original, "shop weld.jpg")], { pressId: ctx.pressId, kind: "weld", caption: "  Root pass, left upright  " });
    expect(result?.serverData).toEqual({ photoId: expect.any(String) });
    const photoId = (result!.serverData as { photoId: string }).photoId;

    const [row] = (await photoRows(ctx.pressId)).filter((r) => r.id === photoId);
    expect(row).toMatchObject({ kind: "weld", caption: "Root pass, left upright", uploadedBy: ctx.member.userId, componentId: null, width: 1200, height: 900, thumbWidth: 400, thumbHeight: 300 });
    // Only the two files the server made remain; the browser's original is gone.
    expect(await storedKeys(ctx)).toEqual([...before, row!.fileKey, row!.thumbKey].sort());
    expect(await storedKeys(ctx)).not.toContain(result!.key);
    expect((await fetch(result!.ufsUrl)).status).toBe(404);

    for (const [variant, storageUrl, bytes] of [
      ["full", row!.fileUrl, row!.bytes],
      ["thumb", row!.thumbUrl, row!.thumbBytes],
    ] as const) {
      // Stored private: the storage URL alone is refused; the app's link route serves members.
      expect((await fetch(storageUrl)).status).toBe(403);
      const served = await servePhotoFile(ctx.member, photoId, variant);
      expect(served.status).toBe(200);
      expect(served.headers.get("content-type")).toBe("image/jpeg");
      expect(served.headers.get("x-content-type-options")).toBe("nosniff");
      const data = Buffer.from(await served.arrayBuffer());
      expect(data.length).toBe(bytes);
      const meta = await sharp(data).metadata();
      expect([meta.format, meta.exif, meta.xmp, meta.iptc]).toEqual(["jpeg", undefined, undefined, undefined]);
      expect(data.includes(Buffer.from("Presswright Test Camera"))).toBe(false);
    }
  });

  it("attaches to a part of the press", async () => {
    const { id: componentId } = await gauge(ctx.pressId, "Main gauge");
    const [result] = await upload(ctx, ctx.manager, [jpegFile(await noisyJpeg(300, 200), "gauge.jpg")], { pressId: ctx.pressId, componentId, kind: "other" });
    const photoId = (result!.serverData as { photoId: string }).photoId;
    expect((await photoRows(ctx.pressId)).find((r) => r.id === photoId)).toMatchObject({ componentId, uploadedBy: ctx.manager.userId, caption: null });
  });

  it("refuses a text file named .jpg, a truncated JPEG and a 20000 × 20000 PNG, leaving nothing stored", async () => {
    const { id: pressId } = await createPress({ userId: ctx.manager.userId }, ctx.manager.shopId, { name: "Refusals", frameType: "c-frame", lifecycle: "in-service" });
    const before = await storedKeys(ctx);
    const whole = await noisyJpeg(800, 600);
    const cases: [File, string][] = [
      [jpegFile(new TextEncoder().encode("Ram seal replaced 2026-03-01, torque 45 Nm.\n"), "notes.jpg"), "This file is not a photo we can read. Upload a JPEG, PNG or WebP image."],
      [jpegFile(whole.subarray(0, Math.floor(whole.length * 0.6)), "cut-off.jpg"), "The photo file is damaged or incomplete."],
      [new File([new Uint8Array(await flatPng(20_000, 20_000))], "bomb.png", { type: "image/png" }), "The image is 20000 × 20000 pixels; the limit is 50 megapixels."],
    ];
    for (const [file, message] of cases) {
      const [result] = await upload(ctx, ctx.member, [file], { pressId, kind: "damage" });
      expect(result?.serverData).toEqual({ error: message });
      expect(await storedKeys(ctx)).toEqual(before);
    }
    expect(await photoRows(pressId)).toEqual([]);
  });

  it("refuses a photo one byte over 8 MB before signing an upload URL", async () => {
    const before = await storedKeys(ctx);
    const oversized = new Uint8Array(MAX_PHOTO_BYTES + 1);
    oversized.set([0xff, 0xd8, 0xff]);
    const refused = await refusal(ctx, upload(ctx, ctx.member, [jpegFile(oversized, "huge.jpg")], { pressId: ctx.pressId, kind: "die" }));
    expect(refused).toEqual({ code: "BAD_REQUEST", message: "Invalid config: FileSizeMismatch" });
    expect(await storedKeys(ctx)).toEqual(before);
  });
});

describe("who may upload", () => {
  const tiny = async (): Promise<File[]> => [jpegFile(await noisyJpeg(40, 30))];

  it("refuses another shop's member, a signed-out visitor and a part of another press", async () => {
    const before = await storedKeys(ctx);
    const rowsBefore = (await photoRows(ctx.pressId)).length;
    expect(await refusal(ctx, upload(ctx, ctx.outsider, await tiny(), { pressId: ctx.pressId, kind: "weld" }))).toEqual({ code: "NOT_FOUND", message: "Press not found" });
    expect(await refusal(ctx, upload(ctx, null, await tiny(), { pressId: ctx.pressId, kind: "weld" }))).toEqual({ code: "FORBIDDEN", message: "Sign in first." });

    const other = await createPress({ userId: ctx.manager.userId }, ctx.manager.shopId, { name: "Other press", frameType: "h-frame" });
    const { id: foreignPart } = await gauge(other.id, "Other gauge");
    const wrongPart = upload(ctx, ctx.member, await tiny(), { pressId: ctx.pressId, componentId: foreignPart, kind: "weld" });
    expect(await refusal(ctx, wrongPart)).toEqual({ code: "NOT_FOUND", message: "Part not found on this press" });

    expect(await storedKeys(ctx)).toEqual(before);
    expect(await photoRows(ctx.pressId)).toHaveLength(rowsBefore);
  });

  it("takes only the known input fields and at most 10 photos", async () => {
    const massAssign = { pressId: ctx.pressId, kind: "weld", uploadedBy: ctx.outsider.userId } as unknown as { pressId: string; kind: "weld" };
    expect(await refusal(ctx, upload(ctx, ctx.member, await tiny(), massAssign))).toMatchObject({ code: "BAD_REQUEST", message: "Invalid input" });
    const eleven = Array.from({ length: 11 }, (_, i) => jpegFile(new Uint8Array([0xff, 0xd8, 0xff, i]), `p${i}.jpg`));
    expect(await refusal(ctx, upload(ctx, ctx.member, eleven, { pressId: ctx.pressId, kind: "weld" }))).toEqual({
      code: "BAD_REQUEST",
      message: "Upload at most 10 photos at a time.",
    });
  });

  it("refuses a cross-site upload request but lets the service's signed callbacks through to the SDK", async () => {
    const body = JSON.stringify({ input: { pressId: ctx.pressId, kind: "weld" }, files: [{ name: "a.jpg", size: 10, type: "image/jpeg", lastModified: 0 }] });
    const crossSite = await fetch(`${ctx.route.url}?actionType=upload&slug=pressPhoto`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: "http://evil.example", cookie: ctx.member.cookie },
      body,
    });
    expect(crossSite.status).toBe(403);
    // A forged callback gets past our Origin check only to be refused by the SDK's signature check.
    const forged = await fetch(`${ctx.route.url}?slug=pressPhoto`, {
      method: "POST",
      headers: { "content-type": "application/json", "uploadthing-hook": "callback", "x-uploadthing-signature": "hmac-sha256=00" },
      body: JSON.stringify({ status: "uploaded", file: {}, origin: "http://evil.example", metadata: { userId: ctx.outsider.userId } }),
    });
    expect(forged.status).toBe(400);
    // Every API refusal carries `error`; the SDK's own `message` stays for its client.
    expect(await forged.json()).toEqual({ error: "Invalid signature", message: "Invalid signature" });
  });
});
