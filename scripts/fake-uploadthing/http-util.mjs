// Small HTTP helpers shared by the fake's handlers. Every response carries CORS headers, errors
// included: the browser's HEAD before an upload fails outright without them (spec §5).

const DEFAULT_ALLOWED_HEADERS = "range, x-uploadthing-version, b3, traceparent, content-type";
const MAX_JSON_BYTES = 1024 * 1024;

export class HttpError extends Error {
  constructor(status, message) {
    super(message);
    this.status = status;
  }
}

export function setCors(req, res) {
  res.setHeader("Access-Control-Allow-Origin", "*");
  res.setHeader("Access-Control-Allow-Methods", "GET,HEAD,PUT,POST,OPTIONS");
  res.setHeader("Access-Control-Allow-Headers", req.headers["access-control-request-headers"] || DEFAULT_ALLOWED_HEADERS);
  res.setHeader("Access-Control-Expose-Headers", "x-ut-range-start");
  res.setHeader("Access-Control-Max-Age", "600");
}

export function sendJson(res, status, body, extraHeaders = {}) {
  if (res.headersSent) {
    res.end();
    return;
  }
  const text = JSON.stringify(body);
  res.writeHead(status, {
    "Content-Type": "application/json; charset=utf-8",
    "Content-Length": Buffer.byteLength(text),
    "X-Content-Type-Options": "nosniff",
    "Cache-Control": "no-store",
    ...extraHeaders,
  });
  res.end(text);
}

/** Every error answer is non-2xx with an {error} body: UTApi ignores error bodies on 2xx (spec §1.6). */
export function sendError(res, status, message) {
  sendJson(res, status, { error: message });
}

export async function readJson(req) {
  const chunks = [];
  let size = 0;
  for await (const chunk of req) {
    size += chunk.length;
    if (size > MAX_JSON_BYTES) throw new HttpError(413, "Request body too large");
    chunks.push(chunk);
  }
  try {
    return JSON.parse(Buffer.concat(chunks).toString("utf8") || "null");
  } catch {
    throw new HttpError(400, "Request body is not valid JSON");
  }
}

export function isRecord(value) {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

export const KEY_PATTERN = /^[A-Za-z0-9_-]{1,256}$/;

/** Hosts the fake will send callbacks to: loopback only, so it can never be made to call out. */
export function isLoopbackUrl(raw) {
  let url;
  try {
    url = new URL(raw);
  } catch {
    return false;
  }
  return (url.protocol === "http:" || url.protocol === "https:") && ["127.0.0.1", "localhost", "[::1]"].includes(url.hostname);
}
