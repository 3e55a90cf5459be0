import { useRecordDiff } from "../../../entities/record/queries";
import { FormMessage } from "../../../lib/forms";
import { diffHeading, diffSections } from "../model/diff";

/** What changed since the record before this one: verdicts first, then the inputs. */
export function RecordDiffPanel({
  ids,
}: {
  ids: { workspaceId: string; projectId: string; recordId: string };
}) {
  const diff = useRecordDiff(ids.workspaceId, ids.projectId, ids.recordId);
  if (diff.isPending)
    return <p className="px-3 py-2 text-[14px] text-graphite-soft">Comparing with the record before…</p>;
  if (diff.error)
    return (
      <div className="px-3 py-2">
        <FormMessage error={diff.error} />
      </div>
    );
  if (diff.data === null)
    return (
      <p className="px-3 py-2 text-[14px] text-graphite-soft">
        This is the project&apos;s first record: there is no earlier record to compare it with.
      </p>
    );
  const sections = diffSections(diff.data);
  return (
    <div className="space-y-2 px-3 py-2" data-testid="record-diff">
      <p className="text-[14px] font-semibold">{diffHeading(diff.data)}</p>
      {sections.length === 0 ? (
        <p className="text-[14px] text-graphite-soft">
          The inputs and every verdict are the same as in the record before.
        </p>
      ) : (
        sections.map((s) => (
          <section key={s.id} aria-label={s.title}>
            <h3 className="text-[14px] font-semibold text-graphite">{s.title}</h3>
            <ul className="list-disc space-y-0.5 pl-5 text-[14px]">
              {s.lines.map((line, i) => (
                <li key={i}>{line}</li>
              ))}
            </ul>
          </section>
        ))
      )}
    </div>
  );
}
