import { invitationCommandAction, inviteAction } from "@/app/(app)/shop/invitation-actions";
import { RoleBadge } from "@/components/ui/role-badge";
import { listPendingInvitations } from "@/lib/data/invitations";
import { InvitationCommands, InviteForm } from "./invitation-forms";

/** The shop page's invitations: invite by e-mail with a role; resend or withdraw pending ones. Managers only. */
export async function ShopInvitations({ userId, shopId }: { userId: string; shopId: string }) {
  const pending = await listPendingInvitations({ userId }, shopId);
  return (
    <div className="flex flex-col gap-4">
      <InviteForm action={inviteAction} />
      {pending.length > 0 ? (
        <ul className="divide-y divide-steel-100" data-testid="pending-invitations">
          {pending.map((inv) => (
            <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <div className="min-w-0">
                <p className="truncate font-medium">{inv.email}</p>
                <p className="text-xs text-steel-500">
                  {inv.expired ? "Link expired — resend it" : `Link valid until ${inv.expiresAt.toISOString().slice(0, 10)}`}
                </p>
              </div>
              <div className="flex items-center gap-2">
                <RoleBadge role={inv.role} />
                <InvitationCommands action={invitationCommandAction.bind(null, inv.id)} email={inv.email} />
              </div>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-steel-600">No invitations waiting.</p>
      )}
    </div>
  );
}
