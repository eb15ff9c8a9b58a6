import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { ConflictError, FieldError, LockedError } from "@/lib/errors";
import type { ActionState } from "./action-state";

/**
 * The data layer's expected refusals become a message on the form (keeping what was typed);
 * anything else is a real error and is rethrown to the error page.
 */
export function refusalState(error: unknown, values: Record<string, string>, forbiddenMessage = "Your role in this shop does not allow this change."): ActionState {
  if (error instanceof ForbiddenError) return { ok: false, message: forbiddenMessage, values };
  if (error instanceof ConflictError || error instanceof NotFoundError || error instanceof LockedError) return { ok: false, message: error.message, values };
  if (error instanceof FieldError) return { ok: false, message: error.message, fieldErrors: { [error.field]: [error.message] }, values };
  throw error;
}
