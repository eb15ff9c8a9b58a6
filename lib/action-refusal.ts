import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { z } from "zod";
import { ConflictError, FieldError, isValueRefusedByDatabase, LockedError, VALUE_REFUSED_MESSAGE } from "@/lib/errors";
import { fieldErrorsOf } from "@/lib/validation/field-errors";
import type { ActionState } from "./action-state";

/**
 * The data layer's expected refusals become a message on the form (keeping what was typed);
 * anything else is a real error and is rethrown to the error page.
 */
export function refusalState(error: unknown, values: Record<string, string>, forbiddenMessage = "Your role in this shop does not allow this change."): ActionState {
  if (error instanceof ForbiddenError) return { ok: false, message: forbiddenMessage, values };
  if (error instanceof ConflictError || error instanceof NotFoundError || error instanceof LockedError) return { ok: false, message: error.message, values };
  if (error instanceof FieldError) return { ok: false, message: error.message, fieldErrors: { [error.field]: [error.message] }, values };
  // The data layer re-checks input against what is stored (e.g. a part's spec against its stored
  // kind, not the kind a form claimed): a mismatch is the form's problem, never a 500.
  if (error instanceof z.ZodError) {
    return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsOf(error.issues), values };
  }
  // A value its column cannot hold (the same mapping as lib/http.ts): the form's problem too.
  if (isValueRefusedByDatabase(error)) return { ok: false, message: VALUE_REFUSED_MESSAGE, values };
  throw error;
}
