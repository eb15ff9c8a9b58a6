import { NextResponse, type NextRequest } from "next/server";
import { blankSessionCookie } from "@/lib/auth/cookie";
import { invalidateSession } from "@/lib/auth/session";
import { apiRoute, apiSession } from "@/lib/http";

export const POST = apiRoute(async (req: NextRequest) => {
  const current = await apiSession(req);
  if (current) await invalidateSession(current.session.id);
  const response = new NextResponse(null, { status: 204 });
  const { name, value, ...options } = blankSessionCookie();
  response.cookies.set(name, value, options);
  return response;
});
