/**
 * One place for cross-site request checks. Next.js compares Origin on server actions but lets a
 * request without Origin through, and route handlers get no check at all; every mutating action
 * and route calls this. Browsers send Sec-Fetch-Site and/or Origin on every POST.
 */
export function isSameOriginRequest(headers: Headers): boolean {
  const site = headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") return false;
  const origin = headers.get("origin");
  if (!origin) return site === "same-origin" || site === "none";
  const host = expectedHost(headers);
  try {
    return host !== null && new URL(origin).host === host;
  } catch {
    return false;
  }
}

function expectedHost(headers: Headers): string | null {
  const configured = process.env.APP_URL;
  if (configured) return new URL(configured).host;
  const trustedProxy = Number(process.env.TRUSTED_PROXY_HOPS ?? 0) > 0;
  return (trustedProxy ? headers.get("x-forwarded-host") : null) ?? headers.get("host");
}
