// Serves a Next.js route handler module (GET/POST taking a NextRequest) on a real loopback port,
// so the upload service fake can deliver its callbacks to it as it would to the running app.
import http from "node:http";
import type { AddressInfo } from "node:net";
import { NextRequest } from "next/server";

/** A Node request's headers (Host kept: the SDK derives the callback URL from it) and its body. */
export async function readNodeRequest(req: http.IncomingMessage): Promise<{ headers: Headers; body: ReturnType<typeof Buffer.concat> }> {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  const headers = new Headers();
  for (const [name, value] of Object.entries(req.headers)) {
    if (typeof value === "string" && !["connection", "content-length", "transfer-encoding"].includes(name)) headers.set(name, value);
  }
  return { headers, body: Buffer.concat(chunks) };
}

export async function sendWebResponse(res: http.ServerResponse, response: Response): Promise<void> {
  res.writeHead(response.status, Object.fromEntries(response.headers));
  res.end(Buffer.from(await response.arrayBuffer()));
}

type Handler = (req: NextRequest) => Promise<Response>;

export type ServedRoute = { origin: string; url: string; close: () => Promise<void> };

export async function serveRoute(pathname: string, handlers: { GET: Handler; POST: Handler }): Promise<ServedRoute> {
  const server = http.createServer((req, res) => {
    void (async () => {
      const handler = req.method === "GET" ? handlers.GET : req.method === "POST" ? handlers.POST : null;
      if (!handler || !req.url?.startsWith(pathname)) {
        res.writeHead(404).end();
        return;
      }
      const { headers, body } = await readNodeRequest(req);
      const request = new NextRequest(`http://${req.headers.host}${req.url}`, { method: req.method, headers, body: req.method === "POST" ? body : undefined });
      await sendWebResponse(res, await handler(request));
    })().catch((error: unknown) => {
      console.error("route server failed", error);
      res.writeHead(500).end();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    origin,
    url: `${origin}${pathname}`,
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
