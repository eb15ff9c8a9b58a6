import { NextResponse, type NextRequest } from "next/server";
import { uploadCspSources } from "@/lib/uploads/hosts";

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

  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const dev = process.env.NODE_ENV === "development";
  // Photos are served by, and uploaded straight from the browser to, the upload service.
  const uploads = uploadCspSources(process.env);
  const csp = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    // Style attributes (charts, next/font) need inline styles; scripts stay nonce-only.
    "style-src 'self' 'unsafe-inline'",
    `img-src 'self' blob: data: ${uploads.img.join(" ")}`,
    "font-src 'self'",
    `connect-src 'self' ${uploads.connect.join(" ")}`,
    // The inspection run's service worker (app/sw.ts); 'strict-dynamic' would otherwise refuse it.
    "worker-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");

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
