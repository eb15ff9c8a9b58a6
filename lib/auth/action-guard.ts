import "server-only";
import { cookies, headers } from "next/headers";
import { blankSessionCookie, sessionCookie } from "./cookie";
import { isSameOriginRequest } from "./csrf";

export class CrossSiteError extends Error {
  constructor() {
    super("This form was sent from another site and was refused.");
    this.name = "CrossSiteError";
  }
}

/** Every server action that changes something calls this first (see lib/auth/csrf.ts for why). */
export async function assertSameOriginAction(): Promise<void> {
  if (!isSameOriginRequest(await headers())) throw new CrossSiteError();
}

export async function setSessionCookie(token: string): Promise<void> {
  const { name, value, ...options } = sessionCookie(token);
  (await cookies()).set(name, value, options);
}

export async function clearSessionCookie(): Promise<void> {
  const { name, value, ...options } = blankSessionCookie();
  (await cookies()).set(name, value, options);
}
