import { describe, expect, it } from "vitest";
import type { RecordComment } from "../../../entities/record/api-types";
import { commentCount, commentThreads, rowCommentLabel } from "./comments";
import { HYDRO_ROW, IDS, person } from "./record-fixture";

const comment = (id: string, at: string, over: Partial<RecordComment> = {}): RecordComment => ({
  id,
  recordId: "r1",
  rowId: null,
  replyTo: null,
  text: id,
  by: person(IDS.checker, "Rui Tanager"),
  at: `2026-12-01T10:${at}:00.000Z`,
  ...over,
});

describe("comment threads", () => {
  it("when comments are on the record and on a row with answers, then each answer joins its thread in time order", () => {
    const comments = [
      comment("answer-2", "09", { replyTo: "answer-1", rowId: HYDRO_ROW }),
      comment("row", "01", { rowId: HYDRO_ROW }),
      comment("whole", "02"),
      comment("answer-1", "05", {
        replyTo: "row",
        rowId: HYDRO_ROW,
        by: person(IDS.originator, "Ona Ferreby"),
      }),
    ];
    const threads = commentThreads(comments);
    expect(threads.onRecord.map((t) => t.comment.id)).toEqual(["whole"]);
    const row = threads.byRow.get(HYDRO_ROW)!;
    expect(row.map((t) => t.comment.id)).toEqual(["row"]);
    expect(row[0].replies.map((c) => c.id)).toEqual(["answer-1", "answer-2"]);
    expect(commentCount(row)).toBe(3);
    expect(commentCount(undefined)).toBe(0);
  });

  it("when an answer's comment is missing from the list, then the answer still shows as its own thread", () => {
    const threads = commentThreads([comment("orphan", "03", { replyTo: "gone" })]);
    expect(threads.onRecord.map((t) => t.comment.id)).toEqual(["orphan"]);
  });

  it("when a row's button is labelled, then it names the row and how many comments it holds", () => {
    expect(rowCommentLabel("Hydrostatic test at mid-shell", 0)).toBe(
      "Comment on Hydrostatic test at mid-shell",
    );
    expect(rowCommentLabel("Hydrostatic test at mid-shell", 1)).toBe(
      "1 comment on Hydrostatic test at mid-shell",
    );
    expect(rowCommentLabel("Hydrostatic test at mid-shell", 3)).toBe(
      "3 comments on Hydrostatic test at mid-shell",
    );
  });
});
