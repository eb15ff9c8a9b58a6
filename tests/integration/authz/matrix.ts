// The authorization matrix: every route handler (each exported method of app/**/route.ts) and every
// server action (each export of a "use server" file), with who may do what. matrix.test.ts runs
// every cell against the real MariaDB and fails when a route or action exists without a row here;
// csrf.test.ts sends every mutating row's request cross-site. Rules come from lib/auth/permissions.ts.
//
// Cells of a shop-scoped row ("shop"): for shop A and shop B, each of the shop's manager, inspector
// and member acts on an object of their own shop (expected: `own[role]`) and on the same kind of
// object in the other shop (expected: 404 — a foreign object is never 403), plus a signed-out
// request (401). "user" rows act on the caller's own data only: any signed-in user 2xx, signed-out
// 401. "public" rows list their own cases.
import { photoFileUrl } from "@/lib/photos/file-urls";
import { FULL_SIZING_INPUT } from "../../fixtures/sizing-inputs";
import { getInspection } from "@/lib/data/inspections";
import { createSession } from "@/lib/auth/session";
import { JOB_SECRET_HEADER } from "@/lib/email/jobs";
import {
  freshBooking, freshComponent, freshInspection, freshPhoto, freshPress, freshProblem, freshServiceEntry, freshTagOut, freshTemplate,
  GAUGE, nextSlot, op, pressWithReading, TEMPLATE, type Shop, type ShopRole,
} from "./world";

/** Status classes a rule may name. 400 only where a library, not our code, answers a refusal (the upload SDK's bad signature). */
export type Outcome = "2xx" | "400" | "401" | "403" | "404";
export type Method = "GET" | "POST" | "PATCH" | "PUT" | "DELETE";
/** One request: path (with query), the dynamic params, a JSON body (or `raw` bytes, sent as they are), extra headers; `session: false` sends no cookie. */
export type Call = { path: string; params?: Record<string, string>; body?: unknown; raw?: string | Uint8Array<ArrayBuffer>; headers?: Record<string, string>; session?: false };

type Common = { file: string; method: Method; rule: string };
export type ShopRow = Common & {
  scope: "shop";
  own: Record<ShopRole, Outcome>;
  /** What another shop's member gets; 404 unless the row says why not. */
  foreign?: Outcome;
  call: (shop: Shop) => Promise<Call>;
};
export type UserRow = Common & { scope: "user"; call: (shop: Shop) => Promise<Call> };
export type PublicCase = { name: string; expect: Outcome; call: (shop: Shop) => Promise<Call> };
export type PublicRow = Common & { scope: "public"; cases: PublicCase[] };
export type RouteRow = ShopRow | UserRow | PublicRow;

const ALL: Record<ShopRole, Outcome> = { manager: "2xx", inspector: "2xx", member: "2xx" };
const MANAGER: Record<ShopRole, Outcome> = { manager: "2xx", inspector: "403", member: "403" };
const MANAGER_INSPECTOR: Record<ShopRole, Outcome> = { manager: "2xx", inspector: "2xx", member: "403" };
/** Objects held or uploaded by the member: the holder/uploader, or a manager. */
const HOLDER_OR_MANAGER: Record<ShopRole, Outcome> = { manager: "2xx", inspector: "403", member: "2xx" };

export const JOBS_TEST_SECRET = "matrix-jobs-secret-0123456789";

const press = (shop: Shop, tail = ""): Call => ({ path: `/api/presses/${shop.pressId}${tail}`, params: { pressId: shop.pressId } });

