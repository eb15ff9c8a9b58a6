import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { isSameOriginRequest } from "@/lib/auth/csrf";
import { sessionCookieName } from "@/lib/auth/cookie";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { ReauthRequiredError } from "@/lib/auth/recent-sign-in";
import { validateSessionToken, type SessionUser, type ValidSession } from "@/lib/auth/session";
import { ConflictError, DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "@/lib/errors";
import { SigningUnavailableError } from "@/lib/inspections/chain-key";

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
  if (error instanceof z.ZodError) {
    return jsonError(400, "Invalid request.", { fieldErrors: { ...dottedFieldErrors(error), ...z.flattenError(error).fieldErrors } });
  }
  if (isDatabaseUnavailable(error)) {
    return jsonError(503, DATABASE_UNAVAILABLE_MESSAGE, undefined, { headers: { "Retry-After": "5" } });
  }
  console.error("[api] unexpected error", error);
  return jsonError(500, "Something went wrong on our side.");
}

/**
 * Nested fields and unknown keys by dotted path ("answers.0.note", "colour"), added beside the
 * top-level messages so a 400 always names the key it refuses.
 */
function dottedFieldErrors(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  const push = (path: string, message: string) => (out[path || "body"] ??= []).push(message);
  for (const issue of error.issues) {
    const base = issue.path.map(String);
    if (issue.code === "unrecognized_keys") for (const key of issue.keys) push([...base, key].join("."), `Unknown field "${key}".`);
    else if (base.length > 1) push(base.join("."), issue.message);
  }
  return out;
}
