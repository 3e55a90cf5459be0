import { describe, expect, it } from "vitest";
import type { RecordContent } from "../../../core/contract/records";
import { comparableContents } from "./comparable-content";
import { sameCalculation } from "./same-calculation";

const TABLE = "00000000-0000-4000-8000-0000000000c1";

/** The fields comparableContents touches, on a content otherwise empty (sameCalculation hashes what is there). */
function content(extra: Partial<RecordContent>, caseVersion = 1): RecordContent {
  return {
    takenAt: "2026-12-01T09:30:00.000Z",
    project: { id: "p", workspaceId: "w", version: 1 },
    inputs: { exportedAt: "2026-12-01T09:30:00.000Z" },
    results: { rows: [{ rowId: "case:a:b", caseVersion, checks: [] }] },
    ...extra,
  } as unknown as RecordContent;
}

describe("comparableContents", () => {
  it("when the approved record predates pointTableFiles, then the current content's files are left out of the comparison", () => {
    const approved = content({});
    const now = content({ pointTableFiles: [{ tableId: TABLE, sha256: "ab".repeat(32) }] });
    expect(sameCalculation(approved, now)).toBe(false);
    expect(sameCalculation(...comparableContents(approved, now))).toBe(true);
  });

  it("when the approved record holds pointTableFiles, then a different file still makes the contents differ", () => {
    const approved = content({ pointTableFiles: [{ tableId: TABLE, sha256: "ab".repeat(32) }] });
    const now = content({ pointTableFiles: [{ tableId: TABLE, sha256: "cd".repeat(32) }] });
    expect(sameCalculation(...comparableContents(approved, now))).toBe(false);
  });

  it("when only a load case's version counter moved, then the contents compare equal", () => {
    expect(sameCalculation(...comparableContents(content({}, 1), content({}, 2)))).toBe(true);
  });
});
