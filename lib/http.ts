import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { isSameOriginRequest } from "@/lib/auth/csrf";
import { sessionCookieName } from "@/lib/auth/cookie";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { ReauthRequiredError } from "@/lib/auth/recent-sign-in";
import { validateSessionToken, type SessionUser, type ValidSession } from "@/lib/auth/session";
import { BusyError, ConflictError, DATABASE_UNAVAILABLE_MESSAGE, FieldError, isDatabaseUnavailable, LockedError } from "@/lib/errors";
import { SigningUnavailableError } from "@/lib/inspections/chain-key";
import { fieldErrorsOf } from "@/lib/validation/field-errors";

/** Largest JSON body any route reads: the biggest real one (a full sizing input) is about 1 kB. */
export const JSON_BODY_LIMIT = 64 * 1024;
/** fieldErrors key for problems with the request body as a whole. */
export const BODY_FIELD = "body";

/** A body over the limit (answered 413); raised before the excess is read. */
export class PayloadTooLargeError extends Error {
  constructor(readonly limit: number) {
    super("Request body too large.");
    this.name = "PayloadTooLargeError";
  }
}

/** A body that is not JSON (answered 400). */
export class MalformedBodyError extends Error {
  constructor() {
    super("Request body is not valid JSON.");
    this.name = "MalformedBodyError";
  }
}

/**
 * Reads a JSON request body without ever holding more than `limit` bytes: a declared
 * Content-Length over the limit is refused before reading, and a chunked body is cancelled as soon
 * as it passes the limit; an empty body is not JSON either. Every route
 * reads JSON through this, never `req.json()`.
 */
export async function readJsonBody(req: Request, limit: number = JSON_BODY_LIMIT): Promise<unknown> {
  const text = await readBodyText(req, limit);
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new MalformedBodyError();
  }
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
    return jsonError(400, error.message, { fieldErrors: { [BODY_FIELD]: ["Send a JSON object."] } });
  }
  // A path with a malformed percent-escape (/api/presses/%ff) cannot name anything: the client's fault.
  if (error instanceof URIError) return jsonError(400, "The address contains a malformed percent-escape.");
  if (isDatabaseUnavailable(error)) {
    return jsonError(503, DATABASE_UNAVAILABLE_MESSAGE, undefined, { headers: { "Retry-After": "5" } });
  }
  console.error("[api] unexpected error", error);
  return jsonError(500, "Something went wrong on our side.");
}

