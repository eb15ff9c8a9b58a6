// The UTApi endpoints (spec §3). Every answer is decoded by the SDK against a schema, so each
// response carries exactly the fields it expects; failures are non-2xx, which the SDK throws.
import { HttpError, isRecord } from "./http-util.mjs";
import { signUrl } from "./signing.mjs";
import { fileUrls, ufsBase } from "./urls.mjs";

const ACLS = new Set(["public-read", "private"]);
const MAX_LIST = 500;
const MAX_ACCESS_SECONDS = 7 * 24 * 3600;
// Free-tier storage allowance, reported by getUsageInfo.
const LIMIT_BYTES = 2 * 1024 ** 3;

function stringList(body) {
  const list = body.fileKeys ?? body.customIds;
  if (!Array.isArray(list) || !list.every((item) => typeof item === "string")) throw new HttpError(400, "Expected fileKeys or customIds: string[]");
  return { list, byCustomId: body.fileKeys === undefined };
}

function intOption(value, fallback, min, max, name) {
  if (value === undefined || value === null) return fallback;
  if (!Number.isInteger(value) || value < min || value > max) throw new HttpError(400, `${name} must be an integer from ${min} to ${max}`);
  return value;
}

async function resolveAll(storage, list, byCustomId) {
  const metas = await Promise.all(list.map((id) => storage.resolve(byCustomId ? { customId: id } : { fileKey: id })));
  return metas.filter(Boolean);
}

/** Resolves every update's target first, so a batch with an unknown file changes nothing. */
async function resolveUpdates(storage, updates) {
  if (!Array.isArray(updates) || !updates.every(isRecord)) throw new HttpError(400, "updates must be an array of objects");
  return Promise.all(
    updates.map(async (update) => {
      const meta = await storage.resolve(update);
      if (!meta) throw new HttpError(404, `File not found: ${update.fileKey ?? update.customId ?? "(no key)"}`);
      return { meta, update };
    }),
  );
}

const routes = {
  async "/v6/deleteFiles"(ctx, body) {
    const { list, byCustomId } = stringList(body);
    let deletedCount = 0;
    for (const meta of await resolveAll(ctx.storage, list, byCustomId)) if (await ctx.storage.remove(meta.key)) deletedCount += 1;
    return { success: true, deletedCount };
  },
  async "/v6/listFiles"(ctx, body) {
    const limit = intOption(body.limit, MAX_LIST, 1, MAX_LIST, "limit");
    const offset = intOption(body.offset, 0, 0, Number.MAX_SAFE_INTEGER, "offset");
    const all = await ctx.storage.list();
    const files = all.slice(offset, offset + limit).map(({ id, customId, key, name, size, status, uploadedAt }) => ({ id, customId, key, name, size, status, uploadedAt }));
    return { hasMore: offset + limit < all.length, files };
  },
  async "/v6/getFileUrl"(ctx, body) {
    const { list, byCustomId } = stringList(body);
    const metas = await resolveAll(ctx.storage, list, byCustomId);
    return { data: metas.map((meta) => ({ key: meta.key, url: fileUrls(ctx, meta.key).ufsUrl })) };
  },
  async "/v6/renameFiles"(ctx, body) {
    const resolved = await resolveUpdates(ctx.storage, body.updates);
    if (!resolved.every(({ update }) => typeof update.newName === "string" && update.newName.trim() !== "")) throw new HttpError(400, "newName must be a non-empty string");
    for (const { meta, update } of resolved) await ctx.storage.writeMeta({ ...meta, name: update.newName });
    return { success: true };
  },
  async "/v6/updateACL"(ctx, body) {
    const resolved = await resolveUpdates(ctx.storage, body.updates);
    if (!resolved.every(({ update }) => ACLS.has(update.acl))) throw new HttpError(400, 'acl must be "public-read" or "private"');
    for (const { meta, update } of resolved) await ctx.storage.writeMeta({ ...meta, acl: update.acl });
    return { success: true };
  },
  async "/v6/requestFileAccess"(ctx, body) {
    const meta = await ctx.storage.resolve(body);
    if (!meta) throw new HttpError(404, "File not found");
    const ttl = intOption(body.expiresIn, 3600, 1, MAX_ACCESS_SECONDS, "expiresIn");
    const { apiKey, appId } = ctx.config;
    return {
      url: signUrl(`${ufsBase(ctx)}/f/${meta.key}`, apiKey, ttl),
      ufsUrl: signUrl(`${ufsBase(ctx)}/a/${appId}/${meta.key}`, apiKey, ttl),
    };
  },
  async "/v6/getUsageInfo"(ctx) {
    const all = await ctx.storage.list();
    const totalBytes = all.reduce((sum, meta) => sum + meta.size, 0);
    return { totalBytes, appTotalBytes: totalBytes, filesUploaded: all.length, limitBytes: LIMIT_BYTES };
  },
};

export async function handleApi(ctx, pathname, body) {
  const route = Object.hasOwn(routes, pathname) ? routes[pathname] : null;
  if (!route) throw new HttpError(404, `Unknown API endpoint ${pathname}`);
  if (!isRecord(body)) throw new HttpError(400, "Expected a JSON object");
  return route(ctx, body);
}
