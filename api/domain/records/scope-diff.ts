import type { RecordChange, RecordContent, RecordScope } from "../../../core/contract/records";

/** How one side of a diff covers one list: every entry of the project, or the chosen ones. */
type Covered = { all: true } | { all: false; ids: string[]; names: string[] };

const WHOLE_PROJECT = "whole project";

function covered(
  scope: RecordScope | undefined,
  chosen: (s: RecordScope) => { id: string; name: string }[],
  total: (s: RecordScope) => number,
): Covered {
  if (!scope) return { all: true };
  const list = chosen(scope);
  // A scope that chose every load case (say) but not every location covers all of the former.
  if (list.length === total(scope)) return { all: true };
  return { all: false, ids: list.map((x) => x.id), names: list.map((x) => x.name) };
}

const sameCover = (a: Covered, b: Covered) =>
  a.all || b.all ? a.all === b.all : a.ids.length === b.ids.length && a.ids.every((id, i) => id === b.ids[i]);

const text = (c: Covered) => (c.all ? WHOLE_PROJECT : c.names.join(", "));

/**
 * What changed in what the two records cover — their load cases, then their locations — as "scope"
 * changes from and to "whole project" or the chosen names; empty when both cover the same. A checker
 * reads this first: inputs outside the narrower scope show as added or removed because of it.
 */
export function scopeChanges(from: RecordContent, to: RecordContent): RecordChange[] {
  const fields = [
    {
      field: "load cases",
      chosen: (s: RecordScope) => s.loadCases,
      total: (s: RecordScope) => s.projectLoadCases,
    },
    {
      field: "locations",
      chosen: (s: RecordScope) => s.locations,
      total: (s: RecordScope) => s.projectLocations,
    },
  ];
  return fields.flatMap(({ field, chosen, total }) => {
    const a = covered(from.scope, chosen, total);
    const b = covered(to.scope, chosen, total);
    return sameCover(a, b)
      ? []
      : [{ kind: "scope" as const, label: "Scope", field, from: text(a), to: text(b) }];
  });
}
