import type { ProjectReviewStatus, RecordStatus } from "../../../entities/record/api-types";
import { STATUS_MARK, projectStatusWords, recordStatusWords } from "../model/status";

const LOOK: Readonly<Record<ProjectReviewStatus | RecordStatus, string>> = {
  "in-work": "border-rule-strong bg-panel text-graphite",
  submitted: "border-ink/40 bg-ink-wash text-ink",
  returned: "border-close/40 bg-close-wash text-close",
  approved: "border-pass/40 bg-pass-wash text-pass",
  superseded: "border-rule bg-paper text-graphite-soft",
};

/** A review status as a word and a mark (never colour alone). */
export function StatusBadge({
  status,
  of,
}: {
  status: ProjectReviewStatus | RecordStatus;
  /** Whether the status is the project's or one record's (the words differ a little). */
  of: "project" | "record";
}) {
  const words =
    of === "project"
      ? projectStatusWords(status as ProjectReviewStatus)
      : recordStatusWords(status as RecordStatus);
  return (
    <span
      data-testid={`${of}-status`}
      className={`inline-flex items-center gap-1 rounded-sm border px-1.5 py-px text-[13px] font-semibold leading-5 ${LOOK[status]}`}
    >
      <span aria-hidden="true">{STATUS_MARK[status]}</span>
      <span>{words.name}</span>
    </span>
  );
}
