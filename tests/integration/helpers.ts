import { NextRequest } from "next/server";
import { createUserWithPersonalShop } from "@/lib/data/users";

let counter = 0;

/** A fresh user with a unique e-mail and a personal shop. */
export async function makeUser(password = "correct horse battery staple"): Promise<{
  userId: string;
  shopId: string;
  email: string;
  password: string;
}> {
  counter += 1;
  const email = `user${Date.now().toString(36)}${counter}@test.example`;
  const { userId, shopId } = await createUserWithPersonalShop({ email, displayName: `Test User ${counter}`, password });
  return { userId, shopId, email, password };
}

/** A same-origin JSON request to a route handler, as a browser on the app's own page would send it. */
export function jsonRequest(
  path: string,
  body: unknown,
  headers: Record<string, string> = {},
  method = "POST",
): NextRequest {
  return new NextRequest(`http://127.0.0.1:3000${path}`, {
    method,
    body: body === undefined ? undefined : JSON.stringify(body),
    headers: { "content-type": "application/json", origin: "http://127.0.0.1:3000", host: "127.0.0.1:3000", ...headers },
  });
}

export function getRequest(path: string, headers: Record<string, string> = {}): NextRequest {
  return new NextRequest(`http://127.0.0.1:3000${path}`, { headers: { host: "127.0.0.1:3000", ...headers } });
}
