import type { RecordDetail } from "../../../entities/record/api-types";
import { eventLines } from "../model/events";

/** The record's status changes: what, who and when (the sign-off block of the record). */
export function RecordEvents({ record }: { record: RecordDetail }) {
  const lines = eventLines(record.events);
  if (lines.length === 0)
    return <p className="px-3 py-2 text-[14px] text-graphite-soft">No status change yet.</p>;
  return (
    <ol className="divide-y divide-rule text-[14px]" data-testid="record-events">
      {lines.map((l, i) => (
        <li key={`${l.at}-${i}`} className="px-3 py-1.5">
          <time dateTime={l.at} className="num mr-2 text-[13px] text-graphite-soft">
            {l.when}
          </time>
          <strong>{l.text}</strong>
          {l.note && (
            <span className="block whitespace-pre-line text-[13px] text-graphite-soft">{l.note}</span>
          )}
        </li>
      ))}
    </ol>
  );
}
