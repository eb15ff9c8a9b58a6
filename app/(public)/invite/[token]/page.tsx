import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInvitationForm, InviteSignUpForm } from "@/components/email/link-forms";
import { Card } from "@/components/ui/card";
import { getCurrentSession } from "@/lib/auth/current";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { getInvitation } from "@/lib/data/invitations";
import { acceptInvitationAction, inviteSignUpAction } from "../../email-link-actions";

export const metadata: Metadata = { title: "Invitation", referrer: "no-referrer" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const [invitation, current] = await Promise.all([getInvitation(token), getCurrentSession()]);
  let body;
  if (!invitation.ok) {
    body = (
      <p className="text-sm" role="alert">
        {invitation.reason === "expired" ? "This invitation has expired." : invitation.reason === "used" ? "This invitation has already been used or was withdrawn." : "This invitation link is not valid."} Ask the shop’s manager to send a new one.
      </p>
    );
  } else if (current && current.user.email === invitation.email) {
    body = <AcceptInvitationForm action={acceptInvitationAction.bind(null, token)} />;
  } else if (current) {
    body = <p className="text-sm">This invitation is for {invitation.email}, but you are signed in as {current.user.email}. Sign out, then open the link again.</p>;
  } else if (invitation.accountExists) {
    body = (
      <p className="text-sm">
        An account with {invitation.email} already exists.{" "}
        <Link className="underline" href={`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}`}>
          Sign in
        </Link>{" "}
        to accept.
      </p>
    );
  } else {
    body = <InviteSignUpForm action={inviteSignUpAction.bind(null, token)} email={invitation.email} />;
  }
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <h1 className="mb-2 text-2xl font-semibold tracking-tight">{invitation.ok ? `Join ${invitation.shopName}` : "Invitation"}</h1>
      {invitation.ok ? <p className="mb-6 text-sm text-steel-600">You are invited as {ROLE_LABELS[invitation.role].toLowerCase()}.</p> : null}
      <Card>{body}</Card>
    </div>
  );
}
