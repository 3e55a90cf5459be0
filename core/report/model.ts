import { CALCULATORS } from "../constants/calculators";
import { RESULTS_CAUTION } from "../contract/cautions";
import { formatFactor, governingSentence } from "../contract/comparison";
import { CRITERION_LABELS, CRITERION_NAMES, type CriterionName } from "../contract/projects";
import type { RecordContent } from "../contract/records";
import type { StressUnit } from "../units/stress";
import { linearizationSection, pointTableSection } from "./beside-sections";
import type { ReportBlock, ReportSection } from "./blocks";
import { coverageSentence } from "./coverage";
import { dateText, percentText, reportUnit } from "./format";
import { inputsSection } from "./inputs-section";
import { locationSections, VERDICT_TEXT } from "./location-sections";
import { DRAFT_WATERMARK, type ReportMeta } from "./meta";
import { CRITERION_METHODS, SIGN_CONVENTIONS } from "./method";

/** The report, drawn the same by the PDF renderer and the print page. */
export type ReportModel = {
  title: string;
  projectName: string;
  /** What every page's footer names: the record (number, revision, id) or the draft. */
  pageIdentifier: string;
  /** "DRAFT — not checked" on every page of a draft; null for a record. */
  watermark: string | null;
  /** When the content was taken (ISO): a fixed date for the PDF's metadata, so equal content gives equal files. */
  takenAt: string;
  unit: StressUnit;
  /** The results caution, once beside the results on every page. */
  caution: string;
  sections: ReportSection[];
};

/** What the engineer who signs the report answers for: stated in the report, not left to assumption. */
export const RESPONSIBILITY =
  "This report records a calculation; it does not approve a design. The engineer who signs it is responsible for the inputs (the stress states, the materials and their allowables, the required factors), for choosing criteria that suit each material, and for judging the results against the governing design code. Published allowables must be verified against the material certificate.";

function pageIdentifier(content: RecordContent, meta: ReportMeta): string {
  return meta.kind === "record"
    ? `Record ${meta.number} rev. ${meta.revision} · ${meta.recordId}`
    : `DRAFT of ${content.inputs.project.name} · project ${content.project.id} · taken ${dateText(content.takenAt)}`;
}

function coverSection(content: RecordContent, meta: ReportMeta): ReportSection {
  const common: [string, string][] = [
    ["Project", content.inputs.project.name],
    ["Content taken", dateText(content.takenAt)],
    ["Project version", String(content.project.version)],
    ["Engine", `${content.engine.name} ${content.engine.version}`],
  ];
  if (meta.kind === "draft") {
    return {
      id: "cover",
      title: "Calculation report",
      pageBreakBefore: false,
      blocks: [
        {
          kind: "paragraph",
          tone: "caution",
          text: `${DRAFT_WATERMARK}: taken from the project as it is now, not a frozen record; nobody has checked or approved it.`,
        },
        { kind: "paragraph", text: coverageSentence(content, "draft") },
        { kind: "fields", rows: [...common, ["Record", "none (draft)"], ["Status", "draft — not checked"]] },
      ],
    };
  }
  const s = meta.signatures;
  const sign = (role: string, who: { name: string; at: string } | null): string[] =>
    who ? [role, who.name, dateText(who.at)] : [role, "not signed", "—"];
  return {
    id: "cover",
    title: "Calculation report",
    pageBreakBefore: false,
    blocks: [
      {
        kind: "fields",
        rows: [
          ...common,
          ["Record", `${meta.number} · ${meta.recordId}`],
          ["Revision", meta.revision],
          ["Status", meta.status],
          ["Content hash (SHA-256)", meta.hash],
        ],
      },
      { kind: "paragraph", text: coverageSentence(content, "record") },
      { kind: "heading", text: "Revisions" },
      {
        kind: "table",
        columns: [
          { title: "Record", align: "left", width: 1.5 },
          { title: "Rev.", align: "left", width: 1 },
          { title: "Status", align: "left", width: 2.5 },
          { title: "Reason", align: "left", width: 5 },
          { title: "Submitted by", align: "left", width: 2.5 },
          { title: "Submitted", align: "left", width: 3 },
        ],
        rows: meta.revisions.map((r) => [
          r.number,
          r.revision,
          r.status,
          r.reason,
          r.submittedBy,
          dateText(r.submittedAt),
        ]),
        empty: "No revision yet.",
      },
      { kind: "heading", text: "Signatures" },
      {
        kind: "table",
        columns: [
          { title: "Role", align: "left", width: 2 },
          { title: "Name", align: "left", width: 4 },
          { title: "Signed", align: "left", width: 3 },
        ],
        rows: [
          sign("Originator", s.originator),
          ...(s.checkers.length > 0 ? s.checkers.map((c) => sign("Checker", c)) : [sign("Checker", null)]),
          sign("Approver", s.approver),
        ],
      },
    ],
  };
}

