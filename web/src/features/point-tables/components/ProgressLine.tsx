import { quietButton } from "../../../lib/forms";

/** A labelled progress bar with its Cancel button (reading in workers, or sending to the server). */
export function ProgressLine({
  label,
  fraction,
  onCancel,
  testId,
}: {
  label: string;
  fraction: number;
  onCancel: () => void;
  testId: string;
}) {
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <div className="flex flex-wrap items-center gap-3" data-testid={testId}>
      <span className="text-sm">{label}</span>
      <progress className="h-2 min-w-40 flex-1 accent-ink" max={100} value={percent} aria-label={label} />
      <span className="num w-12 text-right text-sm">{percent} %</span>
      <button type="button" className={quietButton} onClick={onCancel}>
        Cancel
      </button>
    </div>
  );
}
