// The local upload fake, part two: the presigned-URL checks seen from a raw HTTP client, CORS,
// the API key, and the UTApi endpoints through the real server SDK.
import { readFile } from "node:fs/promises";
import path from "node:path";
import { describe, expect, it, vi } from "vitest";
import { LOCAL_UPLOADTHING_TOKEN } from "@/lib/uploads/env";
import { isStored, presign, tempFiles, setupFakeUploadthing } from "./fake-uploadthing/context";

const ctx = setupFakeUploadthing(2000);
const fakeUrl = (pathname: string): string => `http://127.0.0.1:${ctx.fake.port}${pathname}`;

function put(url: string, bytes: number, headers: Record<string, string> = {}): Promise<Response> {
  const form = new FormData();
  form.append("file", new Blob([new Uint8Array(bytes).fill(7)], { type: "image/png" }), "plate.png");
  return fetch(url, { method: "PUT", body: form, headers: { range: "bytes=0-", ...headers } });
}

describe("presigned upload URLs", () => {
  it("answers HEAD with the resume offset and CORS headers, and refuses a resume", async () => {
    const { url, key } = await presign(ctx, "prod", 64);
    const head = await fetch(url, { method: "HEAD" });
    expect(head.status).toBe(200);
    expect(head.headers.get("x-ut-range-start")).toBe("0");
    expect(head.headers.get("access-control-expose-headers")).toBe("x-ut-range-start");
    const resumed = await put(url, 64, { range: "bytes=10-" });
    expect(resumed.status).toBe(416);
    expect(isStored(ctx, key)).toBe(false);
  });

  it("refuses a body larger than the signed size with 413, stores nothing and runs onUploadError", async () => {
    const { url, key } = await presign(ctx, "prod", 64);
    const res = await put(url, 65);
    expect(res.status).toBe(413);
    expect(await res.json()).toEqual({ error: "Upload is larger than the signed size of 64 bytes" });
    expect(res.headers.get("access-control-allow-origin")).toBe("*");
    expect(isStored(ctx, key)).toBe(false);
    expect(await tempFiles(ctx)).toEqual([]);
    await vi.waitFor(() => expect(ctx.app.failed.find((f) => f.key === key)?.message).toContain("larger than the signed size"));
  });

  it("refuses an incomplete body and a URL with a parameter missing", async () => {
    const { url, key } = await presign(ctx, "prod", 64);
    const short = await put(url, 63);
    expect(short.status).toBe(400);
    expect(await short.json()).toEqual({ error: "Incomplete upload: 63 of 64 bytes received" });
    expect(isStored(ctx, key)).toBe(false);

    const unsized = new URL(url);
    unsized.searchParams.delete("x-ut-file-size");
    expect((await put(unsized.href, 64)).status).toBe(400);
  });

  it("accepts the signed size exactly once", async () => {
    const { url, key } = await presign(ctx, "prod", 64);
    const first = await put(url, 64);
    expect(first.status).toBe(200);
    expect(await first.json()).toMatchObject({ ufsUrl: `http://localhost:${ctx.fake.port}/a/localapp/${key}`, serverData: { photoId: `photo-${key}` } });
    const again = await put(url, 64);
    expect(again.status).toBe(409);
  });

  it("answers a CORS preflight with 204 and the headers the browser asks for", async () => {
    const res = await fetch(fakeUrl("/somekey"), {
      method: "OPTIONS",
      headers: { origin: "http://127.0.0.1:3000", "access-control-request-method": "PUT", "access-control-request-headers": "range,x-uploadthing-version,b3,traceparent" },
    });
    expect(res.status).toBe(204);
    expect(res.headers.get("access-control-allow-origin")).toBe("*");
    expect(res.headers.get("access-control-allow-methods")).toBe("GET,HEAD,PUT,POST,OPTIONS");
    expect(res.headers.get("access-control-allow-headers")).toBe("range,x-uploadthing-version,b3,traceparent");
    expect(res.headers.get("access-control-expose-headers")).toBe("x-ut-range-start");
  });
});

