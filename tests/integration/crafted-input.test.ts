// Hardening #5: crafted input never answers 500. Keys named like Object.prototype members
// ("constructor", "toString", "__proto__", "hasOwnProperty") sent to every JSON route get a 400
// that names the key in fieldErrors; a malformed percent-escape in a path is a 400; a form whose
// part kind differs from the stored one becomes a form error.
import type { NextRequest } from "next/server";
import { NextRequest as Req } from "next/server";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as signInRoute } from "@/app/api/auth/sign-in/route";
import { PATCH as patchComponentRoute } from "@/app/api/components/[componentId]/route";
import { POST as replaceRoute } from "@/app/api/components/[componentId]/replace/route";
import { PATCH as patchPhotoRoute } from "@/app/api/photos/[photoId]/route";
import { POST as createComponentRoute } from "@/app/api/presses/[pressId]/components/route";
import { POST as correctionsRoute } from "@/app/api/presses/[pressId]/hour-meter/corrections/route";
import { POST as hourMeterRoute } from "@/app/api/presses/[pressId]/hour-meter/route";
import { GET as getPressRoute, PATCH as patchPressRoute } from "@/app/api/presses/[pressId]/route";
import { POST as createPressRoute } from "@/app/api/presses/route";
import { POST as sizingRoute } from "@/app/api/sizing/route";
import { refusalState } from "@/lib/action-refusal";
import { createSession } from "@/lib/auth/session";
import { createComponent, updateComponent } from "@/lib/data/components";
import { createPress } from "@/lib/data/press-edits";
import { newId } from "@/lib/ids";
import { componentInputSchema } from "@/lib/validation/press";
import { getRequest, makeUser } from "./helpers";

type Handler = (req: NextRequest, ctx: never) => Promise<Response>;
const CRAFTED_KEYS = ["constructor", "toString", "__proto__", "hasOwnProperty", "valueOf", "isPrototypeOf"];

let cookie: Record<string, string>;
let manager: Awaited<ReturnType<typeof makeUser>>;

beforeAll(async () => {
  manager = await makeUser();
  cookie = { cookie: `session=${(await createSession(manager.userId)).token}` };
});

const id = newId();
const ctx = (key: string) => ({ params: Promise.resolve({ [key]: id }) }) as never;
const ROUTES: { name: string; path: string; method: string; handler: Handler; context: () => never; base?: Record<string, unknown> }[] = [
  { name: "POST /api/sizing", path: "/api/sizing", method: "POST", handler: sizingRoute as Handler, context: () => ({}) as never },
  { name: "POST /api/auth/sign-in", path: "/api/auth/sign-in", method: "POST", handler: signInRoute as Handler, context: () => ({}) as never },
  { name: "POST /api/presses", path: "/api/presses", method: "POST", handler: createPressRoute as Handler, context: () => ({}) as never, base: { name: "P", frameType: "h-frame" } },
  { name: "PATCH /api/presses/{id}", path: `/api/presses/${id}`, method: "PATCH", handler: patchPressRoute as Handler, context: () => ctx("pressId") },
  { name: "POST /api/presses/{id}/components", path: `/api/presses/${id}/components`, method: "POST", handler: createComponentRoute as Handler, context: () => ctx("pressId") },
  { name: "POST /api/presses/{id}/hour-meter", path: `/api/presses/${id}/hour-meter`, method: "POST", handler: hourMeterRoute as Handler, context: () => ctx("pressId"), base: { hours: 1 } },
  { name: "POST /api/presses/{id}/hour-meter/corrections", path: `/api/presses/${id}/hour-meter/corrections`, method: "POST", handler: correctionsRoute as Handler, context: () => ctx("pressId"), base: { hours: 1, reason: "typo" } },
  { name: "PATCH /api/components/{id}", path: `/api/components/${id}`, method: "PATCH", handler: patchComponentRoute as Handler, context: () => ctx("componentId") },
  { name: "POST /api/components/{id}/replace", path: `/api/components/${id}/replace`, method: "POST", handler: replaceRoute as Handler, context: () => ctx("componentId") },
  { name: "PATCH /api/photos/{id}", path: `/api/photos/${id}`, method: "PATCH", handler: patchPhotoRoute as Handler, context: () => ctx("photoId"), base: { kind: "leak" } },
];

