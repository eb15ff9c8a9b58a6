import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { isSameOriginRequest } from "@/lib/auth/csrf";
import { sessionCookieName } from "@/lib/auth/cookie";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { ReauthRequiredError } from "@/lib/auth/recent-sign-in";
import { validateSessionToken, type SessionUser, type ValidSession } from "@/lib/auth/session";
import {
  BusyError, ConflictError, DATABASE_UNAVAILABLE_MESSAGE, FieldError, isDatabaseUnavailable, isValueRefusedByDatabase, LockedError, VALUE_REFUSED_MESSAGE,
} from "@/lib/errors";
import { SigningUnavailableError } from "@/lib/inspections/chain-key";
import { fieldErrorsOf } from "@/lib/validation/field-errors";

/** Largest JSON body any route reads: the biggest real one (a full sizing input) is about 1 kB. */
export const JSON_BODY_LIMIT = 64 * 1024;
/** Deepest nesting a JSON body may have: real ones nest 4 levels; 30 000 levels overflow a library's recursive parser. */
export const JSON_DEPTH_LIMIT = 32;
/** fieldErrors key for problems with the request body as a whole. */
export const BODY_FIELD = "body";

/** A body over the limit (answered 413); raised before the excess is read. */
export class PayloadTooLargeError extends Error {
  constructor(readonly limit: number) {
    super("Request body too large.");
    this.name = "PayloadTooLargeError";
  }
}

/** A body that is not JSON, or nests deeper than JSON_DEPTH_LIMIT (answered 400). */
export class MalformedBodyError extends Error {
  constructor(
    message = "Request body is not valid JSON.",
    /** What to send instead (the body's fieldErrors entry). */
    readonly hint = "Send a JSON object.",
  ) {
    super(message);
    this.name = "MalformedBodyError";
  }
}

/** Deepest array/object nesting in JSON text (brackets inside strings do not count). */
function nestingDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i += 1) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c) i += 1;
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) deepest = Math.max(deepest, (depth += 1));
    else if (c === 0x5d || c === 0x7d) depth -= 1;
  }
  return deepest;
}

// A lone UTF-16 surrogate ("\ud800" in JSON) is no character: MariaDB would store U+FFFD instead, or
// refuse the JSON column's CHECK. Paired surrogates are one code point and do not match.
const LONE_SURROGATE = /\p{Cs}/u;

/**
 * JSON.parse that refuses (MalformedBodyError) text that is not JSON, nests past the limit, or has
 * a key or string that is not valid Unicode text.
 */
export function parseJsonText(text: string): unknown {
  if (nestingDepth(text) > JSON_DEPTH_LIMIT) throw new MalformedBodyError(`Request body nests deeper than ${JSON_DEPTH_LIMIT} levels.`, "Send a JSON object without deep nesting.");
  let wellFormed = true;
  let parsed: unknown;
  try {
    parsed = JSON.parse(text, (key, value: unknown) => {
      if (LONE_SURROGATE.test(key) || (typeof value === "string" && LONE_SURROGATE.test(value))) wellFormed = false;
      return value;
    });
  } catch {
    throw new MalformedBodyError();
  }
  if (!wellFormed) throw new MalformedBodyError("Request body has text that is not valid Unicode (a lone surrogate).", "Send text as valid Unicode.");
  return parsed;
}

/**
 * Reads a JSON request body without ever holding more than `limit` bytes: a declared
 * Content-Length over the limit is refused before reading, and a chunked body is cancelled as soon
 * as it passes the limit; an empty body is not JSON either, nor one nested past JSON_DEPTH_LIMIT.
 * Every route reads JSON through this, never `req.json()`.
 */
export async function readJsonBody(req: Request, limit: number = JSON_BODY_LIMIT): Promise<unknown> {
  return parseJsonText(await readBodyText(req, limit));
}

