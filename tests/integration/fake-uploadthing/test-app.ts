// The app side of the round trip: file routes built with the real SDK's createUploadthing and
// createRouteHandler, served by node:http under /dev/api/uploadthing (isDev: the SDK streams
// callbacks from /route-metadata) and /prod/api/uploadthing (the fake POSTs callbacks).
// Import it only after UPLOADTHING_* are set: the SDK reads its configuration from the environment.
import http from "node:http";
import type { AddressInfo } from "node:net";
import { createRouteHandler, createUploadthing, type FileRouter } from "uploadthing/server";
import { readNodeRequest, sendWebResponse } from "./serve-route";

export type Mode = "dev" | "prod";
export type CompletedCall = { mode: Mode; metadata: Record<string, unknown>; name: string; key: string; ufsUrl: string; fileHash: string };

/** Switches the tests flip to provoke failures. */
export type Controls = {
  /** onUploadComplete throws, so the app never reports a callback result. */
  throwInCallback: boolean;
  /** The app's HTTP layer changes one digit of x-uploadthing-signature on incoming callbacks. */
  tamperCallbackSignature: boolean;
  /** The SDK's POST /route-metadata is held back this long. */
  metadataDelayMs: number;
};

function makeRouter(mode: Mode, controls: Controls, completed: CompletedCall[], failed: { key: string; message: string }[]) {
  const f = createUploadthing();
  const complete = ({ metadata, file }: { metadata: Record<string, unknown>; file: { name: string; key: string; ufsUrl: string; fileHash: string } }) => {
    completed.push({ mode, metadata, name: file.name, key: file.key, ufsUrl: file.ufsUrl, fileHash: file.fileHash });
    if (controls.throwInCallback) throw new Error("pipeline failed");
    return { photoId: `photo-${file.key}`, uploadedBy: String(metadata.uploader) };
  };
  return {
    photo: f({ "image/png": { maxFileSize: "1MB", maxFileCount: 2 } })
      .middleware(() => ({ uploader: "member-7", mode }))
      .onUploadError(({ error, fileKey }) => {
        failed.push({ key: fileKey, message: error.message });
      })
      .onUploadComplete(complete),
    expired: f({ "image/png": { maxFileSize: "1MB" } }, { presignedURLTTL: -60 })
      .middleware(() => ({ uploader: "member-7", mode }))
      .onUploadComplete(complete),
  } satisfies FileRouter;
}

export type TestRouter = ReturnType<typeof makeRouter>;

function flipLastHexDigit(signature: string): string {
  const last = signature.at(-1) === "0" ? "1" : "0";
  return signature.slice(0, -1) + last;
}

export async function startTestApp() {
  const controls: Controls = { throwInCallback: false, tamperCallbackSignature: false, metadataDelayMs: 0 };
  const completed: CompletedCall[] = [];
  const failed: { key: string; message: string }[] = [];
  const sdkFetch: typeof fetch = async (input, init) => {
    const url = input instanceof Request ? input.url : String(input);
    if (controls.metadataDelayMs > 0 && url.endsWith("/route-metadata")) await new Promise((r) => setTimeout(r, controls.metadataDelayMs));
    return fetch(input, init);
  };
  const handlers = {
    dev: createRouteHandler({ router: makeRouter("dev", controls, completed, failed), config: { isDev: true, fetch: sdkFetch } }),
    prod: createRouteHandler({ router: makeRouter("prod", controls, completed, failed), config: { isDev: false, fetch: sdkFetch } }),
  };

  const server = http.createServer((req, res) => {
    void (async () => {
      const mode = req.url?.startsWith("/dev/api/uploadthing") ? "dev" : req.url?.startsWith("/prod/api/uploadthing") ? "prod" : null;
      if (!mode) {
        res.writeHead(404).end();
        return;
      }
      const { headers, body } = await readNodeRequest(req);
      const signature = headers.get("x-uploadthing-signature");
      if (controls.tamperCallbackSignature && signature) headers.set("x-uploadthing-signature", flipLastHexDigit(signature));
      const hasBody = req.method !== "GET" && req.method !== "HEAD";
      const request = new Request(`http://${req.headers.host}${req.url}`, { method: req.method, headers, body: hasBody ? body : undefined });
      await sendWebResponse(res, await handlers[mode](request));
    })().catch((error: unknown) => {
      console.error("test app failed", error);
      res.writeHead(500).end();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    origin,
    controls,
    completed,
    failed,
    endpoint: (mode: Mode) => `${origin}/${mode}/api/uploadthing`,
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

export type TestApp = Awaited<ReturnType<typeof startTestApp>>;