/** A raw JSON body, so "__proto__" arrives as an own key exactly as an attacker's would. */
function rawRequest(path: string, method: string, json: string): NextRequest {
  return new Req(`http://127.0.0.1:3000${path}`, {
    method,
    body: json,
    headers: { "content-type": "application/json", origin: "http://127.0.0.1:3000", host: "127.0.0.1:3000", ...cookie },
  });
}

describe.each(ROUTES)("$name", ({ path, method, handler, context, base }) => {
  it.each(CRAFTED_KEYS)("answers %s with a 400 naming the key", async (key) => {
    const json = `{${base ? `${JSON.stringify(base).slice(1, -1)},` : ""}"${key}": 1}`;
    const res = await handler(rawRequest(path, method, json), context());
    expect(res.status).toBe(400);
    const body = (await res.json()) as { fieldErrors: Record<string, string[]> };
    expect(Object.hasOwn(body.fieldErrors, key), JSON.stringify(body.fieldErrors)).toBe(true);
    expect(body.fieldErrors[key]).toEqual([`Unknown field "${key}".`]);
  });
});

describe("nested crafted keys", () => {
  it("name the full path in the sizing API", async () => {
    const res = await sizingRoute(rawRequest("/api/sizing", "POST", '{"cylinders": {"__proto__": 1, "constructor": 2}}'), {} as never);
    expect(res.status).toBe(400);
    const { fieldErrors } = (await res.json()) as { fieldErrors: Record<string, string[]> };
    expect(Object.hasOwn(fieldErrors, "cylinders.__proto__")).toBe(true);
    expect(Object.hasOwn(fieldErrors, "cylinders.constructor")).toBe(true);
  });

  it("name the full path in a part's spec", async () => {
    const { id: pressId } = await createPress({ userId: manager.userId }, manager.shopId, { name: "Crafted", frameType: "h-frame" });
    const json = '{"kind":"hose","label":"H","spec":{"line":"pressure","insideDiameterMm":12.7,"standard":"x","ratedPressureBar":200,"lengthMm":100,"toString":1}}';
    const res = await createComponentRoute(rawRequest(`/api/presses/${pressId}/components`, "POST", json), { params: Promise.resolve({ pressId }) });
    expect(res.status).toBe(400);
    const { fieldErrors } = (await res.json()) as { fieldErrors: Record<string, string[]> };
    expect(Object.hasOwn(fieldErrors, "spec.toString")).toBe(true);
  });
});

describe("a malformed percent-escape in a path", () => {
  it("is a 400, not a 500", async () => {
    // Next decodes dynamic segments lazily; a bad escape rejects the params promise with URIError.
    const params = Promise.reject(new URIError("URI malformed"));
    params.catch(() => undefined);
    const res = await getPressRoute(getRequest("/api/presses/%ff", cookie), { params } as never);
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: string }).error).toMatch(/percent-escape/);
  });
});

describe("a form whose part kind differs from the stored one", () => {
  it("is a form error with field messages, never a thrown 500", async () => {
    const { id: pressId } = await createPress({ userId: manager.userId }, manager.shopId, { name: "Kinds", frameType: "h-frame" });
    const hose = componentInputSchema.parse({ kind: "hose", label: "Hose", spec: { line: "pressure", insideDiameterMm: 12.7, standard: "x", ratedPressureBar: 200, lengthMm: 100 } });
    const { id } = await createComponent({ userId: manager.userId }, pressId, hose);
    // The edit form claimed "cylinder": its spec is checked against the stored kind (hose).
    const error = await updateComponent({ userId: manager.userId }, id, { spec: { boreMm: 80, rodMm: 40, strokeMm: 200, ratedPressureBar: 250 } }).catch((e: unknown) => e);
    const state = refusalState(error, { label: "Hose" });
    expect(state.ok).toBe(false);
    expect(state.message).toBe("Please fix the marked fields.");
    expect(Object.keys(state.fieldErrors ?? {}).length).toBeGreaterThan(0);
    expect(state.values).toEqual({ label: "Hose" });
  });
});
