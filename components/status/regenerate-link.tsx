"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState, type ActionState } from "@/lib/action-state";

export function RegenerateLink({ action: submit }: { action: (prev: ActionState) => Promise<ActionState> }) {
  const [state, action, pending] = useActionState(submit, initialActionState);
  return (
    <form action={action} className="no-print flex flex-col gap-2">
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <p className="text-sm text-steel-600">If the link got out to people who should not have it, make a new one: the old link and printed cards stop working.</p>
      <Button type="submit" variant="secondary" disabled={pending} className="self-start">
        {pending ? "Making…" : "Make a new link"}
      </Button>
    </form>
  );
}
