import type { RecordEvent } from "../../../entities/record/api-types";
import { formatDateTime } from "./dates";
import { recordStatusWords } from "./status";

/** What an event did, in words: one approval of two is an approval, though the record still waits. */
function eventWords(e: RecordEvent): string {
  switch (e.action) {
    case "submit":
      return "Submitted for check";
    case "approve":
      return e.status === "approved" ? "Approved (record approved)" : "Approved (more approvals needed)";
    case "return":
      return "Returned with comments";
    case "supersede":
      return "Superseded by a later record";
    default:
      return recordStatusWords(e.status).name;
  }
}

/** One status change as the record page lists it: what, who, when, and the note if any. */
export type EventLine = { at: string; when: string; text: string; note: string | null };

/** The record's status changes, oldest first (the order a sign-off block reads). */
export function eventLines(events: readonly RecordEvent[]): EventLine[] {
  return [...events]
    .sort((a, b) => a.at.localeCompare(b.at))
    .map((e) => ({
      at: e.at,
      when: formatDateTime(e.at),
      text: `${eventWords(e)} — ${e.by.name}`,
      note: e.note ? e.note : null,
    }));
}
