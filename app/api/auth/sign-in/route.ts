import { NextResponse, type NextRequest } from "next/server";
import { clientIp } from "@/lib/auth/client-ip";
import { sessionCookie } from "@/lib/auth/cookie";
import { attemptSignIn } from "@/lib/auth/sign-in";
import { apiRoute, readJsonBody, jsonError } from "@/lib/http";
import { signInSchema } from "@/lib/validation/auth";

/** JSON sign-in for API clients; same throttling and answers as the sign-in form. */
export const POST = apiRoute(async (req: NextRequest) => {
  const body: unknown = await readJsonBody(req);
  const input = signInSchema.parse(body);
  const result = await attemptSignIn({ ...input, ip: clientIp(req.headers) });
  if (!result.ok && result.reason === "throttled") {
    return jsonError(429, "Too many failed sign-in attempts. Try again later.", { retryAfterS: result.retryAfterS }, {
      headers: { "Retry-After": String(result.retryAfterS) },
    });
  }
  if (!result.ok) return jsonError(401, "That e-mail and password do not match an account.");
  const response = NextResponse.json({ ok: true, userId: result.userId });
  const { name, value, ...options } = sessionCookie(result.token);
  response.cookies.set(name, value, options);
  return response;
});
