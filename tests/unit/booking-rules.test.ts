import { describe, expect, it } from "vitest";
import { checkSlot, freeStretches, outsideOpeningHours, SlotError, slotWarnings } from "@/lib/booking-rules";
import type { OpeningHours } from "@/db/schema/shops";
import { fromWallTime, localDate, localTime, parseLocal, startOfLocalDay, toWallTime, zoneOffsetMinutes } from "@/lib/time-zone";

const TZ = "Europe/London";
const at = (iso: string): Date => new Date(iso);
const weekday = { opens: 9 * 60, closes: 18 * 60 };
const weekdays: OpeningHours = [weekday, weekday, weekday, weekday, weekday, { opens: 10 * 60, closes: 14 * 60 }, null];

describe("time zones", () => {
  // Offsets from the IANA tz database (Europe/London: GMT in winter, BST = UTC+1 from the last Sunday of March).
  it("knows the offset on both sides of a clock change", () => {
    expect(zoneOffsetMinutes(at("2026-01-15T12:00:00Z"), TZ)).toBe(0);
    expect(zoneOffsetMinutes(at("2026-07-15T12:00:00Z"), TZ)).toBe(60);
    expect(zoneOffsetMinutes(at("2026-07-15T12:00:00Z"), "America/Chicago")).toBe(-300);
  });

  it("turns wall time into the right instant and back", () => {
    expect(fromWallTime({ year: 2026, month: 7, day: 15, hour: 9, minute: 30 }, TZ).toISOString()).toBe("2026-07-15T08:30:00.000Z");
    expect(fromWallTime({ year: 2026, month: 1, day: 15, hour: 9, minute: 30 }, "America/Chicago").toISOString()).toBe("2026-01-15T15:30:00.000Z");
    // 2026-03-29 01:30 does not exist in London (clocks go 01:00 → 02:00): moved forward by the gap.
    expect(fromWallTime({ year: 2026, month: 3, day: 29, hour: 1, minute: 30 }, TZ).toISOString()).toBe("2026-03-29T01:30:00.000Z"); // = 02:30 BST
    const w = toWallTime(at("2026-07-15T08:30:00Z"), TZ);
    expect([w.hour, w.minute, w.weekday]).toEqual([9, 30, 2]); // a Wednesday
    expect(localDate(at("2026-07-15T23:30:00Z"), TZ)).toBe("2026-07-16");
    expect(localTime(at("2026-07-15T23:30:00Z"), TZ)).toBe("00:30");
  });

  it("finds local midnight, also on a 23-hour day", () => {
    expect(startOfLocalDay(at("2026-07-15T12:00:00Z"), TZ).toISOString()).toBe("2026-07-14T23:00:00.000Z");
    const d = startOfLocalDay(at("2026-03-29T12:00:00Z"), TZ);
    expect(startOfLocalDay(d, TZ, 1).getTime() - d.getTime()).toBe(23 * 3_600_000);
  });

  it("parses form input and refuses malformed values", () => {
    expect(parseLocal("2026-07-15", "09:30", TZ)?.toISOString()).toBe("2026-07-15T08:30:00.000Z");
    expect(parseLocal("2026-7-15", "09:30", TZ)).toBeNull();
    expect(parseLocal("2026-07-15", "25:00", TZ)).toBeNull();
  });
});

