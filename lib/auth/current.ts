import "server-only";
import { cookies, headers } from "next/headers";
import { forbidden, notFound, redirect } from "next/navigation";
import { cache } from "react";
import { getMyShops, type ShopSummary } from "@/lib/data/shops";
import { clientIp } from "./client-ip";
import { sessionCookieName } from "./cookie";
import { ForbiddenError, NotFoundError } from "./permissions";
import { validateSessionToken, type SessionUser, type ValidSession } from "./session";

/** The session of this request (validated once per render). */
export const getCurrentSession = cache(
  async (): Promise<{ session: ValidSession; user: SessionUser } | null> => {
    const token = (await cookies()).get(sessionCookieName())?.value;
    return token ? validateSessionToken(token) : null;
  },
);

export async function requireSignedIn(): Promise<{ session: ValidSession; user: SessionUser }> {
  const current = await getCurrentSession();
  if (!current) redirect("/sign-in");
  return current;
}

export type ShopContext = {
  session: ValidSession;
  user: SessionUser;
  shop: ShopSummary;
  shops: ShopSummary[];
};

/** Signed-in user, their working shop and all their shops, or null when signed out (or in no shop). */
export const getShopContext = cache(async (): Promise<ShopContext | null> => {
  const current = await getCurrentSession();
  if (!current) return null;
  const { shop, shops } = await getMyShops({ userId: current.user.id }, current.user.activeShopId);
  return shop ? { ...current, shop, shops } : null;
});

/** As getShopContext, for pages that need it: every (app) page starts here. */
export const requireShopContext = cache(async (): Promise<ShopContext> => {
  await requireSignedIn();
  const context = await getShopContext();
  if (!context) redirect("/account?noshop=1");
  return context;
});

export async function requestIp(): Promise<string> {
  return clientIp(await headers());
}

/** Runs a data-layer read for a page, turning the layer's errors into Next's 404 and 403 pages. */
export async function orPageError<T>(work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    if (error instanceof ForbiddenError) forbidden();
    throw error;
  }
}
