import { CRITERION_LABELS } from "../contract/projects";
import type { RecordContent } from "../contract/records";
import { publishedMaterial } from "../materials/published";
import type { StressUnit } from "../units/stress";
import type { ReportBlock, ReportSection } from "./blocks";
import { dateText, strengthText } from "./format";

type Inputs = RecordContent["inputs"];
type MaterialRef = Inputs["locations"][number]["material"];

/** The note printed beside every published allowable the calculation uses. */
export const VERIFY_CERTIFICATE_NOTE =
  "Published minimum values: verify them against your material certificate and the governing standard before relying on them.";

const MPA = 1e6;

/** Every published grade the inputs point at (the project default and the locations), in first-use order. */
function publishedIdsUsed(inputs: Inputs): string[] {
  const refs: MaterialRef[] = [inputs.project.defaultMaterial, ...inputs.locations.map((l) => l.material)];
  const ids = refs.flatMap((r) => (r?.kind === "published" ? [r.id] : []));
  return [...new Set(ids)];
}

/** A material reference in words: the library material's name, the published grade's, or none. */
export function materialName(inputs: Inputs, ref: MaterialRef): string {
  if (ref === null) return "none (the project default applies)";
  if (ref.kind === "library") return inputs.materials.find((m) => m.key === ref.key)?.name ?? ref.key;
  const grade = publishedMaterial(ref.id);
  return grade ? `${grade.name} (${grade.standard})` : ref.id;
}

function requirementBlocks(inputs: Inputs): ReportBlock[] {
  const p = inputs.project;
  const blocks: ReportBlock[] = [
    { kind: "heading", text: "Required safety factors" },
    {
      kind: "table",
      columns: [
        { title: "Applies to", align: "left", width: 3 },
        { title: "Criterion", align: "left", width: 3 },
        { title: "Required n", align: "right", width: 2 },
      ],
      rows: [
        ...p.requirements.map((r) => [
          "project default",
          CRITERION_LABELS[r.criterion],
          String(r.requiredFactor),
        ]),
        ...p.categoryRequirements.flatMap((c) =>
          Object.entries(c.factors).map(([criterion, factor]) => [
            `category “${c.category}”`,
            CRITERION_LABELS[criterion as keyof typeof CRITERION_LABELS],
            String(factor),
          ]),
        ),
      ],
    },
    {
      kind: "paragraph",
      tone: "note",
      text: p.includeUnsuitedCriteria
        ? "Criteria that do not suit a material (ductile or brittle) were rated anyway and may govern, as the project asks."
        : "Criteria that do not suit a material (ductile or brittle) are shown as not applicable and never govern.",
    },
  ];
  return blocks;
}

function materialBlocks(inputs: Inputs, unit: StressUnit): ReportBlock[] {
  const published = publishedIdsUsed(inputs).flatMap((id) => {
    const m = publishedMaterial(id);
    return m ? [m] : [];
  });
  const columns = [
    { title: "Material", align: "left" as const, width: 4 },
    { title: `Sy, ${unit}`, align: "right" as const, width: 2 },
    { title: `Sut, ${unit}`, align: "right" as const, width: 2 },
    { title: `Suc, ${unit}`, align: "right" as const, width: 2 },
    { title: "Reference", align: "left" as const, width: 5 },
  ];
  const rows = [
    ...inputs.materials.map((m) => [
      m.name,
      strengthText(m.yieldPa, unit),
      strengthText(m.ultimateTensionPa, unit),
      strengthText(m.ultimateCompressionPa, unit),
      [m.reference || "no reference given", m.note].filter(Boolean).join(" — "),
    ]),
    ...published.map((m) => [
      m.name,
      strengthText(m.yield === undefined ? null : m.yield * MPA, unit),
      strengthText(m.ultimateTension * MPA, unit),
      strengthText(m.ultimateCompression * MPA, unit),
      `${m.standard}, ${m.scope}; Suc ${m.compressionBasis}; ${m.note}`,
    ]),
  ];
  const blocks: ReportBlock[] = [
    { kind: "heading", text: "Materials" },
    { kind: "table", columns, rows, empty: "No material is used." },
  ];
  if (published.length > 0)
    blocks.push({ kind: "paragraph", tone: "caution", text: VERIFY_CERTIFICATE_NOTE });
  return blocks;
}

function geometryBlocks(content: RecordContent): ReportBlock[] {
  const inputs = content.inputs;
  const revisionOf = (caseKey: string, locationKey: string) =>
    content.stateRevisions.find((r) => r.loadCase === caseKey && r.location === locationKey);
  const locationName = (key: string) => inputs.locations.find((l) => l.key === key)?.name ?? key;
  const caseName = (key: string) => inputs.loadCases.find((c) => c.key === key)?.name ?? key;
  return [
    { kind: "heading", text: "Locations" },
    {
      kind: "table",
      columns: [
        { title: "Location", align: "left", width: 3 },
        { title: "Material", align: "left", width: 4 },
        { title: "Note", align: "left", width: 5 },
      ],
      rows: inputs.locations.map((l) => [l.name, materialName(inputs, l.material), l.note]),
      empty: "The project has no location.",
    },
    {
      kind: "paragraph",
      text: `Project default material: ${materialName(inputs, inputs.project.defaultMaterial)}.`,
    },
    { kind: "heading", text: "Load cases and their states" },
    {
      kind: "table",
      columns: [
        { title: "Load case", align: "left", width: 3 },
        { title: "Category", align: "left", width: 2 },
        { title: "Location", align: "left", width: 3 },
        { title: "Entered in", align: "left", width: 1.4 },
        { title: "Source", align: "left", width: 2.2 },
        { title: "Rev.", align: "right", width: 1 },
        { title: "Saved", align: "left", width: 3 },
        { title: "Note", align: "left", width: 3 },
      ],
      rows: inputs.loadCases.flatMap((c) =>
        c.states.length === 0
          ? [[c.name, c.category || "—", "no state", "", "", "", "", c.description]]
          : c.states.map((s) => {
              const rev = revisionOf(c.key, s.location);
              return [
                c.name,
                c.category || "—",
                locationName(s.location),
                s.unit,
                s.source,
                rev ? String(rev.revision) : "—",
                rev ? dateText(rev.savedAt) : "—",
                s.note,
              ];
            }),
      ),
      empty: "The project has no load case.",
    },
    { kind: "heading", text: "Combinations" },
    {
      kind: "table",
      columns: [
        { title: "Combination", align: "left", width: 3 },
        { title: "Terms (factor × load case)", align: "left", width: 7 },
      ],
      rows: inputs.combinations.map((c) => [
        c.name,
        c.terms.map((t) => `${t.factor} × ${caseName(t.loadCase)}`).join(" + "),
      ]),
      empty: "The project has no combination.",
    },
  ];
}

/** Inputs with units and sources: the factors required, materials with references, locations, states, combinations. */
export function inputsSection(content: RecordContent, unit: StressUnit): ReportSection {
  return {
    id: "inputs",
    title: "Inputs",
    pageBreakBefore: true,
    blocks: [
      {
        kind: "paragraph",
        text: `Stresses are stored in Pa and shown in ${unit}; each state keeps the unit it was entered in. Unit system of the project: ${content.inputs.project.unitSystem}.`,
      },
      ...requirementBlocks(content.inputs),
      ...materialBlocks(content.inputs, unit),
      ...geometryBlocks(content),
    ],
  };
}
