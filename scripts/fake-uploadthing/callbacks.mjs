// Delivering onUploadComplete to the app (spec §2). The app registers each upload's keys with
// POST /route-metadata; once a file is stored the fake sends the signed callback payload, by a
// POST to the app (production mode) or as a line on the still-open /route-metadata response
// (dev mode), and waits for the app's POST /callback-result carrying onUploadComplete's result.
import { HttpError, KEY_PATTERN, isLoopbackUrl, isRecord, sendJson } from "./http-util.mjs";
import { sign } from "./signing.mjs";

function parseRegistration(body) {
  if (!isRecord(body)) throw new HttpError(400, "Expected a JSON object");
  const { fileKeys, metadata, isDev, callbackUrl, callbackSlug, awaitServerData = true } = body;
  if (!Array.isArray(fileKeys) || fileKeys.length === 0 || !fileKeys.every((k) => typeof k === "string" && KEY_PATTERN.test(k)))
    throw new HttpError(400, "fileKeys must be a non-empty array of file keys");
  if (!isRecord(metadata)) throw new HttpError(400, "metadata must be an object");
  if (typeof isDev !== "boolean" || typeof awaitServerData !== "boolean") throw new HttpError(400, "isDev and awaitServerData must be booleans");
  if (typeof callbackSlug !== "string" || callbackSlug === "") throw new HttpError(400, "callbackSlug is required");
  // Loopback only: the fake must never be usable to send requests anywhere else.
  if (typeof callbackUrl !== "string" || !isLoopbackUrl(callbackUrl)) throw new HttpError(400, "callbackUrl must be an http(s) loopback URL");
  return { fileKeys, metadata, isDev, callbackUrl, callbackSlug, awaitServerData };
}

export class Callbacks {
  constructor(config, log) {
    this.config = config;
    this.log = log;
    this.byKey = new Map(); // key -> registration group
    this.waiters = new Map(); // key -> [resolve] for PUTs that arrived before their registration
    this.outcomes = new Map(); // key -> { resolve, reject } awaiting /callback-result
  }

  /** POST /route-metadata */
  register(req, res, body) {
    const group = { ...parseRegistration(body), origin: `http://${req.headers.host}`, pending: new Set(), stream: null };
    group.pending = new Set(group.fileKeys);
    group.timer = setTimeout(() => this.expire(group), this.config.registrationTtlMs).unref();
    if (group.isDev) {
      res.writeHead(200, { "Content-Type": "application/x-ndjson", "Cache-Control": "no-store" });
      res.flushHeaders();
      group.stream = res;
      res.on("close", () => {
        group.stream = null;
      });
    } else {
      sendJson(res, 200, { ok: true });
    }
    for (const key of group.fileKeys) {
      this.byKey.set(key, group);
      for (const wake of this.waiters.get(key) ?? []) wake(group);
      this.waiters.delete(key);
    }
  }

  /** The registration for a key, waiting up to `ms` for it: in dev mode the app registers in the background. */
  waitForRegistration(key, ms) {
    const found = this.byKey.get(key);
    if (found) return Promise.resolve(found);
    return new Promise((resolve) => {
      const wake = (group) => {
        clearTimeout(timer);
        resolve(group);
      };
      const timer = setTimeout(() => {
        const list = (this.waiters.get(key) ?? []).filter((w) => w !== wake);
        if (list.length) this.waiters.set(key, list);
        else this.waiters.delete(key);
        resolve(null);
      }, ms);
      this.waiters.set(key, [...(this.waiters.get(key) ?? []), wake]);
    });
  }

  /** Sends the callback for a stored file; resolves with onUploadComplete's result (or null). */
  async deliver(group, file) {
    const payload = JSON.stringify({ status: "uploaded", file, origin: group.origin, metadata: group.metadata });
    const outcome = group.awaitServerData ? this.expectResult(file.key) : null;
    try {
      if (group.isDev) this.writeLine(group, payload, "callback");
      else {
        const posted = this.postToApp(group, payload, "callback");
        if (outcome) posted.catch((error) => outcome.fail(error));
        else posted.catch((error) => this.log(`callback for ${file.key} failed: ${error.message}`));
      }
      return outcome ? await outcome.promise : null;
    } catch (error) {
      outcome?.fail(error);
      throw error;
    } finally {
      this.finish(group, file.key);
    }
  }

  /** Tells the app a registered upload was refused, which runs the route's onUploadError. */
  reject(group, key, message) {
    const payload = JSON.stringify({ fileKey: key, error: message });
    try {
      if (group.isDev) this.writeLine(group, payload, "error");
      else this.postToApp(group, payload, "error").catch((error) => this.log(`error hook for ${key} failed: ${error.message}`));
    } catch (error) {
      this.log(`error hook for ${key} not sent: ${error.message}`);
    }
    this.finish(group, key);
  }

  /** POST /callback-result; false when nothing is waiting for this key. */
  result(body) {
    if (!isRecord(body) || typeof body.fileKey !== "string") throw new HttpError(400, "fileKey is required");
    const outcome = this.outcomes.get(body.fileKey);
    if (!outcome) return false;
    if ("error" in body) outcome.fail(new HttpError(500, `Upload callback failed: ${String(body.error)}`));
    else outcome.succeed(body.callbackData ?? null);
    return true;
  }

  expectResult(key) {
    const ms = this.config.callbackTimeoutMs;
    let succeed, fail;
    const promise = new Promise((resolve, reject) => {
      const timer = setTimeout(() => reject(new HttpError(500, `The app sent no callback result within ${ms} ms`)), ms);
      const settle = (fn) => (value) => {
        clearTimeout(timer);
        if (this.outcomes.get(key) === entry) this.outcomes.delete(key);
        fn(value);
      };
      succeed = settle(resolve);
      fail = settle(reject);
    });
    // Handled here so a failure nobody awaits any more (the PUT already answered) is not fatal.
    promise.catch(() => {});
    const entry = { promise, succeed, fail };
    this.outcomes.set(key, entry);
    return entry;
  }

  writeLine(group, payload, hook) {
    const stream = group.stream;
    if (!stream || stream.writableEnded || stream.destroyed) throw new HttpError(500, "The app's dev callback stream is closed");
    const signature = sign(payload, this.config.apiKey);
    stream.write(`${JSON.stringify({ payload, signature, hook })}\n`);
  }

  async postToApp(group, payload, hook) {
    const url = new URL(group.callbackUrl);
    url.searchParams.set("slug", group.callbackSlug);
    let res;
    try {
      res = await fetch(url, {
        method: "POST",
        headers: { "content-type": "application/json", "uploadthing-hook": hook, "x-uploadthing-signature": sign(payload, this.config.apiKey) },
        body: payload,
        signal: AbortSignal.timeout(this.config.callbackTimeoutMs),
      });
      await res.arrayBuffer();
    } catch (error) {
      throw new HttpError(500, `Could not deliver the ${hook} request to ${url.origin}: ${error.cause?.code ?? error.message}`);
    }
    if (!res.ok) throw new HttpError(500, `The app refused the ${hook} request with status ${res.status}`);
  }

  finish(group, key) {
    group.pending.delete(key);
    if (this.byKey.get(key) === group) this.byKey.delete(key);
    if (group.pending.size === 0) {
      clearTimeout(group.timer);
      group.stream?.end();
    }
  }

  expire(group) {
    for (const key of [...group.pending]) this.finish(group, key);
  }

  closeAll() {
    for (const group of new Set(this.byKey.values())) this.expire(group);
  }
}
