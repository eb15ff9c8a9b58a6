import { NextResponse, type NextRequest } from "next/server";
import { clientIp } from "@/lib/auth/client-ip";
import { evaluateSizing, SizingInputError } from "@/lib/hydraulics";
import { jsonError, apiRoute } from "@/lib/http";
import { hitRateLimit, SIZING_API_LIMIT, type RateLimitResult } from "@/lib/rate-limit";
import { BODY_KEY, problemFieldErrors, sizingFieldErrors, sizingInputSchema } from "@/lib/validation/sizing";

/** A full sizing input with every optional block is about 1 kB; anything far larger is not one. */
const MAX_BODY_BYTES = 64 * 1024;

function limitHeaders(limit: RateLimitResult): Record<string, string> {
  return {
    "RateLimit-Limit": String(limit.limit),
    "RateLimit-Remaining": String(limit.remaining),
    "RateLimit-Reset": String(limit.retryAfterS),
  };
}

/**
 * POST /api/sizing — public and stateless: the sizing input as JSON (SI units) in, the engine's
 * result out. `?units=imperial` only changes the units inside check messages. Rate-limited per IP.
 * No cookies are read, so the cross-site check is off: any script may call it.
 */
export const POST = apiRoute(
  async (req: NextRequest) => {
    const limit = await hitRateLimit(SIZING_API_LIMIT, clientIp(req.headers));
    const headers = limitHeaders(limit);
    if (!limit.allowed) {
      return jsonError(
        429,
        `Too many sizing requests from your address: at most ${limit.limit} a minute. Try again in ${limit.retryAfterS} s.`,
        undefined,
        { headers: { ...headers, "Retry-After": String(limit.retryAfterS) } },
      );
    }

    const text = await req.text();
    if (text.length > MAX_BODY_BYTES) {
      return jsonError(413, "Request body too large.", { fieldErrors: { [BODY_KEY]: ["Send at most 64 kB of JSON."] } }, { headers });
    }
    let body: unknown;
    try {
      body = JSON.parse(text);
    } catch {
      return jsonError(400, "Request body is not valid JSON.", { fieldErrors: { [BODY_KEY]: ["Send the sizing input as a JSON object."] } }, { headers });
    }

    const parsed = sizingInputSchema.safeParse(body);
    if (!parsed.success) {
      return jsonError(400, "Invalid sizing input.", { fieldErrors: sizingFieldErrors(parsed.error) }, { headers });
    }
    const system = req.nextUrl.searchParams.get("units") === "imperial" ? "imperial" : "metric";
    try {
      return NextResponse.json(evaluateSizing(parsed.data, { system }), { headers });
    } catch (error) {
      // The schema mirrors the engine's rules; this catches any rule only the engine knows.
      if (error instanceof SizingInputError) {
        return jsonError(400, "Invalid sizing input.", { fieldErrors: problemFieldErrors(error.problems) }, { headers });
      }
      throw error;
    }
  },
  { csrf: false },
);
