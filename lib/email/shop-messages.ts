/**
 * Messages of the shared shop: booking confirmation (with a calendar file), booking cancelled,
 * tag-out notice to holders of future bookings, and a stop-use report to the managers. Pure: they
 * return what `enqueueEmail` stores; every message names the shop.
 */
import { createEvent } from "ics";
import type { StoredAttachment } from "@/db/schema/outbox";
import { slotText } from "@/lib/time-zone";

export type Message = { subject: string; text: string; html: string; attachments?: StoredAttachment[] };
type Slot = { startsAt: Date; endsAt: Date };

const escapeHtml = (s: string): string =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

function page(paragraphs: string[], list: string[] = []): string {
  const items = list.length ? `<ul>${list.map((l) => `<li>${escapeHtml(l)}</li>`).join("")}</ul>` : "";
  return `<div style="font-family:sans-serif;line-height:1.5">${paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("")}${items}</div>`;
}

/** The booking as an iCalendar event (RFC 5545), times in UTC so every calendar places it right. */
export function bookingIcs(booking: Slot & { id: string; pressName: string; shopName: string; appUrl: string }): string {
  const { error, value } = createEvent({
    uid: `${booking.id}@presswright`,
    productId: "presswright/bookings",
    start: booking.startsAt.getTime(),
    startInputType: "utc",
    startOutputType: "utc",
    end: booking.endsAt.getTime(),
    endInputType: "utc",
    endOutputType: "utc",
    title: `${booking.pressName} — ${booking.shopName}`,
    description: `Press time booked in Presswright. Check the press's status before you start.`,
    url: booking.appUrl,
    busyStatus: "BUSY",
  });
  if (error || !value) throw error ?? new Error("calendar file could not be made");
  return value;
}

export function icsAttachment(ics: string): StoredAttachment {
  return { filename: "booking.ics", contentType: "text/calendar; charset=utf-8; method=PUBLISH", content: Buffer.from(ics, "utf8").toString("base64") };
}

export function bookingConfirmation(input: {
  shopName: string;
  pressName: string;
  holderName: string;
  slot: Slot;
  timeZone: string;
  warnings: string[];
  ics: string;
}): Message {
  const when = slotText(input.slot, input.timeZone);
  const lines = [
    `Hello ${input.holderName},`,
    `you have the ${input.pressName} at ${input.shopName} on ${when}.`,
    "The calendar file attached puts it in your calendar. Look at the press's status before you start: a press can be tagged out after you booked.",
  ];
  const warn = input.warnings.length ? ["Before your slot:", ...input.warnings.map((w) => `- ${w}`)] : [];
  return {
    subject: `Booked: ${input.pressName}, ${when} — ${input.shopName}`,
    text: [...lines, ...warn].join("\n\n"),
    html: page(input.warnings.length ? [...lines, "Before your slot:"] : lines, input.warnings),
    attachments: [icsAttachment(input.ics)],
  };
}

export function bookingCancelled(input: { shopName: string; pressName: string; holderName: string; slot: Slot; timeZone: string; byName: string }): Message {
  const when = slotText(input.slot, input.timeZone);
  const lines = [`Hello ${input.holderName},`, `${input.byName} cancelled your booking of the ${input.pressName} at ${input.shopName} on ${when}. The slot is free again.`];
  return { subject: `Booking cancelled: ${input.pressName}, ${when} — ${input.shopName}`, text: lines.join("\n\n"), html: page(lines) };
}

export function tagOutNotice(input: { shopName: string; pressName: string; holderName: string; reason: string; slots: Slot[]; timeZone: string }): Message {
  const lines = [
    `Hello ${input.holderName},`,
    `the ${input.pressName} at ${input.shopName} has been tagged out and must not be used until it is cleared.`,
    `Reason: ${input.reason}`,
    "Your bookings of it are listed below. They stay in place; check the press's status before you come in.",
  ];
  const slots = input.slots.map((s) => slotText(s, input.timeZone));
  return {
    subject: `Tagged out: ${input.pressName} — ${input.shopName}`,
    text: [...lines, ...slots.map((s) => `- ${s}`)].join("\n\n"),
    html: page(lines, slots),
  };
}

export function stopUseReport(input: { shopName: string; pressName: string; reporterName: string; description: string; severity: string; pressUrl: string }): Message {
  const lines = [
    `${input.reporterName} reported a problem on the ${input.pressName} at ${input.shopName} and asked for it to stop being used (severity: ${input.severity}).`,
    `What they found: ${input.description}`,
    "The press is tagged out now. A manager or inspector closes the report once it is dealt with, which clears the tag-out.",
    `Open the press: ${input.pressUrl}`,
  ];
  return { subject: `Stop use: ${input.pressName} — ${input.shopName}`, text: lines.join("\n\n"), html: page(lines) };
}
