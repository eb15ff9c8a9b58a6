/**
 * The client's address for throttling and the audit log. scripts/server.mjs writes the socket's
 * address into CLIENT_IP_HEADER (replacing anything the client sent). X-Forwarded-For is read only
 * when TRUSTED_PROXY_HOPS says how many proxies of ours stand in front, so a client cannot reset
 * its counters by inventing addresses.
 */
export const CLIENT_IP_HEADER = "x-presswright-client-ip";

export function clientIp(headers: Headers): string {
  const hops = Number(process.env.TRUSTED_PROXY_HOPS ?? 0);
  if (Number.isInteger(hops) && hops > 0) {
    const chain = (headers.get("x-forwarded-for") ?? "")
      .split(",")
      .map((s) => s.trim())
      .filter(Boolean);
    const fromProxy = chain[chain.length - hops];
    if (fromProxy) return fromProxy.slice(0, 64);
  }
  return (headers.get(CLIENT_IP_HEADER) ?? "unknown").slice(0, 64);
}
