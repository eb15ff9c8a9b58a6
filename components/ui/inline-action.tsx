"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { initialActionState, type ActionState } from "@/lib/action-state";

/** A one-button form for a small destructive action (cancel, remove); a refusal shows beside it. */
export function InlineAction({ action: submit, label, pendingLabel, ariaLabel }: { action: (prev: ActionState) => Promise<ActionState>; label: string; pendingLabel: string; ariaLabel: string }) {
  const [state, action, pending] = useActionState(submit, initialActionState);
  return (
    <form action={action} className="flex items-center gap-2">
      <Button type="submit" variant="quiet" disabled={pending} aria-label={ariaLabel} className="min-h-10 px-2 text-fail">
        {pending ? pendingLabel : label}
      </Button>
      {state.message && !state.ok ? (
        <span role="alert" className="text-xs text-fail">
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
