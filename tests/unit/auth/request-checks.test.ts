import { afterEach, describe, expect, it, vi } from "vitest";
import { clientIp, CLIENT_IP_HEADER } from "@/lib/auth/client-ip";
import { isSameOriginRequest } from "@/lib/auth/csrf";
import { blankSessionCookie, sessionCookie } from "@/lib/auth/cookie";
import { parseSessionToken, generateSessionToken, secretMatches } from "@/lib/auth/session-token";
import { waitAfter } from "@/lib/auth/throttle-policy";
import { isDatabaseUnavailable } from "@/lib/errors";

afterEach(() => {
  vi.unstubAllEnvs();
});

const h = (init: Record<string, string>) => new Headers(init);

describe("cross-site request check", () => {
  it("accepts same-origin requests", () => {
    expect(isSameOriginRequest(h({ host: "app.test", origin: "http://app.test", "sec-fetch-site": "same-origin" }))).toBe(true);
    expect(isSameOriginRequest(h({ host: "app.test", origin: "http://app.test" }))).toBe(true);
    expect(isSameOriginRequest(h({ host: "app.test", "sec-fetch-site": "same-origin" }))).toBe(true);
  });

  it("refuses foreign origins, cross-site fetch metadata and requests carrying neither", () => {
    expect(isSameOriginRequest(h({ host: "app.test", origin: "https://evil.test" }))).toBe(false);
    expect(isSameOriginRequest(h({ host: "app.test", "sec-fetch-site": "cross-site" }))).toBe(false);
    expect(isSameOriginRequest(h({ host: "app.test", "sec-fetch-site": "same-site", origin: "http://app.test" }))).toBe(false);
    expect(isSameOriginRequest(h({ host: "app.test" }))).toBe(false);
    expect(isSameOriginRequest(h({ host: "app.test", origin: "null" }))).toBe(false);
  });

  it("uses APP_URL when configured", () => {
    vi.stubEnv("APP_URL", "https://press.example");
    expect(isSameOriginRequest(h({ host: "internal:3000", origin: "https://press.example" }))).toBe(true);
    expect(isSameOriginRequest(h({ host: "internal:3000", origin: "http://internal:3000" }))).toBe(false);
  });
});

describe("client address", () => {
  it("ignores X-Forwarded-For unless a trusted proxy is configured", () => {
    const headers = h({ "x-forwarded-for": "203.0.113.9, 10.0.0.2", [CLIENT_IP_HEADER]: "10.0.0.2" });
    expect(clientIp(headers)).toBe("10.0.0.2");
    vi.stubEnv("TRUSTED_PROXY_HOPS", "1");
    expect(clientIp(headers)).toBe("10.0.0.2");
    vi.stubEnv("TRUSTED_PROXY_HOPS", "2");
    expect(clientIp(headers)).toBe("203.0.113.9");
  });
});

describe("session cookie", () => {
  it("is __Host-session, Secure, HttpOnly, SameSite=Lax, Path=/ in production", () => {
    vi.stubEnv("NODE_ENV", "production");
    vi.stubEnv("INSECURE_COOKIES", "");
    expect(sessionCookie("t")).toMatchObject({ name: "__Host-session", secure: true, httpOnly: true, sameSite: "lax", path: "/" });
    expect(blankSessionCookie().maxAge).toBe(0);
  });

  it("drops the __Host- prefix only when Secure is off (plain-HTTP local runs)", () => {
    vi.stubEnv("NODE_ENV", "production");
    vi.stubEnv("INSECURE_COOKIES", "1");
    expect(sessionCookie("t")).toMatchObject({ name: "session", secure: false, httpOnly: true });
  });
});

describe("session tokens", () => {
  it("carries a 24-character id and a 256-bit secret, and checks the secret in constant time", () => {
    const { token, id, secret, secretHash } = generateSessionToken();
    expect(parseSessionToken(token)).toEqual({ id, secret });
    expect(secretMatches(secret, secretHash)).toBe(true);
    expect(secretMatches(secret.replace(/.$/, (c) => (c === "a" ? "b" : "a")), secretHash)).toBe(false);
    expect(parseSessionToken(`${id}.${secret}.x`)).toBeNull();
    expect(parseSessionToken(`${id.toUpperCase()}.${secret}`)).toBeNull();
  });
});

describe("throttle waits", () => {
  it("lets ten failures through per account, then doubles the wait up to a cap", () => {
    expect(waitAfter("account", 9)).toBe(0);
    expect(waitAfter("account", 10)).toBe(30);
    expect(waitAfter("account", 11)).toBe(60);
    expect(waitAfter("account", 40)).toBe(3600);
  });
});

describe("database-unavailable detection", () => {
  it("recognises connection failures, also when wrapped", () => {
    expect(isDatabaseUnavailable(Object.assign(new Error("x"), { code: "ECONNREFUSED" }))).toBe(true);
    expect(isDatabaseUnavailable(new Error("query failed", { cause: Object.assign(new Error("y"), { code: "PROTOCOL_CONNECTION_LOST" }) }))).toBe(true);
    expect(isDatabaseUnavailable(new AggregateError([Object.assign(new Error("z"), { code: "ECONNREFUSED" })]))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error("dup"), { code: "ER_DUP_ENTRY" }))).toBe(false);
  });
});
