import { NextResponse, type NextRequest } from "next/server";
import { clientIp } from "@/lib/auth/client-ip";
import { evaluateSizing, SizingInputError } from "@/lib/hydraulics";
import { apiRoute, errorResponse, jsonError, readJsonBody } from "@/lib/http";
import { hitRateLimit, SIZING_API_LIMIT, type RateLimitResult } from "@/lib/rate-limit";
import { problemFieldErrors, sizingFieldErrors, sizingInputSchema } from "@/lib/validation/sizing";

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

    let body: unknown;
    try {
      body = await readJsonBody(req);
    } catch (error) {
      // Too large or not JSON: the shared answer, with this route's rate-limit headers.
      const refusal = errorResponse(error);
      for (const [name, value] of Object.entries(headers)) refusal.headers.set(name, value);
      return refusal;
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
