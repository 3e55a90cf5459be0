import { describe, expect, it } from "vitest";
import { formatActivity, formatDate } from "./dates";

// Dates as a calculation sheet writes them (ISO 8601 calendar date, YYYY-MM-DD, recalled from memory).

/** An ISO timestamp for a wall-clock time in the browser's zone. */
const local = (y: number, month: number, d: number, h = 12, min = 0) =>
  new Date(y, month - 1, d, h, min).toISOString();

describe("sheet dates", () => {
  it("when a date is written, then it reads year-month-day with two-digit month and day", () => {
    expect(formatDate(local(2026, 3, 7))).toBe("2026-03-07");
    expect(formatDate(local(2026, 12, 31))).toBe("2026-12-31");
  });

  it("when the time is just before local midnight, then the local day is written, not the UTC one", () => {
    expect(formatDate(local(2026, 12, 1, 23, 59))).toBe("2026-12-01");
    expect(formatDate(local(2026, 12, 2, 0, 1))).toBe("2026-12-02");
  });

  it("when there is no date, then a dash is written", () => {
    expect(formatDate(null)).toBe("—");
    expect(formatDate("")).toBe("—");
  });
});

describe("last activity", () => {
  const now = new Date(2026, 11, 3, 12, 0).getTime();
  const ago = (ms: number) => new Date(now - ms).toISOString();
  const MIN = 60_000;

  it("when a member was never active, then it says not yet", () => {
    expect(formatActivity(null, now)).toBe("not yet");
  });

  it("when less than half a minute has passed, then it says just now", () => {
    expect(formatActivity(ago(29_000), now)).toBe("just now");
  });

  it("when minutes have passed, then they are counted, rounded to the nearest", () => {
    expect(formatActivity(ago(31_000), now)).toBe("1 min ago");
    expect(formatActivity(ago(59 * MIN), now)).toBe("59 min ago");
  });

  it("when an hour or more has passed within a day, then hours are counted, rounded to the nearest", () => {
    expect(formatActivity(ago(60 * MIN), now)).toBe("1 h ago");
    expect(formatActivity(ago(89 * MIN), now)).toBe("1 h ago");
    expect(formatActivity(ago(91 * MIN), now)).toBe("2 h ago");
    expect(formatActivity(ago(24 * 60 * MIN - MIN), now)).toBe("24 h ago");
  });

  it("when a day or more has passed, then the date is written", () => {
    expect(formatActivity(ago(24 * 60 * MIN), now)).toBe("2026-12-02");
    expect(formatActivity(local(2026, 11, 20), now)).toBe("2026-11-20");
  });

  it("when no time is given, then the clock's is used", () => {
    expect(formatActivity(new Date(Date.now() - 5 * MIN).toISOString())).toBe("5 min ago");
  });
});