describe("API key", () => {
  it("refuses the app and UTApi endpoints with a wrong key (401)", async () => {
    for (const pathname of ["/v6/listFiles", "/route-metadata", "/callback-result"]) {
      const res = await fetch(fakeUrl(pathname), { method: "POST", headers: { "x-uploadthing-api-key": "sk_wrong" }, body: "{}" });
      expect(res.status).toBe(401);
    }
  });

  it("makes UTApi throw when its token carries another key", async () => {
    const wrong = Buffer.from(JSON.stringify({ apiKey: "sk_wrong", appId: "localapp", regions: ["local"] })).toString("base64");
    // The SDK surfaces the fake's 401 as a ResponseError.
    await expect(new ctx.server.UTApi({ token: wrong }).listFiles()).rejects.toMatchObject({ _tag: "ResponseError", response: { status: 401 } });
    await expect(new ctx.server.UTApi({ token: LOCAL_UPLOADTHING_TOKEN }).listFiles()).resolves.toMatchObject({ hasMore: false });
  });
});

describe("UTApi lifecycle", () => {
  it("uploads, lists, renames, makes private, signs and deletes a file", async () => {
    const utapi = new ctx.server.UTApi();
    const { UTFile } = ctx.server;
    const uploaded = await utapi.uploadFiles(new UTFile(["press log, week 12"], "a.txt", { customId: "log-12" }));
    expect(uploaded.error).toBeNull();
    // Picked field by field: the result's url/appUrl getters log deprecation warnings.
    const { key, name, size, customId, ufsUrl } = uploaded.data!;
    expect({ name, size, customId, ufsUrl }).toEqual({ name: "a.txt", size: 18, customId: "log-12", ufsUrl: `http://localhost:${ctx.fake.port}/a/localapp/${key}` });

    const duplicate = await utapi.uploadFiles(new UTFile(["another"], "b.txt", { customId: "log-12" }));
    expect(duplicate.error?.code).toBe("UPLOAD_FAILED");

    const listed = await utapi.listFiles();
    expect(listed.files.find((f) => f.key === key)).toMatchObject({ customId: "log-12", name: "a.txt", size: 18, status: "Uploaded" });
    const { data: urls } = await utapi.getFileUrls(key);
    expect(urls).toEqual([{ key, url: ufsUrl }]);
    const served = await fetch(urls[0]!.url);
    expect(served.headers.get("content-type")).toBe("text/plain");
    expect(await served.text()).toBe("press log, week 12");
    expect((await fetch(`http://localhost:${ctx.fake.port}/a/otherapp/${key}`)).status).toBe(404);

    expect(await utapi.renameFiles({ customId: "log-12", newName: "week-12.txt" })).toEqual({ success: true });
    expect((await utapi.listFiles()).files.find((f) => f.key === key)?.name).toBe("week-12.txt");
    expect((await fetch(urls[0]!.url, { method: "HEAD" })).headers.get("content-disposition")).toContain("filename*=UTF-8''week-12.txt");

    expect(await utapi.updateACL(key, "private")).toEqual({ success: true });
    expect((await fetch(urls[0]!.url)).status).toBe(403);
    const { ufsUrl: signed } = await utapi.generateSignedURL(key, { expiresIn: 60 });
    expect((await fetch(signed)).status).toBe(200);
    const access = await utapi.getSignedURL(key, { expiresIn: 60 });
    expect((await fetch(access.url)).status).toBe(200);
    const forged = signed.replace(/signature=hmac-sha256%3D[0-9a-f]/, "signature=hmac-sha256%3Dx");
    expect((await fetch(forged)).status).toBe(403);

    const usage = await utapi.getUsageInfo();
    expect(usage.filesUploaded).toBe(listed.files.length);
    expect(usage.totalBytes).toBe(listed.files.reduce((sum, f) => sum + f.size, 0));

    expect(await utapi.deleteFiles(key)).toEqual({ success: true, deletedCount: 1 });
    expect((await fetch(signed)).status).toBe(404);
    await expect(readFile(path.join(ctx.dir, key))).rejects.toMatchObject({ code: "ENOENT" });
    expect((await utapi.listFiles()).files.some((f) => f.key === key)).toBe(false);
    expect(await utapi.deleteFiles(key)).toEqual({ success: true, deletedCount: 0 });
  });
});
