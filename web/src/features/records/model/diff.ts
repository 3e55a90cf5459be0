import { formatFactor } from "../../../../../core/contract/comparison";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import type { InputChange, RecordDiff, VerdictChange } from "../../../entities/record/api-types";

const VERDICT_WORD: Readonly<Record<string, string>> = { pass: "passes", close: "close", fail: "fails" };
const VERDICT_RANK: Readonly<Record<string, number>> = { pass: 0, close: 1, fail: 2 };

const KIND_WORD: Readonly<Record<InputChange["kind"], string>> = {
  state: "State",
  location: "Location",
  "load-case": "Load case",
  combination: "Combination",
  material: "Material",
  project: "Project",
  scope: "Scope",
};

const criterionLabel = (criterion: string) => CRITERION_LABELS[criterion as CriterionName] ?? criterion;

function verdictAt(v: VerdictChange["from"]): string {
  if (!v) return "not rated";
  return `${VERDICT_WORD[v.verdict] ?? v.verdict} (SF ${formatFactor(v.factor)})`;
}

/** "Hydrostatic test at mid-shell, Tresca: passes (SF 1.58) → fails (SF 1.20)". */
export function verdictChangeSentence(c: VerdictChange): string {
  return `${c.caseName} at ${c.locationName}, ${criterionLabel(c.criterion)}: ${verdictAt(c.from)} → ${verdictAt(c.to)}`;
}

/** How bad the change is for ordering: a new failure first, then anything that got worse, then the rest. */
function severity(c: VerdictChange): number {
  const rank = (v: VerdictChange["from"]) => (v ? (VERDICT_RANK[v.verdict] ?? -1) : -1);
  if (c.to?.verdict === "fail") return 0;
  if (rank(c.to) > rank(c.from)) return 1;
  return 2;
}

/**
 * "State · Design at shell — σx: 150 MPa → 155 MPa"; a label that only repeats the kind is said
 * once ("Scope — load cases: whole project → Operating, Design").
 */
export function inputChangeSentence(c: InputChange): string {
  const kind = KIND_WORD[c.kind];
  const name = c.label === kind ? kind : `${kind} · ${c.label}`;
  const what = `${name}${c.field ? ` — ${c.field}` : ""}`;
  if (c.from != null && c.to != null) return `${what}: ${c.from} → ${c.to}`;
  if (c.to != null) return `${what}: ${c.to}`;
  if (c.from != null) return `${what}: was ${c.from}`;
  return what;
}

/** One section of the diff, as the record page lists it. */
export type DiffSection = { id: string; title: string; lines: string[] };

/**
 * The diff as a checker reads it on a resubmission: first whether the two records cover
 * different load cases or locations (every other line must be read in that light), then results
 * whose verdict changed (new failures at the top), then the inputs changed, added and removed.
 * Empty sections are left out; `sections` empty means the two records hold the same inputs and
 * verdicts.
 */
export function diffSections(diff: RecordDiff): DiffSection[] {
  const verdicts = [...diff.verdictChanges]
    .map((c, i) => ({ c, i }))
    .sort((a, b) => severity(a.c) - severity(b.c) || a.i - b.i)
    .map(({ c }) => verdictChangeSentence(c));
  const isScope = (c: InputChange) => c.kind === "scope";
  const notScope = (list: InputChange[]) => list.filter((c) => !isScope(c)).map(inputChangeSentence);
  const scope = [...diff.inputs.changed, ...diff.inputs.added, ...diff.inputs.removed].filter(isScope);
  const sections: DiffSection[] = [
    { id: "scope", title: "What the records cover", lines: scope.map(inputChangeSentence) },
    { id: "verdicts", title: "Verdicts that changed", lines: verdicts },
    { id: "changed", title: "Inputs changed", lines: notScope(diff.inputs.changed) },
    { id: "added", title: "Inputs added", lines: notScope(diff.inputs.added) },
    { id: "removed", title: "Inputs removed", lines: notScope(diff.inputs.removed) },
  ];
  return sections.filter((s) => s.lines.length > 0);
}

/** "Record 2 (revision A) → record 3 (revision A)". */
export const diffHeading = (diff: RecordDiff) =>
  `Record ${diff.from.number} (revision ${diff.from.revision}) → record ${diff.to.number} (revision ${diff.to.revision})`;
