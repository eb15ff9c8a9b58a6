// Hardening #2 (and the path half of #5): no route reads a body whole before its limit. A declared Content-Length over the
// limit is refused before reading; a chunked body is cancelled as soon as it passes the limit (the
// test counts how much of an endless stream was pulled). The production wrapper's overall cap
// (scripts/lib/request-guards.mjs) is tested on a plain node:http server. The memory figure under 20
// concurrent oversized requests comes from `npm run bench:body-limit`, never from a timed assertion.
import { createServer, request as httpRequest, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as signInRoute } from "@/app/api/auth/sign-in/route";
import { POST as sizingRoute } from "@/app/api/sizing/route";
import { JSON_BODY_LIMIT, readJsonBody } from "@/lib/http";
// @ts-expect-error -- plain ES module of the production server, no type declarations
import { capRequestBody, refuseMalformedPath } from "@/scripts/lib/request-guards.mjs";

const noContext = {} as never;
const CHUNK = 16 * 1024;

/** An endless body: counts the bytes the reader pulled. */
function endlessBody(): { stream: ReadableStream<Uint8Array>; pulled: () => number } {
  let pulled = 0;
  const chunk = new Uint8Array(CHUNK).fill(0x20);
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      pulled += chunk.byteLength;
      controller.enqueue(chunk);
    },
  });
  return { stream, pulled: () => pulled };
}

function streamingRequest(path: string, body: ReadableStream<Uint8Array>, headers: Record<string, string> = {}): NextRequest {
  return new NextRequest(`http://127.0.0.1:3000${path}`, {
    method: "POST",
    body,
    duplex: "half",
    headers: { "content-type": "application/json", origin: "http://127.0.0.1:3000", host: "127.0.0.1:3000", ...headers },
  } as ConstructorParameters<typeof NextRequest>[1]);
}

const routes = [
  { name: "POST /api/sizing", path: "/api/sizing", handler: sizingRoute },
  { name: "POST /api/auth/sign-in", path: "/api/auth/sign-in", handler: signInRoute },
];

describe.each(routes)("$name", ({ path, handler }) => {
  it("refuses a declared 200 MB body at once, before reading any of it", async () => {
    const { stream, pulled } = endlessBody();
    const res = await handler(streamingRequest(path, stream, { "content-length": String(200 * 1024 * 1024) }), noContext);
    expect(res.status).toBe(413);
    const body = (await res.json()) as { error: string; fieldErrors: Record<string, string[]> };
    expect(body.fieldErrors.body).toEqual(["Send at most 64 kB of JSON."]);
    // Only what the stream machinery buffers ahead on its own, nothing the route asked for.
    expect(pulled()).toBeLessThanOrEqual(2 * CHUNK);
  });

  it("stops reading a chunked body just past the 64 kB limit", async () => {
    const { stream, pulled } = endlessBody();
    const res = await handler(streamingRequest(path, stream), noContext);
    expect(res.status).toBe(413);
    expect(pulled()).toBeGreaterThan(JSON_BODY_LIMIT);
    expect(pulled()).toBeLessThanOrEqual(JSON_BODY_LIMIT + 3 * CHUNK);
  });
});

describe("readJsonBody", () => {
  const req = (body: string, headers: Record<string, string> = {}) =>
    new Request("http://127.0.0.1/x", { method: "POST", body, headers: { "content-type": "application/json", ...headers } });

  it("reads a body at the limit and refuses one byte more, and a malformed Content-Length", async () => {
    const atLimit = JSON.stringify({ pad: "x".repeat(JSON_BODY_LIMIT - 10) });
    expect(atLimit.length).toBe(JSON_BODY_LIMIT);
    await expect(readJsonBody(req(atLimit))).resolves.toEqual({ pad: expect.any(String) });
    await expect(readJsonBody(req(`${atLimit} `))).rejects.toMatchObject({ name: "PayloadTooLargeError" });
    await expect(readJsonBody(req("{}", { "content-length": "-1" }))).rejects.toMatchObject({ name: "PayloadTooLargeError" });
  });

  it("calls an empty or broken body malformed", async () => {
    await expect(readJsonBody(req(""))).rejects.toMatchObject({ name: "MalformedBodyError" });
    await expect(readJsonBody(req("{nope"))).rejects.toMatchObject({ name: "MalformedBodyError" });
  });
});

describe("the production server's overall cap (scripts/lib/request-guards.mjs)", () => {
  const CAP = 256 * 1024;
  let server: Server;
  let port = 0;
  let bodiesRead = 0;

  beforeAll(async () => {
    server = createServer((req, res) => {
      if (!refuseMalformedPath(req, res) || !capRequestBody(req, res, CAP)) return;
      let size = 0;
      req.on("data", (c: Buffer) => (size += c.length));
      req.on("end", () => {
        bodiesRead += 1;
        res.end(JSON.stringify({ size }));
      });
      req.on("error", () => undefined);
    });
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    port = (server.address() as AddressInfo).port;
  });
  afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

  /** Sends `total` bytes (chunked unless a length is declared); resolves with the status, or "closed". */
  function send(total: number, declare: string | null): Promise<number | "closed"> {
    return new Promise((resolve) => {
      const headers: Record<string, string> = declare === null ? { "transfer-encoding": "chunked" } : { "content-length": declare };
      const req = httpRequest({ host: "127.0.0.1", port, method: "POST", path: "/", headers }, (res) => {
        res.resume();
        resolve(res.statusCode ?? 0);
      });
      req.on("error", () => resolve("closed"));
      const chunk = Buffer.alloc(CHUNK, 0x20);
      let sent = 0;
      const write = (): void => {
        while (sent < total) {
          sent += CHUNK;
          if (!req.write(chunk)) return void req.once("drain", write);
        }
        req.end();
      };
      write();
    });
  }

  it("passes a body under the cap", async () => {
    const before = bodiesRead;
    expect(await send(CAP - CHUNK, null)).toBe(200);
    expect(bodiesRead).toBe(before + 1);
  });

  it("answers 413 to a declared length over the cap without reading it", async () => {
    const before = bodiesRead;
    expect(await send(CHUNK, String(200 * 1024 * 1024))).toBe(413);
    expect(bodiesRead).toBe(before);
  });

  it("answers 400 to a path with a malformed percent-escape (Next.js alone answers 500)", async () => {
    for (const path of ["/api/presses/%ff", "/api/photos/%E0%A4%A", "/%"]) {
      const res = await fetch(`http://127.0.0.1:${port}${path}`);
      expect(res.status, path).toBe(400);
      expect(((await res.json()) as { error: string }).error).toMatch(/percent-escape/);
    }
    expect((await fetch(`http://127.0.0.1:${port}/api/presses/%41?q=%ff`)).status).toBe(200);
  });

  it("cuts off a chunked body that passes the cap", async () => {
    const before = bodiesRead;
    const outcome = await send(8 * CAP, null);
    expect([413, "closed"]).toContain(outcome);
    expect(bodiesRead).toBe(before);
  });
});
