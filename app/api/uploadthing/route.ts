import { NextRequest } from "next/server";
import { createRouteHandler } from "uploadthing/next";
import { isSameOriginRequest } from "@/lib/auth/csrf";
import { errorResponse, jsonError, parseJsonText, readBodyText } from "@/lib/http";
import { uploadRouter } from "./core";

const handlers = createRouteHandler({ router: uploadRouter });

/** The routes' public config (types, limits), read by the upload hook. */
export const GET = handlers.GET;

/**
 * Upload requests from our pages must be same-origin. The upload service's callbacks come
 * server-to-server without Origin; they carry `uploadthing-hook` and the SDK refuses any whose
 * signature does not verify, so they pass straight to it. A browser cannot add that header to a
 * cross-site request without a CORS preflight, which this route never grants.
 */
export async function POST(req: NextRequest): Promise<Response> {
  if (!req.headers.has("uploadthing-hook") && !isSameOriginRequest(req.headers)) {
    return jsonError(403, "Cross-site request refused.");
  }
  // The SDK reads the body whole: hand it a copy read under the shared limit (its JSON is small;
  // callbacks are verified against these exact bytes), once it is known to be JSON of sane depth.
  let body: string;
  try {
    body = await readBodyText(req);
    parseJsonText(body);
  } catch (error) {
    return errorResponse(error);
  }
  return withErrorMessage(await handlers.POST(new NextRequest(req.url, { method: "POST", headers: req.headers, body })));
}

/** The SDK refuses with `{ message }` or an empty body; every API refusal carries `{ error }` (its fields kept). */
async function withErrorMessage(res: Response): Promise<Response> {
  if (res.status < 400) return res;
  const text = await res.text();
  let fields: Record<string, unknown> = {};
  try {
    const parsed: unknown = JSON.parse(text);
    if (parsed !== null && typeof parsed === "object" && !Array.isArray(parsed)) fields = parsed as Record<string, unknown>;
  } catch {
    // Not JSON: only the status says what happened.
  }
  const message = typeof fields.message === "string" && fields.message ? fields.message : "The upload request was refused.";
  return jsonError(res.status, message, fields);
}
