"use client";

import { InlineAction } from "@/components/ui/inline-action";
import { removeMemberAction } from "../actions";

export function RemoveMemberForm({ userId, name }: { userId: string; name: string }) {
  return <InlineAction action={removeMemberAction.bind(null, userId)} label="Remove" pendingLabel="Removing…" ariaLabel={`Remove ${name} from the shop`} />;
}
