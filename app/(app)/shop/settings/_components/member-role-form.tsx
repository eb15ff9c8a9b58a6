"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { initialActionState } from "@/lib/action-state";
import { ROLE_LABELS, type Role } from "@/lib/auth/permissions";
import { changeRoleAction } from "../actions";

export function MemberRoleForm({ userId, role, name }: { userId: string; role: Role; name: string }) {
  const [state, action, pending] = useActionState(changeRoleAction, initialActionState);
  return (
    <form action={action} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="userId" value={userId} />
      <label className="sr-only" htmlFor={`role-${userId}`}>
        Role of {name}
      </label>
      <select id={`role-${userId}`} name="role" defaultValue={role} className="min-h-10 rounded-md border border-steel-300 bg-white px-2 text-sm">
        {(Object.keys(ROLE_LABELS) as Role[]).map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </select>
      <Button type="submit" variant="secondary" disabled={pending} className="min-h-10">
        Change
      </Button>
      {state.message ? (
        <span role={state.ok ? "status" : "alert"} className={`text-xs ${state.ok ? "text-ok" : "text-fail"}`}>
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
