import { useState } from "react";
import { Panel } from "../../../components/Panel";
import type { AuditEventView } from "../../../../../core/contract/projects";
import { useAudit } from "../../../entities/audit/queries";

/** How many changes show before "Show all": a screenful, so the list never scrolls inside the page. */
const FIRST_CHANGES = 8;

/**
 * The most recent changes (the audit trail), readable by every member. The list grows with the
 * page instead of scrolling in a box of its own (which the keyboard could not reach and which cut
 * a row in half); the rest opens with a button.
 */
export function ActivityPanel({
  workspaceId,
  projectId,
  index,
}: {
  workspaceId: string;
  projectId?: string;
  index: string;
}) {
  const audit = useAudit(workspaceId, projectId);
  const [showAll, setShowAll] = useState(false);
  const events = audit.data?.events ?? [];
  const shown = showAll ? events : events.slice(0, FIRST_CHANGES);
  return (
    <Panel id="activity" index={index} title="Activity" subtitle="who changed what, newest first">
      <ol id="activity-list" className="divide-y divide-rule text-[14px]">
        {audit.data?.events.length === 0 && <li className="p-3 text-graphite-soft">Nothing yet.</li>}
        {shown.map((e) => (
          <li key={e.id} className="px-3 py-1.5">
            <time dateTime={e.at} className="num mr-2 text-[12px] text-graphite-faint">
              {new Date(e.at).toLocaleString()}
            </time>
            <strong>{e.actor.name}</strong> {e.summary}
            {e.details.length > 0 && <ChangeDetails details={e.details} />}
          </li>
        ))}
      </ol>
      {events.length > FIRST_CHANGES && (
        <div className="border-t border-rule px-3 py-2">
          <button
            type="button"
            className="text-[14px] text-ink underline-offset-2 hover:underline"
            aria-expanded={showAll}
            aria-controls="activity-list"
            onClick={() => setShowAll((all) => !all)}
          >
            {showAll ? `Show the newest ${FIRST_CHANGES} only` : `Show all ${events.length} changes`}
          </button>
        </div>
      )}
    </Panel>
  );
}

/** What changed, field by field: the value before → after (a new record shows only its values). */
function ChangeDetails({ details }: { details: AuditEventView["details"] }) {
  return (
    <ul className="mt-0.5 ml-4 text-[13px] text-graphite-soft">
      {details.map((d) => (
        <li key={d.field}>
          {d.field}:{" "}
          {d.from !== null && (
            <>
              <span className="num">{d.from}</span> <span aria-label="changed to">→</span>{" "}
            </>
          )}
          {d.to === null ? <em>removed</em> : <span className="num text-graphite">{d.to}</span>}
        </li>
      ))}
    </ul>
  );
}
