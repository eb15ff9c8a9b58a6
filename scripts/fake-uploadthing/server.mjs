#!/usr/bin/env node
// Local fake of the UploadThing service (spec: shared/design/uploads-local-fake.md). One process
// serves ingest, API and files on FAKE_UT_PORT, on 127.0.0.1 and ::1 (localhost may resolve to
// either). The app reaches it only through the SDK's UPLOADTHING_* environment variables.
import http from "node:http";
import { handleApi } from "./api.mjs";
import { Callbacks } from "./callbacks.mjs";
import { loadConfig } from "./config.mjs";
import { serveFile } from "./files.mjs";
import { HttpError, readJson, sendError, sendJson, setCors } from "./http-util.mjs";
import { handleIngest } from "./ingest.mjs";
import { sameSecret } from "./signing.mjs";
import { Storage } from "./storage.mjs";

const log = (message) => console.log(`${new Date().toISOString()} ${message}`);
const config = loadConfig();
const ctx = { config, log, port: 0, storage: new Storage(config.dir), callbacks: new Callbacks(config, log), inFlight: new Set() };

async function authorizedPost(req, res, pathname) {
  if (!sameSecret(req.headers["x-uploadthing-api-key"], config.apiKey)) throw new HttpError(401, "Invalid API key");
  const body = await readJson(req);
  if (pathname === "/route-metadata") return ctx.callbacks.register(req, res, body);
  if (pathname === "/callback-result") {
    // A result nobody waits for (awaitServerData false, or after a timeout) is still acknowledged
    // for a known file, so the app logs no error.
    const known = ctx.callbacks.result(body) || (await ctx.storage.get(String(body.fileKey))) !== null;
    return known ? sendJson(res, 200, { ok: true }) : sendError(res, 404, "Unknown file key");
  }
  return sendJson(res, 200, await handleApi(ctx, pathname, body));
}

async function route(req, res) {
  setCors(req, res);
  if (req.method === "OPTIONS") {
    res.writeHead(204);
    res.end();
    return;
  }
  const { pathname } = new URL(req.url ?? "/", "http://fake");
  const parts = pathname.split("/").slice(1);
  const read = req.method === "GET" || req.method === "HEAD";
  if (pathname === "/_fake/health" && read) return sendJson(res, 200, { service: "fake-uploadthing", appId: config.appId });
  if (req.method === "POST" && (pathname === "/route-metadata" || pathname === "/callback-result" || pathname.startsWith("/v6/")))
    return authorizedPost(req, res, pathname);
  if (read && parts[0] === "a" && parts.length === 3) return serveFile(ctx, req, res, parts[2], parts[1]);
  if (read && parts[0] === "f" && parts.length === 2) return serveFile(ctx, req, res, parts[1]);
  if ((req.method === "PUT" || req.method === "HEAD") && parts.length === 1 && parts[0]) return handleIngest(ctx, req, res, parts[0]);
  throw new HttpError(404, "Not found");
}

function handle(req, res) {
  route(req, res).catch((error) => {
    if (error instanceof HttpError) return sendError(res, error.status, error.message);
    log(`internal error on ${req.method} ${req.url}: ${error.stack ?? error}`);
    sendError(res, 500, "Internal error in the upload fake");
  });
}

function listen(host, port) {
  return new Promise((resolve, reject) => {
    const server = http.createServer(handle);
    server.once("error", reject);
    server.listen({ host, port, ipv6Only: host === "::1" }, () => resolve(server));
  });
}

const servers = [await listen("127.0.0.1", config.port)];
ctx.port = servers[0].address().port;
try {
  servers.push(await listen("::1", ctx.port));
} catch (error) {
  // A host without IPv6 is fine; another program on [::1]:port would get our localhost traffic.
  if (error.code === "EADDRINUSE") {
    console.error(`fake-uploadthing: port ${ctx.port} is taken on ::1 by another program`);
    process.exit(1);
  }
  log(`not listening on ::1 (${error.code}); localhost must resolve to 127.0.0.1`);
}
log(`fake-uploadthing ready on http://127.0.0.1:${ctx.port} (app ${config.appId}, files in ${config.dir})`);

function shutdown() {
  ctx.callbacks.closeAll();
  for (const server of servers) {
    server.close();
    server.closeAllConnections();
  }
  setTimeout(() => process.exit(0), 200).unref();
}
process.on("SIGTERM", shutdown);
process.on("SIGINT", shutdown);
