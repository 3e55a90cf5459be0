import { describe, expect, it } from "vitest";
import { formatDateTime } from "./dates";

describe("sign-off dates", () => {
  it("when a moment is written, then it reads year-month-day hour:minute in the browser's zone", () => {
    const iso = "2026-12-01T09:05:00.000Z";
    const d = new Date(iso);
    const pad = (n: number) => String(n).padStart(2, "0");
    expect(formatDateTime(iso)).toBe(
      `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())} ${pad(d.getHours())}:${pad(d.getMinutes())}`,
    );
    expect(formatDateTime(iso)).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}$/);
  });

  it("when there is no date or it is not one, then a dash stands in", () => {
    expect(formatDateTime(null)).toBe("—");
    expect(formatDateTime("yesterday")).toBe("—");
  });
});