describe("booking rules", () => {
  const now = at("2026-07-15T07:00:00Z"); // Wednesday 08:00 in London
  const slot = (from: string, to: string) => ({ startsAt: at(from), endsAt: at(to) });
  const refusal = (s: ReturnType<typeof slot>, hours: OpeningHours | null = null): string | null => {
    try {
      checkSlot(s, now, TZ, hours);
      return null;
    } catch (e) {
      if (e instanceof SlotError) return `${e.field}: ${e.message}`;
      throw e;
    }
  };

  it("accepts an ordinary slot", () => expect(refusal(slot("2026-07-15T09:00:00Z", "2026-07-15T11:00:00Z"))).toBeNull());
  it("refuses end before start, zero, short and over-long slots", () => {
    expect(refusal(slot("2026-07-15T11:00:00Z", "2026-07-15T09:00:00Z"))).toBe("endsAt: The end must be after the start.");
    expect(refusal(slot("2026-07-15T11:00:00Z", "2026-07-15T11:00:00Z"))).toBe("endsAt: The end must be after the start.");
    expect(refusal(slot("2026-07-15T11:00:00Z", "2026-07-15T11:10:00Z"))).toBe("endsAt: Book at least 15 minutes.");
    expect(refusal(slot("2026-07-15T08:00:00Z", "2026-07-15T16:01:00Z"))).toBe("endsAt: Book at most 8 hours at a time.");
  });
  it("refuses the past and the far future", () => {
    expect(refusal(slot("2026-07-15T06:00:00Z", "2026-07-15T08:00:00Z"))).toBe("startsAt: That time has already passed.");
    expect(refusal(slot("2026-11-15T06:00:00Z", "2026-11-15T08:00:00Z"))).toBe("startsAt: Book at most 90 days ahead.");
  });
  it("keeps slots inside the opening hours when the shop sets them", () => {
    expect(outsideOpeningHours(slot("2026-07-15T08:00:00Z", "2026-07-15T10:00:00Z"), TZ, weekdays)).toBeNull(); // 09:00–11:00 local
    expect(refusal(slot("2026-07-15T07:30:00Z", "2026-07-15T09:00:00Z"), weekdays)).toBe("startsAt: The shop is open 09:00–18:00 that day.");
    expect(refusal(slot("2026-07-19T09:00:00Z", "2026-07-19T10:00:00Z"), weekdays)).toBe("startsAt: The shop is closed that day."); // Sunday
    expect(refusal(slot("2026-07-18T12:00:00Z", "2026-07-18T13:30:00Z"), weekdays)).toBe("startsAt: The shop is open 10:00–14:00 that day.");
  });

  it("lists the free stretches of a day between bookings, from now on", () => {
    const day = startOfLocalDay(now, TZ);
    const booked = [slot("2026-07-15T09:00:00Z", "2026-07-15T10:00:00Z"), slot("2026-07-15T10:00:00Z", "2026-07-15T10:10:00Z"), slot("2026-07-15T12:00:00Z", "2026-07-15T13:00:00Z")];
    const free = freeStretches(day, 86_400_000, booked, now, TZ, weekdays).map((s) => `${localTime(s.startsAt, TZ)}–${localTime(s.endsAt, TZ)}`);
    expect(free).toEqual(["09:00–10:00", "11:10–13:00", "14:00–18:00"]);
    expect(freeStretches(day, 86_400_000, [], now, TZ, null).map((s) => localTime(s.startsAt, TZ))).toEqual(["08:00"]);
    const sunday = startOfLocalDay(at("2026-07-19T12:00:00Z"), TZ);
    expect(freeStretches(sunday, 86_400_000, [], now, TZ, weekdays)).toEqual([]);
  });
});

describe("clock going back", () => {
  it("takes the earlier of two instants for a repeated wall time", () => {
    // 2026-10-25 01:30 happens twice in London (BST then GMT): the earlier is 00:30Z.
    expect(fromWallTime({ year: 2026, month: 10, day: 25, hour: 1, minute: 30 }, TZ).toISOString()).toBe("2026-10-25T00:30:00.000Z");
  });
});

describe("slot warnings", () => {
  const slot = { startsAt: at("2026-07-20T09:00:00Z"), endsAt: at("2026-07-20T11:00:00Z") };
  it("warns of anything overdue and of what falls due before the slot ends, not after", () => {
    expect(
      slotWarnings(
        [
          { name: "Monthly frame check", state: "overdue", dueAt: at("2026-07-01T00:00:00Z") },
          { name: "Hose walk-round", state: "due-soon", dueAt: at("2026-07-20T10:00:00Z") },
          { name: "Quarterly relief test", state: "due-soon", dueAt: at("2026-07-25T00:00:00Z") },
        ],
        [
          { title: "Oil sample", state: "overdue", dueDate: null, dueHours: 400 },
          { title: "Filter element", state: "due-soon", dueDate: at("2026-07-19T00:00:00Z"), dueHours: null },
          { title: "Oil change", state: "due-soon", dueDate: at("2026-08-19T00:00:00Z"), dueHours: null },
          { title: "Pump coupling check", state: "due-soon", dueDate: null, dueHours: 520 },
        ],
        slot,
      ),
    ).toEqual([
      "Inspection overdue: Monthly frame check.",
      "Inspection falls due before your slot ends: Hose walk-round.",
      "Service overdue: Oil sample.",
      "Service falls due before your slot ends: Filter element.",
      "Service due soon, at 520 h on the meter: Pump coupling check.",
    ]);
    expect(slotWarnings([], [], slot)).toEqual([]);
  });
});
