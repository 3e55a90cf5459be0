import type { ComparisonRowView } from "../../../core/contract/comparison";
import type { RecordChange, RecordContent, RecordDiff } from "../../../core/contract/records";
import { scopeChanges } from "./scope-diff";

/**
 * What differs between two frozen records — what a checker reads first on a resubmission: the
 * inputs added, changed and removed, and the results whose verdict changed. Inputs are matched
 * by the database id each export key stood for (materials, locations, load cases; states by case
 * and location), combinations by name (the export gives them no key). Fields are compared one by
 * one and generically, so inputs that later versions of the export add show up without a change
 * here. Values are display strings: stresses and strengths (fields ending in "Pa") in MPa.
 */

type Inputs = RecordContent["inputs"];
type ExportMaterialRef = Inputs["project"]["defaultMaterial"];
type Changes = RecordDiff["inputs"];
type Kind = RecordChange["kind"];

const COMPONENT_SYMBOLS: Record<string, string> = {
  xx: "σxx",
  yy: "σyy",
  zz: "σzz",
  xy: "τxy",
  yz: "τyz",
  zx: "τzx",
};

/** A number as a calculation sheet writes it: up to 6 significant figures, no trailing zeros. */
function formatNumber(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/** A stress in Pa as "123.4 MPa". */
function formatPa(pa: number): string {
  return `${formatNumber(pa / 1e6)} MPa`;
}

/** How one side of a record names things it refers to by key (materials, load cases). */
type Names = { material: (key: string) => string; loadCase: (key: string) => string };

function namesOf(inputs: Inputs): Names {
  const materials = new Map(inputs.materials.map((m) => [m.key, m.name]));
  const cases = new Map(inputs.loadCases.map((c) => [c.key, c.name]));
  return {
    material: (key) => materials.get(key) ?? key,
    loadCase: (key) => cases.get(key) ?? key,
  };
}

function isMaterialRef(value: unknown): value is NonNullable<ExportMaterialRef> {
  return (
    typeof value === "object" &&
    value !== null &&
    "kind" in value &&
    (value.kind === "published" || value.kind === "library")
  );
}

/** One field's value as text, with units where the field carries them. */
function display(field: string, value: unknown, names: Names): string {
  if (value === null || value === undefined) return "—";
  if (typeof value === "number") return field.endsWith("Pa") ? formatPa(value) : formatNumber(value);
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "string") return value === "" ? "(empty)" : value;
  if (isMaterialRef(value)) {
    return value.kind === "published" ? `${value.id} (published)` : names.material(value.key);
  }
  if (field === "terms" && Array.isArray(value)) {
    return (value as { loadCase: string; factor: number }[])
      .map((t) => `${formatNumber(t.factor)} × ${names.loadCase(t.loadCase)}`)
      .join(" + ");
  }
  if (field === "requirements" && Array.isArray(value)) {
    return (value as { criterion: string; requiredFactor: number }[])
      .map((r) => `${r.criterion} ${formatNumber(r.requiredFactor)}`)
      .join(", ");
  }
  return JSON.stringify(value);
}

/** Field-by-field changes of one matched input; `skip` names structural fields compared elsewhere. */
function fieldChanges(
  kind: Kind,
  label: string,
  from: Record<string, unknown>,
  to: Record<string, unknown>,
  sides: { from: Names; to: Names },
  skip: string[],
): RecordChange[] {
  const changes: RecordChange[] = [];
  const fields = [...new Set([...Object.keys(from), ...Object.keys(to)])].filter((f) => !skip.includes(f));
  for (const field of fields) {
    const a = display(field, from[field], sides.from);
    const b = display(field, to[field], sides.to);
    if (a !== b) changes.push({ kind, label, field, from: a, to: b });
  }
  return changes;
}

/** Matches two lists by a key and reports added, removed and changed entries. */
function compareLists<T>(
  out: Changes,
  kind: Kind,
  from: Map<string, T>,
  to: Map<string, T>,
  label: (item: T) => string,
  changed: (a: T, b: T) => RecordChange[],
  summary?: (item: T) => string,
): void {
  for (const [id, b] of to) {
    const a = from.get(id);
    if (a === undefined) out.added.push({ kind, label: label(b), ...(summary ? { to: summary(b) } : {}) });
    else out.changed.push(...changed(a, b));
  }
  for (const [id, a] of from) {
    if (!to.has(id)) out.removed.push({ kind, label: label(a), ...(summary ? { from: summary(a) } : {}) });
  }
}

/** Map of database id → entry, for a list whose entries carry an export key. */
function byId<T extends { key: string }>(list: T[], ids: Record<string, string>): Map<string, T> {
  return new Map(list.map((item) => [ids[item.key] ?? `key:${item.key}`, item]));
}

type StateEntry = {
  caseName: string;
  locationName: string;
  state: Inputs["loadCases"][number]["states"][number];
};

