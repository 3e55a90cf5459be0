import { CRITERION_LABELS, type CriterionName } from "../../../core/contract/projects";
import { publishedMaterial } from "../../../core/materials/published";
import { convertStress, isStressUnit } from "../../../core/units/stress";

/** One changed field of an audit event as a person reads it: its name, the value before and after. */
export type AuditChangeLine = { field: string; from: string | null; to: string | null };

/** Names of the records an event's changes point at by id (trashed ones too). */
export type AuditNames = {
  materials: ReadonlyMap<string, string>;
  loadCases: ReadonlyMap<string, string>;
};

/** The ids an event's changes point at, so the names can be read once for a page of events. */
export type NamedIds = { materials: Set<string>; loadCases: Set<string> };

type Changes = Record<string, unknown>;
type StoredEvent = { entityType: string; action: string; changes: Changes | null };

const FIELD_LABELS: Record<string, string> = {
  name: "Name",
  description: "Description",
  note: "Note",
  category: "Category",
  unitSystem: "Unit system",
  requirements: "Required factors",
  categoryRequirements: "Factors per category",
  includeUnsuitedCriteria: "Rate criteria that do not suit the material",
  defaultMaterial: "Default material",
  material: "Material",
  unit: "Unit",
  yieldPa: "Yield strength",
  ultimateTensionPa: "Ultimate tensile strength",
  ultimateCompressionPa: "Ultimate compressive strength",
  elasticModulusPa: "Elastic modulus",
  poissonRatio: "Poisson's ratio",
  reference: "Reference",
  terms: "Terms",
  revision: "Revision",
  exportedAt: "File exported at",
  schemaVersion: "File schema version",
};

const COMPONENT_LABELS = { xx: "σxx", yy: "σyy", zz: "σzz", xy: "τxy", yz: "τyz", zx: "τzx" } as const;
type Components = Record<keyof typeof COMPONENT_LABELS, number>;

/** Long free text is cut so one change never fills the activity list. */
const MAX_TEXT = 120;

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === "object" && v !== null && !Array.isArray(v);

function text(value: string): string {
  if (value === "") return "(empty)";
  return `“${value.length > MAX_TEXT ? `${value.slice(0, MAX_TEXT - 1)}…` : value}”`;
}

/** A stress in `unit` (MPa when the event does not say), with its unit, 4 significant digits. */
function stress(pa: number, unit: string): string {
  const shown = isStressUnit(unit) ? unit : "MPa";
  return `${Number(convertStress(pa, "Pa", shown).toPrecision(4))} ${shown}`;
}

function materialRef(ref: unknown, names: AuditNames): string {
  if (ref === null || ref === undefined) return "none";
  if (!isObject(ref)) return String(ref);
  if (ref.kind === "published")
    return publishedMaterial(String(ref.id))?.name ?? `built-in “${String(ref.id)}”`;
  return names.materials.get(String(ref.id)) ?? "a material no longer in the library";
}

function factors(list: unknown): string {
  if (!Array.isArray(list)) return JSON.stringify(list);
  return list
    .map(
      (r: { criterion: CriterionName; requiredFactor: number }) =>
        `${CRITERION_LABELS[r.criterion] ?? r.criterion} ${r.requiredFactor}`,
    )
    .join(" · ");
}

function categoryFactors(list: unknown): string {
  if (!Array.isArray(list)) return JSON.stringify(list);
  if (list.length === 0) return "none";
  return list
    .map((c: { category: string; factors: Partial<Record<CriterionName, number>> }) => {
      const entries = Object.entries(c.factors).map(
        ([k, v]) => `${CRITERION_LABELS[k as CriterionName] ?? k} ${v}`,
      );
      return `${c.category}: ${entries.join(", ")}`;
    })
    .join("; ");
}

function terms(list: unknown, names: AuditNames): string {
  if (!Array.isArray(list)) return JSON.stringify(list);
  return list
    .map(
      (t: { loadCaseId: string; factor: number }) =>
        `${t.factor} × ${names.loadCases.get(t.loadCaseId) ?? "a deleted load case"}`,
    )
    .join(" + ");
}

