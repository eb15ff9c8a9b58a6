// The photo JSON API (GET /api/presses/{id}/photos, GET/PATCH/DELETE /api/photos/{id}): another
// shop's photos are 404, changes are for the uploader or a manager, and deleting removes the
// stored files. Photos are made through the real upload route against the fake.
import { beforeAll, describe, expect, it } from "vitest";
import { DELETE, GET as getPhotoRoute, PATCH } from "@/app/api/photos/[photoId]/route";
import { GET as listRoute } from "@/app/api/presses/[pressId]/photos/route";
import type { PhotoView } from "@/lib/data/photos";
import { GPS_EXIF, noisyJpeg } from "../fixtures/images";
import { getRequest, jsonRequest } from "./helpers";
import { jpegFile, photoRows, servePhotoFile, setupPhotoUploads, storedKeys, upload, type PhotoContext } from "./photos-context";

const ctx = setupPhotoUploads();
type User = PhotoContext["member"];
const params = <K extends string>(key: K, value: string) => ({ params: Promise.resolve({ [key]: value } as Record<K, string>) });
const as = (user: User) => ({ cookie: user.cookie });

async function photoBy(user: User, kind: "weld" | "leak", caption: string): Promise<string> {
  const [result] = await upload(ctx, user, [jpegFile(await noisyJpeg(320, 240, GPS_EXIF))], { pressId: ctx.pressId, kind, caption });
  const data = result!.serverData;
  if (!("photoId" in data)) throw new Error(`upload failed: ${data.error}`);
  return data.photoId;
}

const list = (user: User, query = "") => listRoute(getRequest(`/api/presses/${ctx.pressId}/photos${query}`, as(user)), params("pressId", ctx.pressId));
const patch = (user: User, id: string, body: unknown) => PATCH(jsonRequest(`/api/photos/${id}`, body, as(user), "PATCH"), params("photoId", id));
const remove = (user: User, id: string, headers: Record<string, string> = {}) =>
  DELETE(jsonRequest(`/api/photos/${id}`, undefined, { ...as(user), ...headers }, "DELETE"), params("photoId", id));

let memberWeld: string;
let memberLeak: string;
let managerWeld: string;
beforeAll(async () => {
  memberWeld = await photoBy(ctx.member, "weld", "Crack at the toe of the fillet");
  memberLeak = await photoBy(ctx.member, "leak", "Weeping fitting at the cap end");
  managerWeld = await photoBy(ctx.manager, "weld", "New gusset welds");
});

describe("reading photos", () => {
  it("lists a press's photos for its shop, newest first, filtered by kind", async () => {
    const res = await list(ctx.member);
    expect(res.status).toBe(200);
    const { photos } = (await res.json()) as { photos: PhotoView[] };
    expect(photos.map((p) => p.id)).toEqual([managerWeld, memberLeak, memberWeld]);
    expect(photos[0]).toMatchObject({ kind: "weld", caption: "New gusset welds", uploadedBy: ctx.manager.userId, width: 320, thumbWidth: 320 });
    expect(Object.keys(photos[0]!)).not.toContain("fileKey");

    const welds = (await (await list(ctx.member, "?kind=weld")).json()) as { photos: PhotoView[] };
    expect(welds.photos.map((p) => p.id)).toEqual([managerWeld, memberWeld]);
    expect((await list(ctx.member, "?kind=rust")).status).toBe(400);
  });

  it("answers 404 to a member of another shop and 401 without a session", async () => {
    expect((await list(ctx.outsider)).status).toBe(404);
    const foreign = await getPhotoRoute(getRequest(`/api/photos/${memberWeld}`, as(ctx.outsider)), params("photoId", memberWeld));
    expect(foreign.status).toBe(404);
    const own = await getPhotoRoute(getRequest(`/api/photos/${memberWeld}`, as(ctx.manager)), params("photoId", memberWeld));
    expect(own.status).toBe(200);
    const anonymous = await listRoute(getRequest(`/api/presses/${ctx.pressId}/photos`), params("pressId", ctx.pressId));
    expect(anonymous.status).toBe(401);
  });
});

describe("changing and deleting photos", () => {
  it("lets the uploader or a manager change the caption and kind, nobody else", async () => {
    expect((await patch(ctx.outsider, memberWeld, { caption: "mine" })).status).toBe(404);
    expect((await patch(ctx.member, managerWeld, { caption: "mine" })).status).toBe(403);
    expect((await patch(ctx.member, memberWeld, { caption: "x", uploadedBy: ctx.outsider.userId })).status).toBe(400);
    expect((await patch(ctx.member, memberWeld, {})).status).toBe(400);

    const own = await patch(ctx.member, memberWeld, { caption: "  Crack at the toe, 12 mm  ", kind: "damage" });
    expect(own.status).toBe(200);
    expect(((await own.json()) as { photo: PhotoView }).photo).toMatchObject({ caption: "Crack at the toe, 12 mm", kind: "damage" });
    const byManager = await patch(ctx.manager, memberWeld, { caption: "" });
    expect(((await byManager.json()) as { photo: PhotoView }).photo.caption).toBeNull();
  });

  it("refuses deletes from another shop (404), by another member (403) and from a foreign page", async () => {
    const before = await storedKeys(ctx);
    expect((await remove(ctx.outsider, memberLeak)).status).toBe(404);
    expect((await remove(ctx.member, managerWeld)).status).toBe(403);
    expect((await remove(ctx.member, memberLeak, { origin: "http://evil.example" })).status).toBe(403);
    expect(await storedKeys(ctx)).toEqual(before);
    expect((await photoRows(ctx.pressId)).map((r) => r.id).sort()).toEqual([managerWeld, memberLeak, memberWeld].sort());
  });

  it("lets a member delete their own photo and a manager delete anyone's, removing the stored files", async () => {
    const rows = await photoRows(ctx.pressId);
    for (const [user, id] of [
      [ctx.member, memberLeak],
      [ctx.manager, memberWeld],
    ] as const) {
      const row = rows.find((r) => r.id === id)!;
      expect((await servePhotoFile(user, id, "thumb")).status).toBe(200);
      expect((await remove(user, id)).status).toBe(204);
      expect((await servePhotoFile(user, id, "full")).status).toBe(404);
      expect((await servePhotoFile(user, id, "thumb")).status).toBe(404);
      expect(await storedKeys(ctx)).not.toContain(row.fileKey);
      expect(await storedKeys(ctx)).not.toContain(row.thumbKey);
      expect((await remove(user, id)).status).toBe(404);
    }
    expect((await photoRows(ctx.pressId)).map((r) => r.id)).toEqual([managerWeld]);
  });
});
