/**
 * Who may do what — the one place for role rules. The data layer (lib/data) calls these before
 * every write and scopes every read to the acting user's shops; pages only use them to decide
 * what to show, never as the gate.
 */
export type Role = "manager" | "inspector" | "member";

export const ROLE_LABELS: Record<Role, string> = {
  manager: "Manager",
  inspector: "Inspector",
  member: "Member",
};

/** Every action a role may or may not take inside its shop. */
export const ACTIONS = {
  viewShop: ["manager", "inspector", "member"],
  editShop: ["manager"],
  manageMembers: ["manager"],
  viewPress: ["manager", "inspector", "member"],
  editPress: ["manager"],
  recordHours: ["manager", "inspector", "member"],
  /** Correct a wrong hour-meter reading (kept in the history with who and why). */
  correctHours: ["manager"],
  logService: ["manager", "inspector"],
  editServicePlan: ["manager"],
  performInspection: ["manager", "inspector"],
  signInspection: ["manager", "inspector"],
  /** Checklists whose template lets any member sign (the before-each-use check). */
  performPreUseCheck: ["manager", "inspector", "member"],
  signPreUseCheck: ["manager", "inspector", "member"],
  editInspectionTemplates: ["manager"],
  tagOutPress: ["manager", "inspector"],
  clearTagOut: ["manager", "inspector"],
  bookPress: ["manager", "inspector", "member"],
  /** Cancel someone else's booking (everyone who may book may cancel their own). */
  cancelAnyBooking: ["manager"],
  /** Replace a press's status-page link, so a printed QR card stops working. */
  regenerateStatusLink: ["manager"],
  reportProblem: ["manager", "inspector", "member"],
  closeProblem: ["manager", "inspector"],
  attachPhoto: ["manager", "inspector", "member"],
  /** Edit or delete a photo someone else uploaded (uploaders may always change their own). */
  editAnyPhoto: ["manager"],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof ACTIONS;

export function can(role: Role | null | undefined, action: Action): boolean {
  return role != null && (ACTIONS[action] as readonly Role[]).includes(role);
}

export const canEditShop = (role: Role | null): boolean => can(role, "editShop");
export const canEditPress = (role: Role | null): boolean => can(role, "editPress");
/** Photos: the uploader (still a member who may attach photos) or a manager. */
export const canEditPhoto = (role: Role | null, isUploader: boolean): boolean => can(role, isUploader ? "attachPhoto" : "editAnyPhoto");

/**
 * The action that running or signing an inspection needs: a template signed by "member" (the
 * before-each-use check) lets anyone in the shop do it; every other checklist needs an inspector
 * (or manager).
 */
export function inspectionAction(signerRole: "member" | "inspector", step: "perform" | "sign"): Action {
  if (signerRole === "member") return step === "perform" ? "performPreUseCheck" : "signPreUseCheck";
  return step === "perform" ? "performInspection" : "signInspection";
}

/** Raised by the data layer when the actor lacks the role; pages turn it into forbidden(), APIs into 403. */
export class ForbiddenError extends Error {
  constructor(public readonly action: Action) {
    super(`Your role in this shop does not allow: ${action}`);
    this.name = "ForbiddenError";
  }
}

/** Raised when an object does not exist or belongs to a shop the actor is not in (answered 404 either way). */
export class NotFoundError extends Error {
  constructor(what = "Not found") {
    super(what);
    this.name = "NotFoundError";
  }
}

export function assertCan(role: Role | null | undefined, action: Action): void {
  if (!can(role, action)) throw new ForbiddenError(action);
}