function scopeSection(content: RecordContent, meta: ReportMeta): ReportSection {
  const inputs = content.inputs;
  const r = content.results;
  const loadCaseRows = r.rows.filter((row) => row.kind === "load-case").length;
  return {
    id: "scope",
    title: "Scope",
    pageBreakBefore: false,
    blocks: [
      ...(inputs.project.description
        ? [{ kind: "paragraph", text: inputs.project.description } as ReportBlock]
        : []),
      { kind: "paragraph", text: coverageSentence(content, meta.kind === "draft" ? "draft" : "record") },
      {
        kind: "paragraph",
        text: `This report checks the stress states of ${inputs.loadCases.length} load case(s) and ${inputs.combinations.length} combination(s) at ${inputs.locations.length} location(s) against the criteria and safety factors the project requires: ${r.rows.length} checked state(s), ${loadCaseRows} from load cases and ${r.rows.length - loadCaseRows} from combinations.`,
      },
      {
        kind: "paragraph",
        text: "It covers the stress states as given (typed, pasted, measured, from finite-element points or from calculators); how those states were obtained from loads and geometry is outside it unless a calculator's inputs are listed below.",
      },
    ],
  };
}

/** Every criterion the project checks, by default or for a category, in the engine's order. */
function checkedCriteria(content: RecordContent): CriterionName[] {
  const r = content.results;
  const named = new Set<string>([
    ...r.requirements.map((q) => q.criterion),
    ...r.categoryRequirements.flatMap((c) => Object.keys(c.factors)),
  ]);
  return CRITERION_NAMES.filter((c) => named.has(c));
}

function methodSection(content: RecordContent): ReportSection {
  const blocks: ReportBlock[] = [
    {
      kind: "paragraph",
      text: `Principal stresses and directions are the eigenvalues and eigenvectors of the symmetric stress tensor. Each state is rated by each criterion the project checks; the governing check is the one with the highest utilisation. Computed by ${content.engine.name} ${content.engine.version}.`,
    },
  ];
  for (const criterion of checkedCriteria(content)) {
    const m = CRITERION_METHODS[criterion];
    blocks.push({ kind: "heading", text: CRITERION_LABELS[criterion] });
    blocks.push({ kind: "formulas", lines: m.formulas, source: m.source });
    blocks.push({ kind: "paragraph", tone: "note", text: `Needs ${m.needs}.` });
  }
  blocks.push({ kind: "heading", text: "Conventions" }, { kind: "list", items: [...SIGN_CONVENTIONS] });
  return { id: "method", title: "Method", pageBreakBefore: true, blocks };
}

