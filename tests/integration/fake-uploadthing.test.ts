// The local upload fake against the real SDK (spec §6): the browser client's uploadFiles and the
// route handler's callbacks, in both delivery modes, and the uploads the fake must refuse.
import { describe, expect, it } from "vitest";
import { bytesOf, expectUploadFailure, isStored, md5, pngFile, rewritingFetch, tempFiles, uploader, setupFakeUploadthing } from "./fake-uploadthing/context";
import type { Mode } from "./fake-uploadthing/test-app";

const CALLBACK_TIMEOUT_MS = 2000;
const ctx = setupFakeUploadthing(CALLBACK_TIMEOUT_MS);

describe.each<Mode>(["dev", "prod"])("uploads through the browser client (%s callbacks)", (mode) => {
  it("stores the files, runs onUploadComplete once each and returns its server data", async () => {
    const files = [await pngFile("gauge plate #1.png"), await pngFile("ram seal.png")];
    const before = ctx.app.completed.length;
    const results = await uploader(ctx, mode).uploadFiles("photo", { files });

    expect(results).toHaveLength(2);
    const calls = ctx.app.completed.slice(before);
    expect(calls.map((c) => c.name).sort()).toEqual(["gauge plate #1.png", "ram seal.png"]);
    for (const [i, result] of results.entries()) {
      const original = await bytesOf(files[i]!);
      expect(calls.filter((c) => c.key === result.key)).toEqual([
        { mode, metadata: { uploader: "member-7", mode }, name: files[i]!.name, key: result.key, ufsUrl: result.ufsUrl, fileHash: md5(original) },
      ]);
      expect(result.serverData).toEqual({ photoId: `photo-${result.key}`, uploadedBy: "member-7" });
      expect(result.fileHash).toBe(md5(original));
      expect(result.ufsUrl).toBe(`http://localhost:${ctx.fake.port}/a/localapp/${result.key}`);

      const served = await fetch(result.ufsUrl);
      expect(served.status).toBe(200);
      expect(served.headers.get("content-type")).toBe("image/png");
      expect(served.headers.get("content-length")).toBe(String(original.length));
      expect(served.headers.get("x-content-type-options")).toBe("nosniff");
      expect(new Uint8Array(await served.arrayBuffer())).toEqual(original);
    }
    // The name travels double-encoded in the presigned URL and comes back exact.
    const named = results.find((r) => r.name === "gauge plate #1.png")!;
    const head = await fetch(`http://localhost:${ctx.fake.port}/f/${named.key}`, { method: "HEAD" });
    expect(head.status).toBe(200);
    expect(head.headers.get("content-disposition")).toBe(`inline; filename="gauge plate #1.png"; filename*=UTF-8''gauge%20plate%20%231.png`);
  });

  it("refuses a presigned URL whose signature or signed size was changed, storing nothing", async () => {
    const raiseSize = (url: URL) => url.searchParams.set("x-ut-file-size", String(Number(url.searchParams.get("x-ut-file-size")) + 1));
    const changeDigit = (url: URL) => {
      const signature = url.searchParams.get("signature")!;
      url.searchParams.set("signature", signature.slice(0, -1) + (signature.endsWith("a") ? "b" : "a"));
    };
    for (const rewrite of [raiseSize, changeDigit]) {
      const keys: string[] = [];
      const before = ctx.app.completed.length;
      const upload = uploader(ctx, mode, rewritingFetch(rewrite, keys)).uploadFiles("photo", { files: [await pngFile("weld.png")] });
      const failure = await expectUploadFailure(ctx, upload);
      expect(failure).toEqual({ message: "XHR failed 403 Forbidden", data: { error: "Invalid signature" } });
      expect(keys).toHaveLength(1);
      expect(isStored(ctx, keys[0]!)).toBe(false);
      expect(ctx.app.completed.length).toBe(before);
    }
    expect(await tempFiles(ctx)).toEqual([]);
  });

  it("refuses an expired presigned URL", async () => {
    const keys: string[] = [];
    const upload = uploader(ctx, mode, rewritingFetch(() => {}, keys)).uploadFiles("expired", { files: [await pngFile("old.png")] });
    const failure = await expectUploadFailure(ctx, upload);
    expect(failure).toEqual({ message: "XHR failed 403 Forbidden", data: { error: "URL expired" } });
    expect(isStored(ctx, keys[0]!)).toBe(false);
  });

  it("fails at once, not by timeout, when the app rejects the callback's signature", async () => {
    ctx.app.controls.tamperCallbackSignature = true;
    try {
      const before = ctx.app.completed.length;
      const keys: string[] = [];
      const upload = uploader(ctx, mode, rewritingFetch(() => {}, keys)).uploadFiles("photo", { files: [await pngFile("leak.png")] });
      const failure = await expectUploadFailure(ctx, upload);
      expect(failure.message).toBe("XHR failed 500 Internal Server Error");
      // The cause reported is the app's refusal, which the fake learns of immediately.
      const cause =
        mode === "dev"
          ? /^Upload callback failed: Failed to forward callback request from dev stream/
          : /^The app refused the callback request with status 400$/;
      expect((failure.data as { error: string }).error).toMatch(cause);
      expect(ctx.app.completed.length).toBe(before);
      const listed = await new ctx.server.UTApi().listFiles();
      expect(listed.files.find((f) => f.key === keys[0])?.status).toBe("Failed");
    } finally {
      ctx.app.controls.tamperCallbackSignature = false;
    }
  });

  it("fails after the callback timeout when onUploadComplete throws, instead of hanging", async () => {
    ctx.app.controls.throwInCallback = true;
    try {
      const upload = uploader(ctx, mode).uploadFiles("photo", { files: [await pngFile("crack.png")] });
      const failure = await expectUploadFailure(ctx, upload);
      expect(failure).toEqual({
        message: "XHR failed 500 Internal Server Error",
        data: { error: `The app sent no callback result within ${CALLBACK_TIMEOUT_MS} ms` },
      });
    } finally {
      ctx.app.controls.throwInCallback = false;
    }
  });
});

describe("dev-mode registration arriving late", () => {
  it("completes the upload when /route-metadata is delayed by a second", async () => {
    ctx.app.controls.metadataDelayMs = 1000;
    try {
      const [result] = await uploader(ctx, "dev").uploadFiles("photo", { files: [await pngFile("late.png")] });
      expect(result?.serverData).toEqual({ photoId: `photo-${result?.key}`, uploadedBy: "member-7" });
    } finally {
      ctx.app.controls.metadataDelayMs = 0;
    }
  });
});
