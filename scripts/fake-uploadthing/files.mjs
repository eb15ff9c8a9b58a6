// GET|HEAD /a/{appId}/{key} and /f/{key}: serving stored files (spec §4).
import { createReadStream } from "node:fs";
import { stat } from "node:fs/promises";
import { HttpError, KEY_PATTERN } from "./http-util.mjs";
import { checkSignedUrl } from "./signing.mjs";

/** RFC 6266 / 5987: an ASCII fallback plus the exact UTF-8 name. */
function contentDisposition(kind, name) {
  const fallback = name.replace(/[^\x20-\x7e]|["\\]/g, "_");
  const encoded = encodeURIComponent(name).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `${kind}; filename="${fallback}"; filename*=UTF-8''${encoded}`;
}

export async function serveFile(ctx, req, res, key, appId) {
  const { config, storage } = ctx;
  if ((appId !== undefined && appId !== config.appId) || !KEY_PATTERN.test(key)) throw new HttpError(404, "File not found");
  const meta = await storage.get(key);
  if (!meta) throw new HttpError(404, "File not found");
  if (meta.acl === "private") {
    const refused = checkSignedUrl(req, config.apiKey);
    if (refused) throw new HttpError(403, refused.error);
  }
  let size;
  try {
    size = (await stat(storage.bytesPath(key))).size;
  } catch {
    throw new HttpError(404, "File not found");
  }
  res.writeHead(200, {
    "Content-Type": meta.contentType,
    "Content-Length": size,
    "Content-Disposition": contentDisposition(meta.contentDisposition, meta.name),
    "X-Content-Type-Options": "nosniff",
    // Even if someone stores HTML or SVG, opening it runs no script in the file host's origin.
    "Content-Security-Policy": "default-src 'none'; sandbox",
    // Revalidate every time so a deleted or re-permissioned file stops being served at once.
    "Cache-Control": meta.acl === "private" ? "private, no-store" : "no-cache",
    ETag: `"${meta.fileHash}"`,
  });
  if (req.method === "HEAD") {
    res.end();
    return;
  }
  createReadStream(storage.bytesPath(key))
    .on("error", () => res.destroy())
    .pipe(res);
}
