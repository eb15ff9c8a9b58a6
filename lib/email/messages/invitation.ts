import { ROLE_LABELS, type Role } from "@/lib/auth/permissions";
import { composeEmail, type EmailContent } from "../compose";

export type InvitationProps = { shopName: string; inviterName: string; role: Role; link: string; expiresInDays: number };

export function invitationEmail(props: InvitationProps): EmailContent & { subject: string } {
  const role = ROLE_LABELS[props.role].toLowerCase();
  return {
    subject: `${props.inviterName} invites you to ${props.shopName} on Presswright`,
    ...composeEmail({
      shopName: props.shopName,
      title: `Join ${props.shopName} as ${role === "inspector" ? "an" : "a"} ${role}`,
      paragraphs: [
        `${props.inviterName} keeps the records of the shop's hydraulic presses in Presswright and has invited you to join as ${role === "inspector" ? "an" : "a"} ${role}.`,
        `The link works once and for ${props.expiresInDays} days. If you have no account yet, you can make one from the same page.`,
      ],
      link: { href: props.link, label: "Accept the invitation" },
      footer: "Not expecting this? Ignore it: nothing happens unless the link is used.",
    }),
  };
}
