// Shared set-up for the photo tests: the upload service fake on a free port, the app's real
// upload route (app/api/uploadthing) served on loopback so the fake can call it back, and a
// browser-side uploader per signed-in user. Two shops: the manager's (with a member) and an outsider's.
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import type { ClientUploadedFileData } from "uploadthing/types";
import { afterAll, beforeAll, expect } from "vitest";
import type { UploadRouter } from "@/app/api/uploadthing/core";
import { db } from "@/db/client";
import { memberships, photos } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { createPress } from "@/lib/data/press-edits";
import type { PhotoUploadResult } from "@/lib/photos/store-upload";
import { photoFileUrl } from "@/lib/photos/file-urls";
import { localUploadthingEnv } from "@/lib/uploads/env";
import type { PhotoUploadInput } from "@/lib/validation/photo";
import { startFake, type FakeServer } from "./fake-uploadthing/harness";
import { serveRoute, type ServedRoute } from "./fake-uploadthing/serve-route";
import { installFetchXhr } from "./fake-uploadthing/xhr-shim";
import { makeUser } from "./helpers";

type User = Awaited<ReturnType<typeof makeUser>> & { cookie: string };
export type UploadOutcome = ClientUploadedFileData<PhotoUploadResult>;

export type PhotoContext = {
  fake: FakeServer;
  route: ServedRoute;
  utapi: InstanceType<typeof import("uploadthing/server").UTApi>;
  client: typeof import("uploadthing/client");
  UploadThingError: typeof import("uploadthing/server").UploadThingError;
  manager: User;
  member: User;
  outsider: User;
  pressId: string;
};

async function signedIn(): Promise<User> {
  const user = await makeUser();
  return { ...user, cookie: `session=${(await createSession(user.userId)).token}` };
}

/** Registers beforeAll/afterAll; the returned object is filled in before the first test runs. */
export function setupPhotoUploads(): PhotoContext {
  const ctx = {} as PhotoContext;
  let dir = "";
  beforeAll(async () => {
    dir = await mkdtemp(path.join(tmpdir(), "presswright-photos-"));
    ctx.fake = await startFake({ dir, callbackTimeoutMs: 10_000 });
    // The SDK reads its configuration from the environment: set it before loading the route.
    Object.assign(process.env, localUploadthingEnv(ctx.fake.port));
    process.env.UPLOADTHING_LOG_LEVEL ??= "None";
    installFetchXhr();
    const [client, server, route] = await Promise.all([import("uploadthing/client"), import("uploadthing/server"), import("@/app/api/uploadthing/route")]);
    ctx.client = client;
    ctx.UploadThingError = server.UploadThingError;
    ctx.utapi = new server.UTApi();
    ctx.route = await serveRoute("/api/uploadthing", route);

    [ctx.manager, ctx.member, ctx.outsider] = await Promise.all([signedIn(), signedIn(), signedIn()]);
    await db.insert(memberships).values({ shopId: ctx.manager.shopId, userId: ctx.member.userId, role: "member" });
    ctx.pressId = (await createPress({ userId: ctx.manager.userId }, ctx.manager.shopId, { name: "Photo press", frameType: "h-frame", lifecycle: "in-service" })).id;
  });
  afterAll(async () => {
    await ctx.route?.close();
    await ctx.fake?.stop();
    if (dir) await rm(dir, { recursive: true, force: true });
  });
  return ctx;
}

/** The browser client as a page of the app would use it: same origin, with the user's session cookie. */
export function uploader(ctx: PhotoContext, user: User | null) {
  const sameOrigin: typeof fetch = (input, init) => {
    const headers = new Headers(init?.headers ?? (input instanceof Request ? input.headers : undefined));
    headers.set("origin", ctx.route.origin);
    if (user) headers.set("cookie", user.cookie);
    return fetch(input, { ...init, headers });
  };
  return ctx.client.genUploader<UploadRouter>({ url: ctx.route.url, package: "presswright-tests", fetch: sameOrigin });
}

export function upload(ctx: PhotoContext, user: User | null, files: File[], input: PhotoUploadInput): Promise<UploadOutcome[]> {
  return uploader(ctx, user).uploadFiles("pressPhoto", { files, input });
}

export const jpegFile = (bytes: Uint8Array, name = "weld.jpg"): File => new File([new Uint8Array(bytes)], name, { type: "image/jpeg" });

/** Keys of every file the upload service holds. */
export async function storedKeys(ctx: PhotoContext): Promise<string[]> {
  const { files } = await ctx.utapi.listFiles({ limit: 500 });
  return files.map((f) => f.key).sort();
}

export const photoRows = (pressId: string) => db.select().from(photos).where(eq(photos.pressId, pressId));

/** Awaits a refused upload and returns the SDK error's code and message. */
export async function refusal(ctx: PhotoContext, promise: Promise<unknown>): Promise<{ code: string; message: string }> {
  const error: unknown = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(ctx.UploadThingError);
  const { code, message } = error as InstanceType<PhotoContext["UploadThingError"]>;
  return { code, message };
}

/** GET of a photo file through the app's link route, as the page's <img> would ask for it. */
export async function servePhotoFile(user: User | null, photoId: string, variant: "full" | "thumb", url = photoFileUrl(photoId, variant).url): Promise<Response> {
  const { GET } = await import("@/app/photo-files/[photoId]/[variant]/route");
  const req = new NextRequest(`http://127.0.0.1:3000${url}`, { headers: user ? { cookie: user.cookie } : {} });
  return GET(req, { params: Promise.resolve({ photoId, variant }) });
}