/** One field's value in words, by what the field holds. */
function value(field: string, v: unknown, names: AuditNames, unit: string): string | null {
  if (field === "material" || field === "defaultMaterial") return materialRef(v, names);
  if (v === null || v === undefined)
    return field.endsWith("Pa") || field === "poissonRatio" ? "not given" : null;
  if (field === "requirements") return factors(v);
  if (field === "categoryRequirements") return categoryFactors(v);
  if (field === "terms") return terms(v, names);
  if (field.endsWith("Pa") && typeof v === "number") return stress(v, unit);
  if (typeof v === "boolean") return v ? "yes" : "no";
  if (typeof v === "string") return text(v);
  if (typeof v === "number") return String(v);
  return JSON.stringify(v);
}

const label = (field: string) => FIELD_LABELS[field] ?? field;

/** The six components that differ between two states (all six of a new or removed one). */
function stateLines(changes: Changes): AuditChangeLine[] {
  const unit = typeof changes.unit === "string" ? changes.unit : "MPa";
  const from = isObject(changes.fromPa) ? (changes.fromPa as Components) : null;
  const to = isObject(changes.toPa) ? (changes.toPa as Components) : null;
  const lines: AuditChangeLine[] = [];
  for (const [key, name] of Object.entries(COMPONENT_LABELS) as [keyof Components, string][]) {
    const before = from?.[key];
    const after = to?.[key];
    if (before === after) continue;
    lines.push({
      field: name,
      from: before === undefined ? null : stress(before, unit),
      to: after === undefined ? null : stress(after, unit),
    });
  }
  return lines;
}

/**
 * An audit event's stored changes as lines "field: before → after" in words and units: names
 * instead of ids, stresses in the unit the state was entered in (strengths in MPa), factors per
 * criterion. Events store their changes in one of three shapes, all handled here: a snapshot of a
 * new record (`{ after }`), the fields that changed (`{ field: { from, to } }`), or a state's
 * components before and after (`fromPa`, `toPa`).
 */
export function describeChanges(event: StoredEvent, names: AuditNames): AuditChangeLine[] {
  const changes = event.changes;
  if (!changes) return [];
  if (event.entityType === "stress-state") return stateLines(changes);
  const unit = "MPa";
  if (isObject(changes.after)) {
    return Object.entries(changes.after)
      .map(([field, v]) => ({ field: label(field), from: null, to: value(field, v, names, unit) }))
      .filter((line) => line.to !== null && line.to !== "(empty)");
  }
  return Object.entries(changes).map(([field, change]) =>
    isObject(change) && ("from" in change || "to" in change)
      ? {
          field: label(field),
          from: value(field, change.from, names, unit),
          to: value(field, change.to, names, unit),
        }
      : { field: label(field), from: null, to: value(field, change, names, unit) },
  );
}

/** Every id the changes of these events point at, by kind. */
export function idsNamedIn(events: readonly StoredEvent[]): NamedIds {
  const ids: NamedIds = { materials: new Set(), loadCases: new Set() };
  const visit = (field: string, v: unknown) => {
    if ((field === "material" || field === "defaultMaterial") && isObject(v) && v.kind === "library") {
      ids.materials.add(String(v.id));
    }
    if (field === "terms" && Array.isArray(v)) {
      for (const t of v as { loadCaseId?: string }[]) if (t.loadCaseId) ids.loadCases.add(t.loadCaseId);
    }
  };
  for (const e of events) {
    if (!e.changes) continue;
    const fields = isObject(e.changes.after) ? e.changes.after : e.changes;
    for (const [field, change] of Object.entries(fields)) {
      if (isObject(change) && ("from" in change || "to" in change)) {
        visit(field, change.from);
        visit(field, change.to);
      } else visit(field, change);
    }
  }
  return ids;
}
