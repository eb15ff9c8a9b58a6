import { NextResponse, type NextRequest } from "next/server";
import { hashSources, nonceSources, pagePolicy } from "@/lib/csp/policy";
import { prerenderedScriptHashes } from "@/lib/csp/prerendered-pages";

// Signed-in areas; a request without any session cookie goes straight to sign-in. This is a
// convenience, never the gate: every page and route validates the session itself.
const SIGNED_IN_PREFIXES = ["/dashboard", "/presses", "/inspections", "/bookings", "/shop", "/account", "/bench"];

export function proxy(request: NextRequest): NextResponse {
  const { pathname, search } = request.nextUrl;
  const hasCookie = request.cookies.has("__Host-session") || request.cookies.has("session");
  if (!hasCookie && SIGNED_IN_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`))) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = `?next=${encodeURIComponent(pathname + search)}`;
    return NextResponse.redirect(url);
  }

  // A prerendered page's HTML was built before any request, so it carries no nonce: its policy
  // allows exactly the inline scripts in that HTML, by hash.
  const hashes = prerenderedScriptHashes(pathname);
  if (hashes) {
    const response = NextResponse.next();
    response.headers.set("Content-Security-Policy", pagePolicy(hashSources(hashes)));
    return response;
  }

  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = pagePolicy(nonceSources(nonce));
  // Next reads the nonce from the request's policy and puts it on the scripts it renders.
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("Content-Security-Policy", csp);
  return response;
}

export const config = {
  matcher: [
    {
      source: "/((?!api|_next/static|_next/image|fonts|icon.svg|favicon.ico).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};
