import { composeEmail, type EmailContent } from "../compose";

export type DigestLine = { pressName: string; title: string; state: "due-soon" | "overdue"; due: string };
export type ReminderDigestProps = { shopName: string; lines: readonly DigestLine[]; link: string };

/** One message per manager per shop per day listing what is overdue, then what is due soon. */
export function reminderDigestEmail(props: ReminderDigestProps): EmailContent & { subject: string } {
  const overdue = props.lines.filter((l) => l.state === "overdue").length;
  const soon = props.lines.length - overdue;
  const counts = [overdue ? `${overdue} overdue` : null, soon ? `${soon} due soon` : null].filter(Boolean).join(", ");
  return {
    subject: `${props.shopName}: service ${counts}`,
    ...composeEmail({
      shopName: props.shopName,
      title: `Service ${counts}`,
      paragraphs: ["These service tasks on the shop's presses need attention. Relieve pressure and lock out before any work on the hydraulics."],
      items: props.lines.map((l) => `${l.state === "overdue" ? "OVERDUE" : "Due soon"} · ${l.pressName} · ${l.title}${l.due ? ` (${l.due})` : ""}`),
      link: { href: props.link, label: "Open the dashboard" },
      footer: "You get this as a manager of the shop, at most once a day while something is due.",
    }),
  };
}
