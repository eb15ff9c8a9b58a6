import { describe, expect, it } from "vitest";
import { addLocalDays, compareDue, completeTask, localDate, startOfLocalDay, taskDue, type IntervalTask } from "@/lib/schedule";

const base = { lastDoneOn: "2026-01-10", lastDoneHours: 100 };
const at = (iso: string, hours: number, timeZone = "UTC") => ({ now: new Date(iso), hours, timeZone });

describe("taskDue: days only", () => {
  const task: IntervalTask = { ...base, intervalDays: 30, intervalHours: null };
  it("is ok well before the date, due soon inside the window, due on the day, overdue the day after", () => {
    expect(taskDue(task, at("2026-01-20T12:00:00Z", 500)).state).toBe("ok");
    // Window: a tenth of 30 days = 3 days.
    expect(taskDue(task, at("2026-02-06T12:00:00Z", 500))).toMatchObject({ state: "due-soon", dueOn: "2026-02-09", daysLeft: 3 });
    expect(taskDue(task, at("2026-02-09T23:59:00Z", 500))).toMatchObject({ state: "due-soon", daysLeft: 0 });
    expect(taskDue(task, at("2026-02-10T00:00:00Z", 500))).toMatchObject({ state: "overdue", daysLeft: -1, dueHours: null });
  });
});

describe("taskDue: hours only", () => {
  const task: IntervalTask = { ...base, intervalDays: null, intervalHours: 250 };
  it("counts operating hours from the last completion, whatever the date", () => {
    expect(taskDue(task, at("2030-01-01T00:00:00Z", 300))).toMatchObject({ state: "ok", dueHours: 350, hoursLeft: 50, dueOn: null, dueDate: null });
    // Window: a tenth of 250 h = 25 h.
    expect(taskDue(task, at("2026-01-11T00:00:00Z", 325)).state).toBe("due-soon");
    expect(taskDue(task, at("2026-01-11T00:00:00Z", 350)).state).toBe("due-soon");
    expect(taskDue(task, at("2026-01-11T00:00:00Z", 350.1))).toMatchObject({ state: "overdue", hoursLeft: -0.1 });
  });
});

describe("taskDue: whichever comes first", () => {
  const task: IntervalTask = { ...base, intervalDays: 180, intervalHours: 250 };
  it("is overdue by hours while the date is far off", () => {
    expect(taskDue(task, at("2026-02-01T00:00:00Z", 400)).state).toBe("overdue");
  });
  it("is overdue by date while few hours were run", () => {
    expect(taskDue(task, at("2026-07-10T00:00:00Z", 120))).toMatchObject({ state: "overdue", dueOn: "2026-07-09" });
  });
  it("is due soon when either side enters its window", () => {
    expect(taskDue(task, at("2026-02-01T00:00:00Z", 330)).state).toBe("due-soon");
    expect(taskDue(task, at("2026-06-30T00:00:00Z", 120)).state).toBe("due-soon");
    expect(taskDue(task, at("2026-02-01T00:00:00Z", 120)).state).toBe("ok");
  });
});

describe("month ends", () => {
  it("adds calendar days across short months and leap years", () => {
    expect(addLocalDays("2026-01-31", 30)).toBe("2026-03-02");
    expect(addLocalDays("2028-01-31", 30)).toBe("2028-03-01");
    expect(addLocalDays("2026-12-31", 1)).toBe("2027-01-01");
  });
  it("takes today from the shop's zone, not UTC, at a month end", () => {
    // 23:30 UTC on 31 Jan is already 1 Feb in Berlin (UTC+1 in winter).
    expect(localDate(new Date("2026-01-31T23:30:00Z"), "Europe/Berlin")).toBe("2026-02-01");
    const task: IntervalTask = { lastDoneOn: "2026-01-01", lastDoneHours: 0, intervalDays: 30, intervalHours: null };
    expect(taskDue(task, at("2026-01-31T23:30:00Z", 0, "Europe/Berlin")).state).toBe("overdue");
    expect(taskDue(task, at("2026-01-31T23:30:00Z", 0, "UTC")).state).toBe("due-soon");
  });
});

describe("daylight-saving changes in the shop's zone", () => {
  // US clocks went forward on 8 March 2026 (second Sunday of March; IANA tz database).
  const task: IntervalTask = { lastDoneOn: "2026-03-01", lastDoneHours: 0, intervalDays: 14, intervalHours: null };
  it("keeps the due date on the same calendar day and starts it at local midnight", () => {
    const due = taskDue(task, at("2026-03-10T12:00:00Z", 0, "America/New_York"));
    expect(due.dueOn).toBe("2026-03-15");
    // Local midnight is 04:00 UTC after the change (EDT, UTC−4), not 05:00 as before it.
    expect(due.dueDate?.toISOString()).toBe("2026-03-15T04:00:00.000Z");
    expect(startOfLocalDay("2026-03-01", "America/New_York").toISOString()).toBe("2026-03-01T05:00:00.000Z");
    expect(due.daysLeft).toBe(5);
  });
  it("is not overdue an hour early or late around the change", () => {
    // 03:30 UTC on 16 March is still 15 March, 23:30 in New York: due that day, not overdue.
    expect(taskDue(task, at("2026-03-16T03:30:00Z", 0, "America/New_York")).state).toBe("due-soon");
    expect(taskDue(task, at("2026-03-16T04:00:00Z", 0, "America/New_York")).state).toBe("overdue");
  });
  it("handles the autumn change (Europe/London, 25 October 2026)", () => {
    const autumn: IntervalTask = { lastDoneOn: "2026-10-20", lastDoneHours: 0, intervalDays: 7, intervalHours: null };
    const due = taskDue(autumn, at("2026-10-26T12:00:00Z", 0, "Europe/London"));
    expect(due).toMatchObject({ dueOn: "2026-10-27", daysLeft: 1 });
    expect(due.dueDate?.toISOString()).toBe("2026-10-27T00:00:00.000Z");
  });
});

describe("completion restarts the interval", () => {
  const task: IntervalTask = { lastDoneOn: "2026-01-10", lastDoneHours: 100, intervalDays: 90, intervalHours: 250 };
  it("moves an overdue task back to ok from the entry's date and reading", () => {
    const now = at("2026-05-01T12:00:00Z", 380);
    expect(taskDue(task, now).state).toBe("overdue");
    const done = completeTask(task, { performedOn: "2026-05-01", hours: 380 });
    expect(done).toMatchObject({ lastDoneOn: "2026-05-01", lastDoneHours: 380 });
    expect(taskDue(done, now)).toMatchObject({ state: "ok", dueOn: "2026-07-30", dueHours: 630 });
  });
  it("ignores an entry dated before the current start", () => {
    expect(completeTask(task, { performedOn: "2026-01-09", hours: 90 })).toBe(task);
  });
});

describe("compareDue", () => {
  it("puts overdue first, then the smallest share of interval left", () => {
    const now = at("2026-02-01T00:00:00Z", 200);
    const make = (t: IntervalTask) => ({ task: t, due: taskDue(t, now) });
    const a = make({ lastDoneOn: "2026-01-01", lastDoneHours: 0, intervalDays: 365, intervalHours: null });
    const b = make({ lastDoneOn: "2026-01-01", lastDoneHours: 0, intervalDays: 40, intervalHours: null });
    const c = make({ lastDoneOn: "2026-01-01", lastDoneHours: 0, intervalDays: null, intervalHours: 150 });
    expect([a, b, c].sort(compareDue).map((x) => x.task)).toEqual([c.task, b.task, a.task]);
  });
});
