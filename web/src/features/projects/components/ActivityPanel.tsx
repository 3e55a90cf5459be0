import { Panel } from "../../../components/Panel";
import { useAudit } from "../../../entities/audit/queries";

/** The most recent changes (the audit trail), readable by every member. */
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
  return (
    <Panel id="activity" index={index} title="Activity" subtitle="who changed what, newest first">
      <ol className="max-h-80 divide-y divide-rule overflow-y-auto text-[14px]">
        {audit.data?.events.length === 0 && <li className="p-3 text-graphite-soft">Nothing yet.</li>}
        {audit.data?.events.map((e) => (
          <li key={e.id} className="px-3 py-1.5">
            <time dateTime={e.at} className="num mr-2 text-[12px] text-graphite-faint">
              {new Date(e.at).toLocaleString()}
            </time>
            <strong>{e.actor.name}</strong> {e.summary}
          </li>
        ))}
      </ol>
    </Panel>
  );
}
