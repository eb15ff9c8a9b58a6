import { ABSOLUTE_LIFETIME_MS } from "./session";

/**
 * `__Host-` requires Secure, and Secure needs HTTPS; the local start command serves plain HTTP on
 * 127.0.0.1, so it opts out with INSECURE_COOKIES=1 and gets the same cookie under a plain name.
 */
export function sessionCookieSecure(): boolean {
  return process.env.NODE_ENV === "production" && process.env.INSECURE_COOKIES !== "1";
}

export function sessionCookieName(): string {
  return sessionCookieSecure() ? "__Host-session" : "session";
}

export type CookieSpec = {
  name: string;
  value: string;
  httpOnly: true;
  secure: boolean;
  sameSite: "lax";
  path: "/";
  maxAge: number;
};

export function sessionCookie(token: string): CookieSpec {
  return {
    name: sessionCookieName(),
    value: token,
    httpOnly: true,
    secure: sessionCookieSecure(),
    sameSite: "lax",
    path: "/",
    maxAge: Math.floor(ABSOLUTE_LIFETIME_MS / 1000),
  };
}

export function blankSessionCookie(): CookieSpec {
  return { ...sessionCookie(""), maxAge: 0 };
}
