import type { RecordEvent } from "../../../entities/record/api-types";
import { formatDateTime } from "./dates";
import { recordStatusWords } from "./status";

/** One status change as the record page lists it: what, who, when, and the note if any. */
export type EventLine = { at: string; when: string; text: string; note: string | null };

/** The record's status changes, oldest first (the order a sign-off block reads). */
export function eventLines(events: readonly RecordEvent[]): EventLine[] {
  return [...events]
    .sort((a, b) => a.at.localeCompare(b.at))
    .map((e) => ({
      at: e.at,
      when: formatDateTime(e.at),
      text: `${recordStatusWords(e.status).name} — ${e.by.name}`,
      note: e.note ? e.note : null,
    }));
}
