import { composeEmail, type EmailContent } from "../compose";

export type PasswordResetProps = { shopName: string; link: string; expiresInMinutes: number };

/** Sent to an account's address; `shopName` is the account's personal or first shop. */
export function passwordResetEmail(props: PasswordResetProps): EmailContent & { subject: string } {
  return {
    subject: "Choose a new Presswright password",
    ...composeEmail({
      shopName: props.shopName,
      title: "Choose a new password",
      paragraphs: [
        "Someone asked to reset the password of the Presswright account for this address. If it was you, choose a new password with the link below.",
        `The link works once and for ${props.expiresInMinutes} minutes. Using it signs the account out everywhere.`,
      ],
      link: { href: props.link, label: "Choose a new password" },
      footer: "Did not ask for this? Ignore it: your password stays as it is.",
    }),
  };
}
