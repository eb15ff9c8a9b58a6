// What the browser is told before an upload (components/photos/upload-checks.ts) and which hosts
// the CSP and next/image allow for photos (lib/uploads/hosts.ts), for the local fake and production.
import { describe, expect, it } from "vitest";
import { checkPhotoFiles, explainUploadError } from "@/components/photos/upload-checks";
import { MAX_PHOTO_BYTES } from "@/lib/photos/limits";
import { isLocalUploadService, photoImagePatterns, uploadCspSources } from "@/lib/uploads/hosts";
import { localUploadthingEnv } from "@/lib/uploads/env";

const file = (name: string, type: string, size: number): File => {
  const f = new File([new Uint8Array(Math.min(size, 16))], name, { type });
  Object.defineProperty(f, "size", { value: size });
  return f;
};

describe("checkPhotoFiles", () => {
  it("keeps JPEG, PNG and WebP within the limit and names every file it refuses", () => {
    const ok = [file("a.jpg", "image/jpeg", 1000), file("b.png", "image/png", MAX_PHOTO_BYTES), file("c.webp", "image/webp", 10)];
    const { accepted, problems } = checkPhotoFiles([...ok, file("d.heic", "image/heic", 10), file("e.jpg", "image/jpeg", MAX_PHOTO_BYTES + 1), file("f.png", "image/png", 0)]);
    expect(accepted.map((f) => f.name)).toEqual(["a.jpg", "b.png", "c.webp"]);
    expect(problems).toEqual([
      "d.heic is not a JPEG, PNG or WebP photo. On an iPhone, set Settings › Camera › Formats to “Most Compatible”.",
      "e.jpg: The photo is 8.0 MB; the limit is 8.0 MB.",
      "f.png: The file is empty.",
    ]);
  });

  it("keeps the first ten of a larger selection and says so", () => {
    const many = Array.from({ length: 12 }, (_, i) => file(`p${i}.jpg`, "image/jpeg", 100));
    const { accepted, problems } = checkPhotoFiles(many);
    expect(accepted.map((f) => f.name)).toEqual(many.slice(0, 10).map((f) => f.name));
    expect(problems).toEqual(["Upload at most 10 photos at a time; the first 10 are kept."]);
  });

  it("explains the SDK's technical errors and passes the server's own messages through", () => {
    expect(explainUploadError("Invalid config: FileSizeMismatch")).toBe("A photo is larger than 8.0 MB.");
    expect(explainUploadError("XHR failed 413 Payload Too Large")).toBe("The upload was interrupted. Check the connection and try again.");
    expect(explainUploadError("Press not found")).toBe("Press not found");
  });
});

describe("photo hosts", () => {
  it("allows exactly the local fake's origins when it is configured", () => {
    const env = { ...localUploadthingEnv(4011), UPLOADTHING_LOCAL_FAKE: "1" };
    expect(uploadCspSources(env)).toEqual({
      img: ["http://localhost:4011", "https://*.ufs.sh"],
      connect: ["http://127.0.0.1:4011", "https://*.ingest.uploadthing.com"],
    });
    expect(photoImagePatterns(env)[0]).toEqual({ protocol: "http", hostname: "localhost", port: "4011", pathname: "/**" });
    expect(isLocalUploadService(env)).toBe(true);
    expect(isLocalUploadService({ UPLOADTHING_UFS_HOST: "127.0.0.1:4010" })).toBe(true);
  });

  it("uses only the hosted service's hosts in production, where only the token is set", () => {
    const env = { UPLOADTHING_TOKEN: "token" };
    expect(uploadCspSources(env)).toEqual({ img: ["https://*.ufs.sh"], connect: ["https://*.ingest.uploadthing.com"] });
    expect(photoImagePatterns(env)).toEqual([{ protocol: "https", hostname: "*.ufs.sh", pathname: "/f/**" }]);
    expect(isLocalUploadService(env)).toBe(false);
  });
});
