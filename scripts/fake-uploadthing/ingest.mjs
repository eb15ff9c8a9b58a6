// PUT|HEAD /{key}: the presigned upload URL (spec §1.3-1.6, §5). The signature and expiry are
// checked before a byte is stored; the body may not exceed the signed size.
import { randomUUID } from "node:crypto";
import { HttpError, KEY_PATTERN, sendError, sendJson } from "./http-util.mjs";
import { receiveUpload } from "./receive.mjs";
import { checkSignedUrl } from "./signing.mjs";
import { fileUrls } from "./urls.mjs";

const REQUIRED = ["expires", "x-ut-identifier", "x-ut-file-name", "x-ut-file-size", "signature"];
const DISPOSITIONS = new Set(["inline", "attachment"]);
const ACLS = new Set(["public-read", "private"]);

/** The SDK encodes each value with encodeURIComponent before URLSearchParams adds its own layer. */
function readParams(req) {
  const sp = new URL(req.url, "http://ingest").searchParams;
  for (const name of REQUIRED) if (!sp.get(name)) throw new HttpError(400, `Missing ${name}`);
  const get = (name) => {
    const raw = sp.get(name);
    if (raw === null) return null;
    try {
      return decodeURIComponent(raw);
    } catch {
      throw new HttpError(400, `Malformed ${name}`);
    }
  };
  const size = Number(get("x-ut-file-size"));
  if (!Number.isSafeInteger(size) || size < 0) throw new HttpError(400, "x-ut-file-size must be a whole number of bytes");
  const disposition = get("x-ut-content-disposition") ?? "inline";
  const acl = get("x-ut-acl") ?? "public-read";
  if (!DISPOSITIONS.has(disposition) || !ACLS.has(acl)) throw new HttpError(400, "Invalid content disposition or ACL");
  return {
    appId: get("x-ut-identifier"),
    name: get("x-ut-file-name"),
    size,
    type: get("x-ut-file-type") ?? "",
    slug: get("x-ut-slug"),
    customId: get("x-ut-custom-id"),
    disposition,
    acl,
  };
}

function checkRange(header) {
  if (header === undefined) return;
  const match = /^bytes=(\d+)-$/.exec(header);
  // HEAD always reports x-ut-range-start: 0, so a well-behaved client never asks to resume.
  if (!match || match[1] !== "0") throw new HttpError(416, "Resuming is not supported: upload from byte 0");
}

export async function handleIngest(ctx, req, res, key) {
  const { config, storage } = ctx;
  if (!KEY_PATTERN.test(key)) throw new HttpError(400, "Invalid file key");
  const params = readParams(req);
  if (params.appId !== config.appId) throw new HttpError(400, "x-ut-identifier does not match this app");
  const refused = checkSignedUrl(req, config.apiKey);
  if (refused) throw new HttpError(refused.status, refused.error);
  if (req.method === "HEAD") {
    res.writeHead(200, { "x-ut-range-start": "0" });
    res.end();
    return;
  }
  checkRange(req.headers.range);
  // A presigned URL is good for one file: replacing bytes the app has already checked is refused.
  if (ctx.inFlight.has(key) || (await storage.get(key))) throw new HttpError(409, "This file has already been uploaded");
  ctx.inFlight.add(key);
  try {
    await storeUpload(ctx, req, res, key, params);
  } finally {
    ctx.inFlight.delete(key);
  }
}

async function storeUpload(ctx, req, res, key, params) {
  const { config, storage, callbacks } = ctx;
  if (params.customId !== null && (await storage.findByCustomId(params.customId))) throw new HttpError(409, "customId is already in use");
  let group = null;
  if (params.slug !== null) {
    group = await callbacks.waitForRegistration(key, config.registrationWaitMs);
    if (!group) throw new HttpError(400, "No upload is registered for this file key");
    if (group.callbackSlug !== params.slug) throw new HttpError(400, "x-ut-slug does not match the registration");
  }

  const tmpPath = storage.newTempPath();
  let received;
  try {
    received = await receiveUpload(req, tmpPath, params.size);
  } catch (error) {
    await storage.discard(tmpPath);
    if (group && error instanceof HttpError) callbacks.reject(group, key, error.message);
    throw error;
  }

  const contentType = params.type.includes("/") ? params.type : (received.partType ?? "application/octet-stream");
  const meta = {
    id: randomUUID(),
    key,
    customId: params.customId,
    name: params.name,
    size: received.bytes,
    type: params.type,
    contentType,
    acl: params.acl,
    contentDisposition: params.disposition,
    fileHash: received.fileHash,
    uploadedAt: Date.now(),
    status: "Uploaded",
  };
  await storage.commit(tmpPath, meta);
  const urls = fileUrls(ctx, key);

  let serverData = null;
  if (group) {
    const file = { name: meta.name, size: meta.size, type: meta.type, customId: meta.customId, key, ...urls, fileHash: meta.fileHash };
    try {
      serverData = await callbacks.deliver(group, file);
    } catch (error) {
      await storage.writeMeta({ ...meta, status: "Failed" });
      ctx.log(`upload ${key}: ${error.message}`);
      sendError(res, 500, error instanceof HttpError ? error.message : "Upload callback failed");
      return;
    }
  }
  sendJson(res, 200, { ...urls, fileHash: meta.fileHash, serverData });
}
