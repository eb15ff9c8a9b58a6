// Hardening #8: photos are stored private; pages get short-lived signed app links that serve the
// file only to a signed-in member of the photo's shop (lib/photos/file-urls.ts, app/photo-files).
import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as listRoute } from "@/app/api/presses/[pressId]/photos/route";
import { checkPhotoFileLink, photoFileUrl } from "@/lib/photos/file-urls";
import { noisyJpeg } from "../fixtures/images";
import { getRequest } from "./helpers";
import { jpegFile, photoRows, servePhotoFile, setupPhotoUploads, upload } from "./photos-context";

const ctx = setupPhotoUploads();
let photoId = "";

beforeAll(async () => {
  const [result] = await upload(ctx, ctx.member, [jpegFile(await noisyJpeg(320, 240))], { pressId: ctx.pressId, kind: "leak" });
  photoId = (result!.serverData as { photoId: string }).photoId;
});

describe("photo links", () => {
  it("are what the list API hands out: app links, never storage URLs", async () => {
    const res = await listRoute(getRequest(`/api/presses/${ctx.pressId}/photos`, { cookie: ctx.member.cookie }), { params: Promise.resolve({ pressId: ctx.pressId }) });
    const { photos } = (await res.json()) as { photos: { id: string; url: string; thumbUrl: string }[] };
    const photo = photos.find((p) => p.id === photoId)!;
    expect(photo.thumbUrl).toMatch(new RegExp(`^/photo-files/${photoId}/thumb\\?exp=\\d+&sig=[\\w-]+$`));
    expect(photo.url).toMatch(new RegExp(`^/photo-files/${photoId}/full\\?exp=\\d+&sig=[\\w-]+$`));
    expect(JSON.stringify(photos)).not.toMatch(/localhost:\d+|ufs\.sh/);

    const served = await servePhotoFile(ctx.manager, photoId, "thumb", photo.thumbUrl);
    expect(served.status).toBe(200);
    expect(served.headers.get("cache-control")).toMatch(/^private, max-age=\d+$/);
  });

  it("serve members of the shop only: 401 without a session, 404 for another shop", async () => {
    expect((await servePhotoFile(ctx.member, photoId, "full")).status).toBe(200);
    expect((await servePhotoFile(null, photoId, "full")).status).toBe(401);
    expect((await servePhotoFile(ctx.outsider, photoId, "full")).status).toBe(404);
    expect((await servePhotoFile(ctx.outsider, photoId, "thumb")).status).toBe(404);
  });

  it("stop working at their expiry, and refuse a changed expiry, variant or photo", async () => {
    const { url, expiresAt } = photoFileUrl(photoId, "thumb");
    const exp = new URL(url, "http://x").searchParams.get("exp");
    const sig = new URL(url, "http://x").searchParams.get("sig");
    expect(checkPhotoFileLink(photoId, "thumb", exp, sig, expiresAt.getTime() - 1000)).toMatchObject({ ok: true });
    expect(checkPhotoFileLink(photoId, "thumb", exp, sig, expiresAt.getTime())).toEqual({ ok: false, reason: "expired" });

    vi.useFakeTimers({ now: expiresAt.getTime() + 1000, toFake: ["Date"] });
    try {
      const expired = await servePhotoFile(ctx.member, photoId, "thumb", url);
      expect(expired.status).toBe(410);
    } finally {
      vi.useRealTimers();
    }

    const later = url.replace(/exp=(\d+)/, (_m, e: string) => `exp=${Number(e) + 3600}`);
    expect((await servePhotoFile(ctx.member, photoId, "thumb", later)).status).toBe(403);
    expect((await servePhotoFile(ctx.member, photoId, "full", url.replace("/thumb?", "/full?"))).status).toBe(403);
    const [other] = (await photoRows(ctx.pressId)).filter((r) => r.id !== photoId);
    if (other) expect((await servePhotoFile(ctx.member, other.id, "thumb", url.replace(photoId, other.id))).status).toBe(403);
    expect((await servePhotoFile(ctx.member, photoId, "thumb", `/photo-files/${photoId}/thumb`)).status).toBe(403);
  });

  it("live between one and one and a quarter lifetimes, so a list refresh keeps the same URL for a while", () => {
    const now = Date.UTC(2026, 2, 1, 8, 0, 30);
    const a = photoFileUrl(photoId, "thumb", now);
    const b = photoFileUrl(photoId, "thumb", now + 1000);
    expect(a.url).toBe(b.url);
    const lifeS = (a.expiresAt.getTime() - now) / 1000;
    expect(lifeS).toBeGreaterThanOrEqual(15 * 60);
    expect(lifeS).toBeLessThanOrEqual(15 * 60 * 1.25);
  });
});