function comparisonSection(content: RecordContent): ReportSection {
  const r = content.results;
  const criteria = checkedCriteria(content);
  const blocks: ReportBlock[] = [
    {
      kind: "paragraph",
      text: r.governingOverall
        ? `Governs: ${governingSentence(r.governingOverall)} — ${VERDICT_TEXT[r.governingOverall.verdict]}.`
        : "No check could be rated, so no case governs.",
    },
    { kind: "heading", text: "Governing case per criterion" },
    {
      kind: "table",
      columns: [
        { title: "Criterion", align: "left", width: 2 },
        { title: "Governing case", align: "left", width: 7 },
        { title: "Utilisation", align: "right", width: 1.6 },
        { title: "Verdict", align: "left", width: 1.6 },
      ],
      rows: r.governing.map((g) => [
        CRITERION_LABELS[g.criterion],
        governingSentence(g),
        percentText(g.utilisation),
        VERDICT_TEXT[g.verdict],
      ]),
      empty: "Nothing was rated.",
    },
    { kind: "heading", text: "Every case at every location (safety factor n per criterion)" },
    {
      kind: "table",
      columns: [
        { title: "Case", align: "left", width: 3 },
        { title: "Location", align: "left", width: 3 },
        ...criteria.map((c) => ({ title: CRITERION_LABELS[c], align: "right" as const, width: 1.6 })),
      ],
      rows: r.rows.map((row) => [
        row.caseName,
        row.locationName,
        ...criteria.map((c) => {
          const check = row.checks.find((k) => k.criterion === c);
          if (!check) return "";
          if (check.status !== "evaluated") return check.status === "not-applicable" ? "n/a" : "—";
          return `${formatFactor(check.factor)} ${VERDICT_TEXT[check.verdict].slice(0, 1)}`;
        }),
      ]),
      empty: "No case has a state.",
    },
  ];
  if (r.skipped.length > 0) {
    blocks.push(
      { kind: "heading", text: "Pairs without a result" },
      { kind: "list", items: r.skipped.map((s) => `${s.caseName} at ${s.locationName}: ${s.reason}`) },
    );
  }
  return { id: "comparison", title: "Comparison and governing case", pageBreakBefore: true, blocks };
}

function calculatorSection(content: RecordContent): ReportSection | null {
  const blocks: ReportBlock[] = [];
  const locationName = (key: string) => content.inputs.locations.find((l) => l.key === key)?.name ?? key;
  for (const c of content.inputs.loadCases) {
    for (const s of c.states) {
      // Files of schema version 1 and 2 carry no calculator; version 3 says null for a typed state.
      const calc = "calculator" in s ? s.calculator : null;
      if (!calc) continue;
      const { numbers, choices, units } = calc.inputs;
      blocks.push(
        {
          kind: "heading",
          text: `${c.name} at ${locationName(s.location)}: ${CALCULATORS[calc.name].title} (version ${calc.version}, units ${units})`,
        },
        {
          kind: "fields",
          rows: [
            ...Object.entries(numbers).map(([k, n]): [string, string] => [k, `${n.value} ${n.unit}`.trim()]),
            ...Object.entries(choices).map(([k, v]): [string, string] => [k, v]),
          ],
        },
      );
    }
  }
  return blocks.length === 0
    ? null
    : { id: "calculators", title: "Calculator inputs", pageBreakBefore: false, blocks };
}

function cautionSection(content: RecordContent): ReportSection {
  const cautions = [...new Set([RESULTS_CAUTION, ...content.results.cautions])];
  return {
    id: "cautions",
    title: "Cautions and the engineer's responsibility",
    pageBreakBefore: false,
    blocks: [
      { kind: "list", items: cautions },
      { kind: "paragraph", text: RESPONSIBILITY },
    ],
  };
}

/**
 * The calculation report of a record's content: cover (project, record, revisions, signatures),
 * scope, inputs with units and sources, method, one section per location, the comparison with the
 * governing case, the stress classification lines and point tables where the record has them,
 * calculator inputs where a state came from one, and the cautions. Pure: the same
 * content and meta always give the same model.
 */
export function buildReportModel(content: RecordContent, meta: ReportMeta): ReportModel {
  const unit = reportUnit(content.inputs.project.unitSystem);
  const calculators = calculatorSection(content);
  const lines = linearizationSection(content);
  const tables = pointTableSection(content);
  return {
    title: `Calculation report: ${content.inputs.project.name}`,
    projectName: content.inputs.project.name,
    pageIdentifier: pageIdentifier(content, meta),
    watermark: meta.kind === "draft" ? DRAFT_WATERMARK : null,
    takenAt: content.takenAt,
    unit,
    caution: RESULTS_CAUTION,
    sections: [
      coverSection(content, meta),
      scopeSection(content, meta),
      inputsSection(content, unit),
      methodSection(content),
      ...locationSections(content, unit),
      comparisonSection(content),
      ...(lines ? [lines] : []),
      ...(tables ? [tables] : []),
      ...(calculators ? [calculators] : []),
      cautionSection(content),
    ],
  };
}
