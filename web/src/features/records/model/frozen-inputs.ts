import { STRESS_COMPONENTS, COMPONENT_SYMBOLS, formatStress } from "../../../lib/stress";
import { CRITERION_LABELS } from "../../../../../core/contract/projects";
import type { RecordContent } from "../../../../../core/contract/records";
import { formatDateTime } from "./dates";
import { recordUnit } from "./frozen-results";

type Inputs = RecordContent["inputs"];
type MaterialRef = Inputs["locations"][number]["material"];

/** A labelled line of the frozen inputs. */
export type InputLine = { label: string; value: string; detail?: string };

/** The frozen inputs in sections, each line in words with its unit. */
export type FrozenInputs = {
  requirements: InputLine[];
  materials: InputLine[];
  locations: InputLine[];
  states: InputLine[];
  combinations: InputLine[];
};

function materialName(inputs: Inputs, ref: MaterialRef): string {
  if (!ref) return "no material";
  if (ref.kind === "published") return `built-in ${ref.id}`;
  return inputs.materials.find((m) => m.key === ref.key)?.name ?? ref.key;
}

/** Every input a record froze, in the order a check is set up: factors, materials, locations, states, combinations. */
export function frozenInputs(content: RecordContent): FrozenInputs {
  const inputs = content.inputs;
  const unit = recordUnit(content);
  const locationName = (key: string) => inputs.locations.find((l) => l.key === key)?.name ?? key;
  const caseName = (key: string) => inputs.loadCases.find((c) => c.key === key)?.name ?? key;
  const requirements: InputLine[] = [
    {
      label: "Project default",
      value: inputs.project.requirements
        .map((r) => `${CRITERION_LABELS[r.criterion]} n ≥ ${r.requiredFactor}`)
        .join(", "),
      detail: `default material: ${materialName(inputs, inputs.project.defaultMaterial)}`,
    },
    ...(inputs.project.categoryRequirements ?? []).map((c) => ({
      label: `Category “${c.category}”`,
      value: Object.entries(c.factors)
        .map(([k, v]) => `${CRITERION_LABELS[k as keyof typeof CRITERION_LABELS] ?? k} n ≥ ${v}`)
        .join(", "),
    })),
  ];
  const strength = (label: string, pa: number | null) =>
    pa === null ? null : `${label} ${formatStress(pa, unit)} ${unit}`;
  const materials = inputs.materials.map((m) => ({
    label: m.name,
    value:
      [
        strength("Sy", m.yieldPa),
        strength("Sut", m.ultimateTensionPa),
        strength("Suc", m.ultimateCompressionPa),
      ]
        .filter(Boolean)
        .join(", ") || "no strengths",
    detail: m.reference ? `source: ${m.reference}` : "no source given",
  }));
  const locations = inputs.locations.map((l) => ({
    label: l.name,
    value: materialName(inputs, l.material ?? inputs.project.defaultMaterial),
    detail: l.note || undefined,
  }));
  const states = inputs.loadCases.flatMap((c) =>
    c.states.map((s) => {
      const revision = content.stateRevisions.find((r) => r.loadCase === c.key && r.location === s.location);
      return {
        label: `${c.name} at ${locationName(s.location)}`,
        value:
          STRESS_COMPONENTS.map(
            (k) => `${COMPONENT_SYMBOLS[k].short} ${formatStress(s.componentsPa[k], s.unit)}`,
          ).join("  ") + ` ${s.unit}`,
        detail:
          `${c.category || "no category"}` +
          (revision ? `; revision ${revision.revision}, saved ${formatDateTime(revision.savedAt)}` : "") +
          (s.note ? `; ${s.note}` : ""),
      };
    }),
  );
  const combinations = inputs.combinations.map((c) => ({
    label: c.name,
    value: c.terms.map((t) => `${t.factor} × ${caseName(t.loadCase)}`).join(" + "),
    detail: c.description || undefined,
  }));
  return { requirements, materials, locations, states, combinations };
}

/** "Engine sigmacube-engine 1.4.0; taken 2026-12-01 10:00; hash 3fa9…". */
export function provenance(content: RecordContent, hash: string): string {
  return `Engine ${content.engine.name} ${content.engine.version}; inputs taken ${formatDateTime(content.takenAt)}; content hash ${hash}`;
}