export const ROUTES: RouteRow[] = [
  // Public and session routes.
  {
    file: "app/api/auth/sign-in/route.ts", method: "POST", scope: "public", rule: "anyone; right password 2xx, wrong 401 (throttled 429)",
    cases: [
      { name: "right password", expect: "2xx", call: async (s) => ({ path: "/api/auth/sign-in", body: { email: s.users.member.email, password: s.users.member.password }, session: false }) },
      { name: "wrong password", expect: "401", call: async (s) => ({ path: "/api/auth/sign-in", body: { email: s.users.member.email, password: "not the password at all" }, session: false }) },
    ],
  },
  {
    file: "app/api/auth/sign-out/route.ts", method: "POST", scope: "public", rule: "anyone; ends the cookie's session if there is one",
    cases: [
      { name: "signed in (a session of its own)", expect: "2xx", call: async (s) => ({ path: "/api/auth/sign-out", session: false, headers: { cookie: `session=${(await createSession(s.users.member.userId)).token}` } }) },
      { name: "signed out", expect: "2xx", call: async () => ({ path: "/api/auth/sign-out", session: false }) },
    ],
  },
  { file: "app/api/me/route.ts", method: "GET", scope: "user", rule: "signed in: the caller and their shops", call: async () => ({ path: "/api/me" }) },
  { file: "app/api/due/route.ts", method: "GET", scope: "user", rule: "signed in: due items of the caller's shops", call: async () => ({ path: "/api/due" }) },
  { file: "app/api/bookings/mine/route.ts", method: "GET", scope: "user", rule: "signed in: the caller's bookings", call: async () => ({ path: "/api/bookings/mine" }) },
  {
    file: "app/api/session/route.ts", method: "GET", scope: "public", rule: "anyone: the caller's own session, or signedIn false (the prerendered public pages' header)",
    cases: [
      { name: "signed out", expect: "2xx", call: async () => ({ path: "/api/session", session: false }) },
      { name: "signed in", expect: "2xx", call: async () => ({ path: "/api/session" }) },
    ],
  },
  {
    file: "app/api/health/route.ts", method: "GET", scope: "public", rule: "anyone (load balancers)",
    cases: [{ name: "anyone", expect: "2xx", call: async () => ({ path: "/api/health", session: false }) }],
  },
  {
    file: "app/api/sizing/route.ts", method: "POST", scope: "public", rule: "anyone, rate-limited per address; reads no cookie",
    cases: [
      { name: "signed out", expect: "2xx", call: async () => ({ path: "/api/sizing", body: FULL_SIZING_INPUT, session: false }) },
      { name: "signed in", expect: "2xx", call: async () => ({ path: "/api/sizing", body: FULL_SIZING_INPUT }) },
    ],
  },
  {
    file: "app/api/status/[token]/route.ts", method: "GET", scope: "public", rule: "whoever holds the press's status link; unknown token 404",
    cases: [
      { name: "the press's token", expect: "2xx", call: async (s) => ({ path: `/api/status/${s.statusToken}`, params: { token: s.statusToken }, session: false }) },
      { name: "an unknown token", expect: "404", call: async () => ({ path: "/api/status/aaaaaaaaaaaaaaaaaaaaaaaa", params: { token: "aaaaaaaaaaaaaaaaaaaaaaaa" }, session: false }) },
    ],
  },
  {
    file: "app/api/jobs/reminders/route.ts", method: "POST", scope: "public", rule: "the scheduler, with JOBS_SECRET; anyone else 401",
    cases: [
      { name: "with the secret", expect: "2xx", call: async () => ({ path: "/api/jobs/reminders", session: false, headers: { [JOB_SECRET_HEADER]: JOBS_TEST_SECRET } }) },
      { name: "wrong secret", expect: "401", call: async () => ({ path: "/api/jobs/reminders", session: false, headers: { [JOB_SECRET_HEADER]: "matrix-wrong-secret-0123456789" } }) },
      { name: "signed in, no secret", expect: "401", call: async () => ({ path: "/api/jobs/reminders" }) },
    ],
  },
  {
    file: "app/api/uploadthing/route.ts", method: "GET", scope: "public", rule: "anyone: the upload routes' public config",
    cases: [{ name: "anyone", expect: "2xx", call: async () => ({ path: "/api/uploadthing", session: false }) }],
  },
  {
    file: "app/api/uploadthing/route.ts", method: "POST", scope: "public",
    rule: "same-origin upload requests (the SDK's middleware calls lib/data's photo rules: signed out 403, foreign press 404, role 403 — run with the upload fake in photos.test.ts) and signed callbacks; an unsigned callback is refused",
    cases: [
      { name: "an upload request from another site", expect: "403", call: async () => ({ path: "/api/uploadthing?slug=pressPhoto&actionType=upload", headers: { origin: "https://evil.example" }, body: { files: [], input: {} } }) },
      { name: "a callback without a valid signature", expect: "400", call: async () => ({ path: "/api/uploadthing?slug=pressPhoto", session: false, headers: { "uploadthing-hook": "callback", "x-uploadthing-signature": "hmac-sha256=00" }, body: { status: "uploaded", file: {}, metadata: {} } }) },
    ],
  },
  {
    file: "app/serwist/[path]/route.ts", method: "GET", scope: "public", rule: "anyone: the service worker script",
    cases: [{ name: "anyone", expect: "2xx", call: async () => ({ path: "/serwist/sw.js", params: { path: "sw.js" }, session: false }) }],
  },

  // Presses.
  { file: "app/api/presses/route.ts", method: "GET", scope: "shop", own: ALL, foreign: "2xx", rule: "members list their shop's presses; another shop's id lists nothing (200, empty)", call: async (s) => ({ path: `/api/presses?shopId=${s.shopId}` }) },
  { file: "app/api/presses/route.ts", method: "POST", scope: "shop", own: MANAGER, rule: "editPress (manager)", call: async (s) => ({ path: "/api/presses", body: { name: "Matrix new press", frameType: "h-frame", shopId: s.shopId } }) },
  { file: "app/api/presses/[pressId]/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s) },
  { file: "app/api/presses/[pressId]/route.ts", method: "PATCH", scope: "shop", own: MANAGER, rule: "editPress (manager)", call: async (s) => ({ ...press(s), body: { notes: "Matrix note" } }) },
  { file: "app/api/presses/[pressId]/status/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/status") },
  { file: "app/api/presses/[pressId]/export/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/export?what=parts") },
  { file: "app/api/presses/[pressId]/components/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/components") },
  { file: "app/api/presses/[pressId]/components/route.ts", method: "POST", scope: "shop", own: MANAGER, rule: "editPress (manager)", call: async (s) => ({ ...press(s, "/components"), body: GAUGE }) },
  { file: "app/api/components/[componentId]/route.ts", method: "PATCH", scope: "shop", own: MANAGER, rule: "editPress (manager)", call: async (s) => { const id = await freshComponent(s); return { path: `/api/components/${id}`, params: { componentId: id }, body: { label: "Matrix renamed" } }; } },
  { file: "app/api/components/[componentId]/route.ts", method: "DELETE", scope: "shop", own: MANAGER, rule: "editPress (manager)", call: async (s) => { const id = await freshComponent(s); return { path: `/api/components/${id}`, params: { componentId: id } }; } },
  { file: "app/api/components/[componentId]/replace/route.ts", method: "POST", scope: "shop", own: MANAGER, rule: "editPress (manager)", call: async (s) => { const id = await freshComponent(s); return { path: `/api/components/${id}/replace`, params: { componentId: id }, body: { reason: "Matrix swap", removedOn: "2026-01-06", replacement: GAUGE } }; } },
  { file: "app/api/presses/[pressId]/hour-meter/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/hour-meter") },
  { file: "app/api/presses/[pressId]/hour-meter/route.ts", method: "POST", scope: "shop", own: ALL, rule: "recordHours (everyone in the shop)", call: async (s) => { const id = await freshPress(s); return { path: `/api/presses/${id}/hour-meter`, params: { pressId: id }, body: { hours: 12 } }; } },
  { file: "app/api/presses/[pressId]/hour-meter/corrections/route.ts", method: "POST", scope: "shop", own: MANAGER, rule: "correctHours (manager)", call: async (s) => { const id = await pressWithReading(s); return { path: `/api/presses/${id}/hour-meter/corrections`, params: { pressId: id }, body: { hours: 5, reason: "Misread the meter" } }; } },
  { file: "app/api/presses/[pressId]/photos/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/photos") },
  { file: "app/api/photos/[photoId]/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => { const id = await freshPhoto(s); return { path: `/api/photos/${id}`, params: { photoId: id } }; } },
  { file: "app/api/photos/[photoId]/route.ts", method: "PATCH", scope: "shop", own: HOLDER_OR_MANAGER, rule: "uploader (attachPhoto) or editAnyPhoto (manager)", call: async (s) => { const id = await freshPhoto(s); return { path: `/api/photos/${id}`, params: { photoId: id }, body: { caption: "Matrix caption" } }; } },
  { file: "app/api/photos/[photoId]/route.ts", method: "DELETE", scope: "shop", own: HOLDER_OR_MANAGER, rule: "uploader (attachPhoto) or editAnyPhoto (manager)", call: async (s) => { const id = await freshPhoto(s); return { path: `/api/photos/${id}`, params: { photoId: id } }; } },
  {
    file: "app/photo-files/[photoId]/[variant]/route.ts", method: "GET", scope: "shop", own: ALL, rule: "a valid signed link and viewPress (bad signature 403, expired 410)",
    call: async (s) => { const id = await freshPhoto(s); const url = new URL(photoFileUrl(id, "thumb").url, "http://127.0.0.1:3000"); return { path: url.pathname + url.search, params: { photoId: id, variant: "thumb" } }; },
  },

  // Bookings and problems.
  { file: "app/api/presses/[pressId]/bookings/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/bookings") },
  { file: "app/api/presses/[pressId]/bookings/route.ts", method: "POST", scope: "shop", own: ALL, rule: "bookPress (everyone in the shop)", call: async (s) => ({ ...press(s, "/bookings"), body: nextSlot() }) },
  { file: "app/api/bookings/[bookingId]/route.ts", method: "DELETE", scope: "shop", own: HOLDER_OR_MANAGER, rule: "the holder (bookPress) or cancelAnyBooking (manager)", call: async (s) => { const id = await freshBooking(s); return { path: `/api/bookings/${id}`, params: { bookingId: id } }; } },
  { file: "app/api/bookings/[bookingId]/ics/route.ts", method: "GET", scope: "shop", own: HOLDER_OR_MANAGER, rule: "the holder or cancelAnyBooking (manager)", call: async (s) => { const id = await freshBooking(s); return { path: `/api/bookings/${id}/ics`, params: { bookingId: id } }; } },
  { file: "app/api/presses/[pressId]/problems/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/problems") },
  { file: "app/api/presses/[pressId]/problems/route.ts", method: "POST", scope: "shop", own: ALL, rule: "reportProblem (everyone in the shop)", call: async (s) => ({ ...press(s, "/problems"), body: { description: "Matrix drip", severity: "low", stopUse: false } }) },
  { file: "app/api/problems/[problemId]/route.ts", method: "PATCH", scope: "shop", own: MANAGER_INSPECTOR, rule: "closeProblem (manager, inspector)", call: async (s) => { const id = await freshProblem(s); return { path: `/api/problems/${id}`, params: { problemId: id }, body: { close: true, reason: "Tightened the fitting" } }; } },
  { file: "app/api/presses/[pressId]/tag-outs/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/tag-outs") },
  { file: "app/api/presses/[pressId]/tag-outs/route.ts", method: "POST", scope: "shop", own: MANAGER_INSPECTOR, rule: "tagOutPress (manager, inspector)", call: async (s) => { const id = await freshPress(s); return { path: `/api/presses/${id}/tag-outs`, params: { pressId: id }, body: { reason: "Matrix lockout" } }; } },
  { file: "app/api/tag-outs/[tagOutId]/clear/route.ts", method: "POST", scope: "shop", own: MANAGER_INSPECTOR, rule: "clearTagOut (manager, inspector)", call: async (s) => { const id = await freshTagOut(s); return { path: `/api/tag-outs/${id}/clear`, params: { tagOutId: id }, body: { reason: "Repaired and tested" } }; } },

  // Service.
  { file: "app/api/presses/[pressId]/service-log/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/service-log") },
  { file: "app/api/presses/[pressId]/service-log/route.ts", method: "POST", scope: "shop", own: MANAGER_INSPECTOR, rule: "logService (manager, inspector)", call: async (s) => ({ ...press(s, "/service-log"), body: { kind: "other", performedOn: "2026-01-07", notes: "Matrix service" } }) },
  { file: "app/api/service-log/[entryId]/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => { const id = await freshServiceEntry(s); return { path: `/api/service-log/${id}`, params: { entryId: id } }; } },
  { file: "app/api/service-log/[entryId]/route.ts", method: "PATCH", scope: "shop", own: MANAGER_INSPECTOR, rule: "logService (manager, inspector)", call: async (s) => { const id = await freshServiceEntry(s); return { path: `/api/service-log/${id}`, params: { entryId: id }, body: { notes: "Matrix correction" } }; } },
  { file: "app/api/presses/[pressId]/service-plan/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/service-plan") },
  { file: "app/api/presses/[pressId]/service-plan/route.ts", method: "POST", scope: "shop", own: MANAGER, rule: "editServicePlan (manager)", call: async (s) => ({ ...press(s, "/service-plan"), body: { title: "Matrix oil change", kind: "oil-changed", intervalDays: 180 } }) },

  // Inspections.
  { file: "app/api/inspection-templates/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewShop", call: async (s) => ({ path: `/api/inspection-templates?shopId=${s.shopId}` }) },
  { file: "app/api/inspection-templates/route.ts", method: "POST", scope: "shop", own: MANAGER, rule: "editInspectionTemplates (manager)", call: async (s) => ({ path: `/api/inspection-templates?shopId=${s.shopId}`, body: TEMPLATE }) },
  { file: "app/api/inspection-templates/[templateId]/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewShop", call: async (s) => ({ path: `/api/inspection-templates/${s.monthlyTemplateId}`, params: { templateId: s.monthlyTemplateId } }) },
  { file: "app/api/inspection-templates/[templateId]/route.ts", method: "PUT", scope: "shop", own: MANAGER, rule: "editInspectionTemplates (manager)", call: async (s) => { const id = await freshTemplate(s); return { path: `/api/inspection-templates/${id}`, params: { templateId: id }, body: TEMPLATE }; } },
  { file: "app/api/presses/[pressId]/inspections/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/inspections") },
  { file: "app/api/presses/[pressId]/inspections/route.ts", method: "POST", scope: "shop", own: MANAGER_INSPECTOR, rule: "performInspection for an inspector-signed checklist (member 403; the pre-use check lets members)", call: async (s) => { const id = await freshPress(s); return { path: `/api/presses/${id}/inspections`, params: { pressId: id }, body: { templateId: s.monthlyTemplateId } }; } },
  { file: "app/api/presses/[pressId]/inspections/verify/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => press(s, "/inspections/verify") },
  { file: "app/api/inspections/[inspectionId]/route.ts", method: "GET", scope: "shop", own: ALL, rule: "viewPress", call: async (s) => { const id = await freshInspection(s); return { path: `/api/inspections/${id}`, params: { inspectionId: id } }; } },
  {
    file: "app/api/inspections/[inspectionId]/route.ts", method: "PATCH", scope: "shop", own: MANAGER_INSPECTOR, rule: "performInspection (inspector-signed checklist)",
    call: async (s) => {
      const id = await freshInspection(s);
      const view = await getInspection({ userId: s.users.manager.userId }, id);
      return { path: `/api/inspections/${id}`, params: { inspectionId: id }, body: { answers: [{ opKey: op(), itemKey: view.items[0]!.key, outcome: "pass" }] } };
    },
  },
  { file: "app/api/inspections/[inspectionId]/sign/route.ts", method: "POST", scope: "shop", own: MANAGER_INSPECTOR, rule: "signInspection (inspector-signed checklist), with a recent sign-in", call: async (s) => { const id = await freshInspection(s, true); return { path: `/api/inspections/${id}/sign`, params: { inspectionId: id }, body: {} }; } },
];

