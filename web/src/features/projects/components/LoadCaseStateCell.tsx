import { Link } from "react-router-dom";
import type { LoadCase } from "../../../../../core/contract/load-cases";
import type { Location } from "../../../../../core/contract/projects";
import { Quantity, stressTone } from "../../../components/Quantity";
import { ToolButton } from "../../../components/ToolButton";
import { benchLinkForState } from "../../../lib/bench-link";
import { calculatorLinkFor } from "../../../lib/calculator-link";
import { formatStress } from "../../../lib/stress";
import { nonZeroComponents, stateRevisionWords } from "../model/stress-components";

/**
 * One cell of the load-case table: the saved state of `loadCase` at `location` (its non-zero
 * components, source and revision, with links to the bench, its history and, for a state from a
 * calculator, the calculator with the inputs it was given), or for editors a
 * button to enter one.
 */
export function LoadCaseStateCell({
  workspaceId,
  projectId,
  loadCase: c,
  location: l,
  canEdit,
  historyOpen,
  onToggleHistory,
  onEdit,
}: {
  workspaceId: string;
  projectId: string;
  loadCase: LoadCase;
  location: Location;
  canEdit: boolean;
  historyOpen: boolean;
  onToggleHistory: () => void;
  onEdit: () => void;
}) {
  const s = c.states.find((x) => x.locationId === l.id);
  if (!s) {
    return canEdit ? (
      <ToolButton aria-label={`Enter ${c.name} at ${l.name}`} onClick={onEdit}>
        Enter state
      </ToolButton>
    ) : (
      <span className="text-graphite-faint">—</span>
    );
  }
  const shown = nonZeroComponents(s.componentsPa);
  return (
    <div className="space-y-0.5">
      <div className="flex flex-wrap gap-x-3">
        {shown.map(({ key, label, pa }) => (
          <span key={key}>
            <span className="text-[12px] text-graphite-soft">{label} </span>
            <Quantity value={formatStress(pa, s.unit)} unit={s.unit} tone={stressTone(pa)} />
          </span>
        ))}
        {shown.length === 0 && <span className="text-graphite-soft">zero state</span>}
      </div>
      <div className="flex flex-wrap items-center gap-2 text-[12px] text-graphite-faint">
        <span>
          {s.source} in {s.unit} · {stateRevisionWords(s.revision)}
        </span>
        <Link
          className="text-ink underline-offset-2 hover:underline"
          to={benchLinkForState(
            { workspaceId, projectId, loadCaseId: c.id, locationId: l.id },
            s.components,
            s.unit,
          )}
        >
          Open in bench
          {/* The name starts with the visible words (WCAG 2.5.3) and says which cell it opens. */}
          <span className="sr-only">
            : {c.name} at {l.name}
          </span>
        </Link>
        {s.calculator && (
          <Link className="text-ink underline-offset-2 hover:underline" to={calculatorLinkFor(s.calculator)}>
            Reopen in calculator
            <span className="sr-only">
              : {c.name} at {l.name}
            </span>
          </Link>
        )}
        {(s.revision > 1 || s.calculator) && (
          <ToolButton
            aria-label={`Revisions of ${c.name} at ${l.name}`}
            pressed={historyOpen}
            onClick={onToggleHistory}
          >
            History
          </ToolButton>
        )}
        {canEdit && (
          <ToolButton aria-label={`Edit ${c.name} at ${l.name}`} onClick={onEdit}>
            Edit
          </ToolButton>
        )}
      </div>
    </div>
  );
}
