import { Link } from "react-router-dom";
import type { StressState } from "../../../../../core/contract/load-cases";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { Quantity, stressTone } from "../../../components/Quantity";
import { ToolButton } from "../../../components/ToolButton";
import { nonZeroComponents } from "../model/stress-components";
import { formatStress } from "../model/units";

/**
 * One saved state in the load-case table: its non-zero components in the project's unit, where the
 * numbers came from and the revision, a link that opens it in the bench, and the buttons for its
 * revisions and (editors) for changing it.
 */
export function SavedStateCell({
  state,
  unit,
  benchLink,
  caseName,
  locationName,
  historyOpen,
  onHistory,
  onEdit,
}: {
  state: StressState;
  unit: StressUnitName;
  benchLink: string;
  caseName: string;
  locationName: string;
  historyOpen: boolean;
  onHistory: () => void;
  /** Absent for members who may not change inputs. */
  onEdit?: () => void;
}) {
  const shown = nonZeroComponents(state.componentsPa);
  return (
    <div className="space-y-0.5">
      <div className="flex flex-wrap gap-x-3">
        {shown.map(({ key, label, pa }) => (
          <span key={key}>
            <span className="text-[12px] text-graphite-soft">{label} </span>
            <Quantity value={formatStress(pa, unit)} tone={stressTone(pa)} />
          </span>
        ))}
        {shown.length === 0 && <span className="text-graphite-soft">zero state</span>}
      </div>
      <div className="flex flex-wrap items-center gap-2 text-[12px] text-graphite-faint">
        <span>
          {state.source} · rev. {state.revision}
        </span>
        <Link className="text-ink underline-offset-2 hover:underline" to={benchLink}>
          Open in bench
        </Link>
        {state.revision > 1 && (
          <ToolButton
            aria-label={`Revisions of ${caseName} at ${locationName}`}
            pressed={historyOpen}
            onClick={onHistory}
          >
            History
          </ToolButton>
        )}
        {onEdit && (
          <ToolButton aria-label={`Edit ${caseName} at ${locationName}`} onClick={onEdit}>
            Edit
          </ToolButton>
        )}
      </div>
    </div>
  );
}