/** The body as text, read under `limit` as readJsonBody does (for routes that hand it on verbatim). */
export async function readBodyText(req: Request, limit: number = JSON_BODY_LIMIT): Promise<string> {
  const declared = req.headers.get("content-length");
  if (declared !== null && !(/^\d+$/.test(declared) && Number(declared) <= limit)) throw new PayloadTooLargeError(limit);
  if (!req.body) return "";
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel().catch(() => undefined);
      throw new PayloadTooLargeError(limit);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString("utf8");
}

export function jsonError(status: number, error: string, extra?: Record<string, unknown>, init?: ResponseInit): NextResponse {
  return NextResponse.json({ error, ...extra }, { ...init, status });
}

/** Signed-in user of an API request, from the cookie; null when absent or invalid. */
export async function apiSession(req: NextRequest): Promise<{ session: ValidSession; user: SessionUser } | null> {
  const token = req.cookies.get(sessionCookieName())?.value;
  return token ? validateSessionToken(token) : null;
}

/** Raised when an API request needs a session and has none (answered 401). */
export class UnauthorizedError extends Error {
  constructor() {
    super("Sign in first.");
    this.name = "UnauthorizedError";
  }
}

/** The signed-in user of an API request; throws UnauthorizedError (→ 401) when there is none. */
export async function requireApiSession(req: NextRequest): Promise<{ session: ValidSession; user: SessionUser }> {
  const current = await apiSession(req);
  if (!current) throw new UnauthorizedError();
  return current;
}

type Handler<C> = (req: NextRequest, context: C) => Promise<Response>;

/**
 * Wraps a route handler: refuses cross-site writes, and turns the data layer's errors into
 * 404 / 403 / 400 / 503 JSON. Anything unexpected is logged and answered 500 without details.
 */
export function apiRoute<C>(handler: Handler<C>, options: { csrf?: boolean } = {}): Handler<C> {
  return async (req, context) => {
    const mutating = !["GET", "HEAD", "OPTIONS"].includes(req.method);
    if (mutating && options.csrf !== false && !isSameOriginRequest(req.headers)) {
      return jsonError(403, "Cross-site request refused.");
    }
    try {
      return await handler(req, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): NextResponse {
  if (error instanceof UnauthorizedError) return jsonError(401, error.message);
  if (error instanceof ReauthRequiredError) return jsonError(401, error.message, { reauthenticate: true });
  if (error instanceof SigningUnavailableError) return jsonError(503, error.message);
  if (error instanceof NotFoundError) return jsonError(404, error.message);
  if (error instanceof ForbiddenError) return jsonError(403, error.message);
  if (error instanceof ConflictError) return jsonError(409, error.message);
  if (error instanceof LockedError) return jsonError(423, error.message);
  if (error instanceof FieldError) return jsonError(400, error.message, { fieldErrors: { [error.field]: [error.message] } });
  if (error instanceof BusyError) return jsonError(503, error.message, undefined, { headers: { "Retry-After": "2" } });
  if (error instanceof z.ZodError) {
    return jsonError(400, "Invalid request.", { fieldErrors: fieldErrorsOf(error.issues, BODY_FIELD) });
  }
  if (error instanceof PayloadTooLargeError) {
    return jsonError(413, error.message, { fieldErrors: { [BODY_FIELD]: [`Send at most ${Math.round(error.limit / 1024)} kB of JSON.`] } });
  }
  if (error instanceof MalformedBodyError) {
    return jsonError(400, error.message, { fieldErrors: { [BODY_FIELD]: [error.hint] } });
  }
  // A path with a malformed percent-escape (/api/presses/%ff) cannot name anything: the client's fault.
  if (error instanceof URIError) return jsonError(400, "The address contains a malformed percent-escape.");
  if (isValueRefusedByDatabase(error)) {
    // Logged: it means a schema lets through what its column cannot hold.
    console.warn("[api] value refused by the database", error instanceof Error ? error.message.split("\n")[0] : error);
    return jsonError(400, VALUE_REFUSED_MESSAGE);
  }
  if (isDatabaseUnavailable(error)) {
    return jsonError(503, DATABASE_UNAVAILABLE_MESSAGE, undefined, { headers: { "Retry-After": "5" } });
  }
  console.error("[api] unexpected error", error);
  return jsonError(500, "Something went wrong on our side.");
}