function statesOf(content: RecordContent): Map<string, StateEntry> {
  const locationNames = new Map(content.inputs.locations.map((l) => [l.key, l.name]));
  const states = new Map<string, StateEntry>();
  for (const c of content.inputs.loadCases) {
    for (const s of c.states) {
      const caseId = content.ids.loadCases[c.key] ?? c.key;
      const locationId = content.ids.locations[s.location] ?? s.location;
      states.set(`${caseId}:${locationId}`, {
        caseName: c.name,
        locationName: locationNames.get(s.location) ?? s.location,
        state: s,
      });
    }
  }
  return states;
}

const componentsText = (componentsPa: Record<string, number>) =>
  Object.entries(componentsPa)
    .map(([k, v]) => `${COMPONENT_SYMBOLS[k] ?? k} ${formatPa(v)}`)
    .join(", ");

/**
 * The inputs added, changed and removed from record `from` to record `to`; a change of what the
 * records cover (their scope) comes first, as it explains inputs that appear or go with it.
 */
export function diffInputs(from: RecordContent, to: RecordContent): Changes {
  const out: Changes = { added: [], changed: [...scopeChanges(from, to)], removed: [] };
  const sides = { from: namesOf(from.inputs), to: namesOf(to.inputs) };

  out.changed.push(...fieldChanges("project", "Project", from.inputs.project, to.inputs.project, sides, []));
  compareLists(
    out,
    "material",
    byId(from.inputs.materials, from.ids.materials),
    byId(to.inputs.materials, to.ids.materials),
    (m) => m.name,
    (a, b) => fieldChanges("material", b.name, a, b, sides, ["key"]),
  );
  compareLists(
    out,
    "location",
    byId(from.inputs.locations, from.ids.locations),
    byId(to.inputs.locations, to.ids.locations),
    (l) => l.name,
    (a, b) => fieldChanges("location", b.name, a, b, sides, ["key"]),
  );
  compareLists(
    out,
    "load-case",
    byId(from.inputs.loadCases, from.ids.loadCases),
    byId(to.inputs.loadCases, to.ids.loadCases),
    (c) => c.name,
    (a, b) => fieldChanges("load-case", b.name, a, b, sides, ["key", "states"]),
  );
  compareLists(
    out,
    "state",
    statesOf(from),
    statesOf(to),
    (s) => `${s.caseName} at ${s.locationName}`,
    (a, b) => {
      const label = `${b.caseName} at ${b.locationName}`;
      const components = Object.keys({ ...a.state.componentsPa, ...b.state.componentsPa }).flatMap((k) => {
        const x = formatPa((a.state.componentsPa as Record<string, number>)[k] ?? 0);
        const y = formatPa((b.state.componentsPa as Record<string, number>)[k] ?? 0);
        return x === y
          ? []
          : [{ kind: "state" as const, label, field: COMPONENT_SYMBOLS[k] ?? k, from: x, to: y }];
      });
      return [
        ...components,
        ...fieldChanges("state", label, a.state, b.state, sides, ["location", "componentsPa"]),
      ];
    },
    (s) => componentsText(s.state.componentsPa),
  );
  compareLists(
    out,
    "combination",
    new Map(from.inputs.combinations.map((c) => [c.name, c])),
    new Map(to.inputs.combinations.map((c) => [c.name, c])),
    (c) => c.name,
    (a, b) => fieldChanges("combination", b.name, a, b, sides, ["name"]),
    (c) => display("terms", c.terms, sides.to),
  );
  return out;
}

type VerdictAt = { verdict: string; factor: number | null } | null;

function verdictsOf(row: ComparisonRowView | undefined): Map<string, VerdictAt> {
  const verdicts = new Map<string, VerdictAt>();
  for (const check of row?.checks ?? []) {
    verdicts.set(
      check.criterion,
      check.status === "evaluated" ? { verdict: check.verdict, factor: check.factor } : null,
    );
  }
  return verdicts;
}

/**
 * Every row and criterion whose verdict differs between the two records (a row that appears or
 * goes counts from or to null). A factor that moved without changing the verdict is not listed.
 */
export function diffVerdicts(from: RecordContent, to: RecordContent): RecordDiff["verdictChanges"] {
  const before = new Map(from.results.rows.map((r) => [r.rowId, r]));
  const after = new Map(to.results.rows.map((r) => [r.rowId, r]));
  const rowIds = [...after.keys(), ...[...before.keys()].filter((id) => !after.has(id))];
  const changes: RecordDiff["verdictChanges"] = [];
  for (const rowId of rowIds) {
    const a = before.get(rowId);
    const b = after.get(rowId);
    const va = verdictsOf(a);
    const vb = verdictsOf(b);
    for (const criterion of new Set([...vb.keys(), ...va.keys()])) {
      const x = va.get(criterion) ?? null;
      const y = vb.get(criterion) ?? null;
      if ((x?.verdict ?? null) === (y?.verdict ?? null)) continue;
      changes.push({
        rowId,
        caseName: (b ?? a)!.caseName,
        locationName: (b ?? a)!.locationName,
        criterion,
        from: x,
        to: y,
      });
    }
  }
  return changes;
}
