// Shared set-up for the fake's test files: a fake on a free port with a temp storage folder,
// the SDK configured for it through the environment, and the test app.
import { createHash } from "node:crypto";
import { existsSync } from "node:fs";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, expect } from "vitest";
import { localUploadthingEnv } from "@/lib/uploads/env";
import { startFake, type FakeServer } from "./harness";
import type { Mode, TestApp, TestRouter } from "./test-app";
import { installFetchXhr } from "./xhr-shim";

export type FakeContext = {
  dir: string;
  fake: FakeServer;
  app: TestApp;
  client: typeof import("uploadthing/client");
  server: typeof import("uploadthing/server");
};

/** Registers beforeAll/afterAll; the returned object is filled in before the first test runs. */
export function setupFakeUploadthing(callbackTimeoutMs: number): FakeContext {
  const ctx = {} as FakeContext;
  beforeAll(async () => {
    ctx.dir = await mkdtemp(path.join(tmpdir(), "presswright-fake-ut-"));
    ctx.fake = await startFake({ dir: ctx.dir, callbackTimeoutMs });
    // The SDK reads its configuration from the environment: set it before importing the SDK.
    Object.assign(process.env, localUploadthingEnv(ctx.fake.port));
    process.env.UPLOADTHING_LOG_LEVEL ??= "None";
    installFetchXhr();
    [ctx.client, ctx.server] = await Promise.all([import("uploadthing/client"), import("uploadthing/server")]);
    ctx.app = await (await import("./test-app")).startTestApp();
  });
  afterAll(async () => {
    await ctx.app?.close();
    await ctx.fake?.stop();
    if (ctx.dir) await rm(ctx.dir, { recursive: true, force: true });
  });
  return ctx;
}

let seed = 0;
/** A small, distinct PNG each call. */
export async function pngFile(name: string): Promise<File> {
  seed += 1;
  const bytes = await sharp({ create: { width: 24, height: 16, channels: 3, background: { r: (seed * 40) % 256, g: 90, b: 200 } } })
    .png()
    .toBuffer();
  return new File([new Uint8Array(bytes)], name, { type: "image/png" });
}

export const md5 = (bytes: Uint8Array): string => createHash("md5").update(bytes).digest("hex");
export const bytesOf = async (file: Blob): Promise<Uint8Array> => new Uint8Array(await file.arrayBuffer());

export function uploader(ctx: FakeContext, mode: Mode, fetchFn: typeof fetch = fetch) {
  return ctx.client.genUploader<TestRouter>({ url: ctx.app.endpoint(mode), package: "presswright-tests", fetch: fetchFn });
}

/** A client fetch that rewrites the presigned URLs the app hands out, recording their keys. */
export function rewritingFetch(rewrite: (url: URL) => void, keys: string[]): typeof fetch {
  return async (input, init) => {
    const res = await fetch(input, init);
    if (!String(input instanceof Request ? input.url : input).includes("actionType=upload") || !res.ok) return res;
    const presigned = (await res.json()) as { url: string; key: string }[];
    return Response.json(
      presigned.map((p) => {
        keys.push(p.key);
        const url = new URL(p.url);
        rewrite(url);
        return { ...p, url: url.href };
      }),
    );
  };
}

/** Asks the app for a presigned URL directly, as the client's first request does. */
export async function presign(ctx: FakeContext, mode: Mode, size: number): Promise<{ url: string; key: string }> {
  const res = await fetch(`${ctx.app.endpoint(mode)}?actionType=upload&slug=photo`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ input: null, files: [{ name: "plate.png", size, type: "image/png", lastModified: Date.now() }] }),
  });
  expect(res.status).toBe(200);
  const [first] = (await res.json()) as { url: string; key: string }[];
  if (!first) throw new Error("no presigned URL");
  return first;
}

export const isStored = (ctx: FakeContext, key: string): boolean =>
  existsSync(path.join(ctx.dir, key)) || existsSync(path.join(ctx.dir, `${key}.json`));
export const tempFiles = (ctx: FakeContext): Promise<string[]> => readdir(path.join(ctx.dir, ".tmp"));

/** Awaits a rejected upload and checks it is the SDK's UPLOAD_FAILED. */
export async function expectUploadFailure(ctx: FakeContext, promise: Promise<unknown>): Promise<{ message: string; data: unknown }> {
  const error: unknown = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(ctx.server.UploadThingError);
  const { code, message, data } = error as InstanceType<typeof ctx.server.UploadThingError>;
  expect(code).toBe("UPLOAD_FAILED");
  return { message, data };
}
