import { describe, expect, it } from "vitest";
import { ACTIONS, assertCan, can, canEditPhoto, ForbiddenError, type Action, type Role } from "@/lib/auth/permissions";

// The expected matrix, written out independently of lib/auth/permissions.ts (product.md, "Who uses it").
const EXPECTED: Record<Action, Role[]> = {
  viewShop: ["manager", "inspector", "member"],
  editShop: ["manager"],
  manageMembers: ["manager"],
  viewPress: ["manager", "inspector", "member"],
  editPress: ["manager"],
  recordHours: ["manager", "inspector", "member"],
  correctHours: ["manager"],
  logService: ["manager", "inspector"],
  editServicePlan: ["manager"],
  performInspection: ["manager", "inspector"],
  signInspection: ["manager", "inspector"],
  performPreUseCheck: ["manager", "inspector", "member"],
  signPreUseCheck: ["manager", "inspector", "member"],
  editInspectionTemplates: ["manager"],
  tagOutPress: ["manager", "inspector"],
  clearTagOut: ["manager", "inspector"],
  bookPress: ["manager", "inspector", "member"],
  cancelAnyBooking: ["manager"],
  regenerateStatusLink: ["manager"],
  reportProblem: ["manager", "inspector", "member"],
  closeProblem: ["manager", "inspector"],
  attachPhoto: ["manager", "inspector", "member"],
  editAnyPhoto: ["manager"],
};

describe("permissions", () => {
  it("matches the expected role matrix with zero mismatches", () => {
    const mismatches: string[] = [];
    for (const action of Object.keys(ACTIONS) as Action[]) {
      for (const role of ["manager", "inspector", "member"] as Role[]) {
        if (can(role, action) !== EXPECTED[action].includes(role)) mismatches.push(`${role}:${action}`);
      }
    }
    expect(mismatches).toEqual([]);
    expect(Object.keys(ACTIONS).sort()).toEqual(Object.keys(EXPECTED).sort());
  });

  it("denies everything to a non-member", () => {
    for (const action of Object.keys(ACTIONS) as Action[]) {
      expect(can(null, action)).toBe(false);
      expect(can(undefined, action)).toBe(false);
    }
  });

  it("throws ForbiddenError naming the action", () => {
    expect(() => assertCan("member", "editShop")).toThrow(ForbiddenError);
    expect(() => assertCan("manager", "editShop")).not.toThrow();
  });

  it("lets uploaders change their own photos and only managers anyone's", () => {
    expect([canEditPhoto("member", true), canEditPhoto("inspector", true), canEditPhoto("manager", true)]).toEqual([true, true, true]);
    expect([canEditPhoto("member", false), canEditPhoto("inspector", false), canEditPhoto("manager", false)]).toEqual([false, false, true]);
    expect(canEditPhoto(null, true)).toBe(false);
  });
});
