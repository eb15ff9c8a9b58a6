// One URL for every app/**/page.tsx, for the browser tests that must visit every page (headers,
// accessibility): a new page is covered without being listed; a dynamic segment this file cannot
// fill fails the tests that use it.
import { expect } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "@/db/demo-data";
import { BASE_URL } from "./browser";

/** An id that names nothing: token pages then answer their "not found / expired" page. */
const UNKNOWN_TOKEN = "aaaaaaaaaaaaaaaaaaaaaaaa";

export const demoEmail = (key: string): string => DEMO_USERS.find((u) => u.key === key)!.email;

/** Signs in over the JSON API and returns the session's Cookie header. */
export async function signInCookie(email = demoEmail("manager")): Promise<string> {
  const res = await fetch(`${BASE_URL}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: BASE_URL },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  expect(res.status).toBe(200);
  return res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
}

async function api<T>(cookie: string, path: string): Promise<T> {
  const res = await fetch(`${BASE_URL}${path}`, { headers: { cookie } });
  expect(res.status, path).toBe(200);
  return (await res.json()) as T;
}

export type SegmentIds = Record<string, string>;

/** Fills every dynamic segment from the demo shop, as the user of `cookie` (its manager) sees it. */
export async function resolveIds(cookie: string): Promise<SegmentIds> {
  const ids: SegmentIds = {};
  const { presses } = await api<{ presses: { id: string }[] }>(cookie, "/api/presses");
  for (const { id } of presses) {
    const [{ components }, { entries }, { rows }] = await Promise.all([
      api<{ components: { id: string }[] }>(cookie, `/api/presses/${id}/components`),
      api<{ entries: { id: string }[] }>(cookie, `/api/presses/${id}/service-log`),
      api<{ rows: { id: string }[] }>(cookie, `/api/presses/${id}/inspections`),
    ]);
    if (components[0] && entries[0] && !ids.pressId) Object.assign(ids, { pressId: id, componentId: components[0].id, entryId: entries[0].id });
    if (rows[0] && !ids.inspectionId) ids.inspectionId = rows[0].id;
  }
  const { shops } = await api<{ shops: { id: string }[] }>(cookie, "/api/me");
  const { templates } = await api<{ templates: { id: string }[] }>(cookie, `/api/inspection-templates?shopId=${shops[0]!.id}`);
  ids.templateId = templates[0]!.id;
  ids.token = UNKNOWN_TOKEN;
  return ids;
}

/** app/(app)/presses/[pressId]/page.tsx → /presses/<id>; route groups drop out. */
export function urlOf(file: string, ids: SegmentIds): string {
  const segments = file.replace(/^app\//, "").replace(/\/?page\.tsx$/, "").split("/").filter((s) => s && !/^\(.*\)$/.test(s));
  return "/" + segments.map((s) => {
    const name = /^\[(.+)\]$/.exec(s)?.[1];
    if (!name) return s;
    if (!ids[name]) throw new Error(`tests/e2e/page-urls.ts cannot fill [${name}] for ${file}: add it to resolveIds()`);
    return ids[name];
  }).join("/");
}

/** Pages outside the signed-in shell: visited signed out too. */
export const isPublic = (file: string): boolean => !file.startsWith("app/(app)/");

/** The page every unknown address gets (app/not-found.tsx). */
export const NOT_FOUND_URL = "/no-such-page";