/**
 * Server actions. Each delegates its authorization to a data-layer function called with the
 * session's user; `route` names the row whose cells run that same function (so the rule is proven
 * there), `data` names data-layer cells in matrix.test.ts, `self` acts only on the session's own user,
 * `public` says why no cell is needed.
 */
/** Data-layer functions behind actions that no route calls; matrix.test.ts runs their cells. */
export type DataCell = "removeComponent" | "updateServiceTask" | "regenerateStatusToken" | "updateShop" | "changeMemberRole" | "updateOpeningHours" | "removeMember" | "createInvitation" | "revokeInvitation" | "createPlannedPressFromSizing";

export type ActionRow = { file: string; name: string; rule: string } & ({ route: `${Method} ${string}` } | { data: DataCell } | { self: string } | { public: string });

const PRESS_ACTIONS = "app/(app)/presses/[pressId]/actions.ts";
export const ACTIONS: ActionRow[] = [
  { file: "app/(app)/account/actions.ts", name: "changePasswordAction", rule: "the signed-in user's own password", self: "changes only the session's user (its current password is checked)" },
  { file: "app/(app)/account/actions.ts", name: "updateUnitsAction", rule: "the signed-in user's own preference", self: "changes only the session's user" },
  { file: "app/(app)/presses/actions.ts", name: "createPressAction", rule: "editPress (manager)", route: "POST app/api/presses/route.ts" },
  { file: "app/(app)/presses/actions.ts", name: "updatePressAction", rule: "editPress (manager)", route: "PATCH app/api/presses/[pressId]/route.ts" },
  { file: PRESS_ACTIONS, name: "addComponentAction", rule: "editPress (manager)", route: "POST app/api/presses/[pressId]/components/route.ts" },
  { file: PRESS_ACTIONS, name: "editComponentAction", rule: "editPress (manager)", route: "PATCH app/api/components/[componentId]/route.ts" },
  { file: PRESS_ACTIONS, name: "replaceComponentAction", rule: "editPress (manager)", route: "POST app/api/components/[componentId]/replace/route.ts" },
  { file: PRESS_ACTIONS, name: "removeComponentAction", rule: "editPress (manager); deletes a mistaken part (DELETE row) or retires one", data: "removeComponent" },
  { file: PRESS_ACTIONS, name: "recordHoursAction", rule: "recordHours (everyone in the shop)", route: "POST app/api/presses/[pressId]/hour-meter/route.ts" },
  { file: PRESS_ACTIONS, name: "correctHoursAction", rule: "correctHours (manager)", route: "POST app/api/presses/[pressId]/hour-meter/corrections/route.ts" },
  { file: "app/(app)/presses/[pressId]/tag-out-actions.ts", name: "tagOutAction", rule: "tagOutPress (manager, inspector)", route: "POST app/api/presses/[pressId]/tag-outs/route.ts" },
  { file: "app/(app)/presses/[pressId]/tag-out-actions.ts", name: "clearTagOutAction", rule: "clearTagOut (manager, inspector)", route: "POST app/api/tag-outs/[tagOutId]/clear/route.ts" },
  { file: "app/(app)/presses/[pressId]/problem-actions.ts", name: "reportProblemAction", rule: "reportProblem (everyone)", route: "POST app/api/presses/[pressId]/problems/route.ts" },
  { file: "app/(app)/presses/[pressId]/problem-actions.ts", name: "closeProblemAction", rule: "closeProblem (manager, inspector)", route: "PATCH app/api/problems/[problemId]/route.ts" },
  { file: "app/(app)/presses/[pressId]/service/actions.ts", name: "logServiceAction", rule: "logService (manager, inspector)", route: "POST app/api/presses/[pressId]/service-log/route.ts" },
  { file: "app/(app)/presses/[pressId]/service/actions.ts", name: "correctServiceEntryAction", rule: "logService (manager, inspector)", route: "PATCH app/api/service-log/[entryId]/route.ts" },
  { file: "app/(app)/presses/[pressId]/service/actions.ts", name: "addServiceTaskAction", rule: "editServicePlan (manager)", route: "POST app/api/presses/[pressId]/service-plan/route.ts" },
  { file: "app/(app)/presses/[pressId]/service/actions.ts", name: "updateServiceTaskAction", rule: "editServicePlan (manager)", data: "updateServiceTask" },
  { file: "app/(app)/presses/[pressId]/service/actions.ts", name: "applyStartingPlanAction", rule: "editServicePlan (manager)", route: "POST app/api/presses/[pressId]/service-plan/route.ts" },
  { file: "app/(app)/presses/[pressId]/status-card/actions.ts", name: "regenerateStatusLinkAction", rule: "regenerateStatusLink (manager)", data: "regenerateStatusToken" },
  { file: "app/(app)/inspections/actions.ts", name: "startInspectionAction", rule: "performInspection / performPreUseCheck", route: "POST app/api/presses/[pressId]/inspections/route.ts" },
  { file: "app/(app)/inspections/actions.ts", name: "reauthenticateForSigningAction", rule: "the signed-in user re-enters their own password (a fresh sign-in for signing)", self: "refreshes only the session's own sign-in time" },
  { file: "app/(app)/inspections/templates/actions.ts", name: "saveTemplateAction", rule: "editInspectionTemplates (manager)", route: "PUT app/api/inspection-templates/[templateId]/route.ts" },
  { file: "app/(app)/shop/settings/actions.ts", name: "updateShopAction", rule: "editShop (manager)", data: "updateShop" },
  { file: "app/(app)/shop/settings/actions.ts", name: "changeRoleAction", rule: "manageMembers (manager)", data: "changeMemberRole" },
  { file: "app/(app)/shop/settings/actions.ts", name: "updateOpeningHoursAction", rule: "editShop (manager)", data: "updateOpeningHours" },
  { file: "app/(app)/shop/settings/actions.ts", name: "removeMemberAction", rule: "manageMembers (manager)", data: "removeMember" },
  { file: "app/(app)/shop/invitation-actions.ts", name: "inviteAction", rule: "manageMembers (manager)", data: "createInvitation" },
  { file: "app/(app)/shop/invitation-actions.ts", name: "invitationCommandAction", rule: "manageMembers (manager): resend or revoke", data: "revokeInvitation" },
  { file: "app/(app)/bookings/actions.ts", name: "bookPressAction", rule: "bookPress (everyone)", route: "POST app/api/presses/[pressId]/bookings/route.ts" },
  { file: "app/(app)/bookings/actions.ts", name: "cancelBookingAction", rule: "holder or cancelAnyBooking (manager)", route: "DELETE app/api/bookings/[bookingId]/route.ts" },
  { file: "app/(public)/sizing/actions.ts", name: "savePlannedPressAction", rule: "signed in; editPress in the chosen shop", data: "createPlannedPressFromSizing" },
  { file: "app/(public)/sign-up/actions.ts", name: "signUpAction", rule: "anyone", public: "creates a new user and personal shop; nothing existing is touched" },
  { file: "app/(public)/sign-in/actions.ts", name: "signInAction", rule: "anyone (throttled)", public: "same attemptSignIn as the sign-in route row" },
  { file: "app/(public)/email-link-actions.ts", name: "requestOrigin", rule: "helper: reads the request's own origin", public: "returns a string, changes nothing" },
  { file: "app/(public)/email-link-actions.ts", name: "forgotPasswordAction", rule: "anyone; same answer whether or not the address exists", public: "only queues a mail to the address's owner" },
  { file: "app/(public)/email-link-actions.ts", name: "resetPasswordAction", rule: "holder of an unexpired reset token", public: "the token is the credential (tests/integration/email-flows.test.ts)" },
  { file: "app/(public)/email-link-actions.ts", name: "acceptInvitationAction", rule: "signed in, holder of the invitation token for their own address", self: "the token is the credential and must name the session user's address (tests/integration/email-flows.test.ts)" },
  { file: "app/(public)/email-link-actions.ts", name: "inviteSignUpAction", rule: "holder of an unexpired invitation token", public: "the token is the credential (tests/integration/email-flows.test.ts)" },
];

export const rowKey = (row: { method: Method; file: string }): `${Method} ${string}` => `${row.method} ${row.file}`;
