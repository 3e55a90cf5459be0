import { describe, expect, it } from "vitest";
import { RESULTS_CAUTION } from "../contract/cautions";
import { governingSentence, type ComparisonRowView } from "../contract/comparison";
import { recordContentSchema, type RecordContent } from "../contract/records";
import { fixed } from "../diagrams";
import type { ReportBlock } from "./blocks";
import { buildReportModel, DRAFT_WATERMARK, RESPONSIBILITY, type ReportMeta } from "./index";

const MPA = 1e6;
const ID = {
  project: "6b1d3c9e-2f4a-4c8b-9e1d-0a2b3c4d5e6f",
  workspace: "7c2e4dae-3a5b-4d9c-8f2e-1b3c4d5e6f70",
  neck: "8d3f5ebf-4b6c-4eab-9a3f-2c4d5e6f7081",
  flange: "9e4a6fca-5c7d-4fbc-8b4a-3d5e6f708192",
  operating: "af5b7adb-6d8e-4acd-9c5b-4e6f708192a3",
  material: "b06c8bec-7e9f-4bde-8d6c-5f708192a3b4",
};

// A plane state σx = 90, σy = −30, τxy = 40 MPa: its in-plane principal stresses and angle are
// (σx + σy)/2 ± sqrt(((σx − σy)/2)² + τxy²) and θp = ½·atan2(2τxy, σx − σy) (plane-stress
// transformation; recalled from memory).
const sx = 90;
const sy = -30;
const txy = 40;
const centre = (sx + sy) / 2;
const radius = Math.hypot((sx - sy) / 2, txy);
const thetaP = Math.atan2(2 * txy, sx - sy) / 2;
// von Mises for plane stress: sqrt(σx² − σxσy + σy² + 3τxy²) (recalled from memory); Sy = 250 MPa.
const vonMises = Math.sqrt(sx * sx - sx * sy + sy * sy + 3 * txy * txy);
const factor = 250 / vonMises;

const row: ComparisonRowView = {
  rowId: `case:${ID.operating}:${ID.neck}`,
  kind: "load-case",
  caseId: ID.operating,
  caseName: "Operating",
  category: "operating",
  locationId: ID.neck,
  locationName: "Nozzle neck",
  caseVersion: 1,
  stateRevision: 2,
  allowable: { category: null, label: "the project default" },
  material: { label: "Test plate", kind: "workspace", note: "" },
  componentsPa: { xx: sx * MPA, yy: sy * MPA, zz: 0, xy: txy * MPA, yz: 0, zx: 0 },
  principalPa: [(centre + radius) * MPA, 0, (centre - radius) * MPA],
  vonMisesPa: vonMises * MPA,
  trescaPa: 2 * radius * MPA,
  maxShearPa: radius * MPA,
  checks: [
    {
      status: "evaluated",
      criterion: "von-mises",
      requiredFactor: 1.5,
      category: null,
      factor,
      utilisation: 1.5 / factor,
      verdict: "pass",
      unsuited: null,
    },
  ],
};

const governing = {
  criterion: "von-mises" as const,
  rowId: row.rowId,
  caseName: "Operating",
  locationName: "Nozzle neck",
  factor,
  requiredFactor: 1.5,
  category: null,
  utilisation: 1.5 / factor,
  verdict: "pass" as const,
};

function content(unitSystem: "SI" | "US" = "SI"): RecordContent {
  return recordContentSchema.parse({
    format: "sigmacube.record",
    contentVersion: 1,
    engine: { name: "sigmacube-core", version: "2026.12.1" },
    takenAt: "2026-12-01T09:30:00.000Z",
    project: { id: ID.project, workspaceId: ID.workspace, version: 4 },
    inputs: {
      format: "sigmacube.project",
      schemaVersion: 2,
      exportedAt: "2026-12-01T09:30:00.000Z",
      project: {
        name: "Nozzle N2",
        description: "Nozzle N2 on the shell of a test vessel.",
        unitSystem,
        requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
        categoryRequirements: [],
        includeUnsuitedCriteria: false,
        defaultMaterial: { kind: "published", id: "sa516-70" },
      },
      materials: [
        {
          key: "m1",
          name: "Test plate",
          unit: "MPa",
          yieldPa: 250 * MPA,
          ultimateTensionPa: 400 * MPA,
          ultimateCompressionPa: null,
          elasticModulusPa: null,
          poissonRatio: null,
          reference: "Mill certificate 4711",
          note: "",
        },
      ],
      locations: [
        {
          key: "l1",
          name: "Nozzle neck",
          note: "Outside surface, hoop direction x.",
          material: { kind: "library", key: "m1" },
        },
        { key: "l2", name: "Flange", note: "", material: null },
      ],
      loadCases: [
        {
          key: "c1",
          name: "Operating",
          category: "operating",
          description: "",
          states: [
            {
              location: "l1",
              unit: "MPa",
              componentsPa: row.componentsPa,
              source: "calculator",
              note: "",
            },
          ],
        },
      ],
      combinations: [],
    },
    ids: {
      materials: { m1: ID.material },
      locations: { l1: ID.neck, l2: ID.flange },
      loadCases: { c1: ID.operating },
    },
    stateRevisions: [
      { loadCase: "c1", location: "l1", revision: 2, savedAt: "2026-11-30T12:00:00.000Z", savedBy: null },
    ],
    results: {
      projectId: ID.project,
      requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
      categoryRequirements: [],
      includeUnsuitedCriteria: false,
      rows: [row],
      governing: [governing],
      governingOverall: governing,
      governingByLocation: [{ locationId: ID.neck, locationName: "Nozzle neck", governing: [governing] }],
      summary: null,
      skipped: [],
      cautions: [RESULTS_CAUTION],
    },
  });
}

const draft: ReportMeta = { kind: "draft" };
const recordMeta: ReportMeta = {
  kind: "record",
  recordId: "c17d9cfd-8fa0-4cef-9e7d-60819203b4c5",
  number: "CR-0012",
  revision: "A",
  status: "submitted for check",
  hash: "0f".repeat(32),
  revisions: [],
  signatures: { originator: { name: "Ada", at: "2026-12-01T10:00:00.000Z" }, checkers: [], approver: null },
};
const texts = (blocks: ReportBlock[]): string =>
  JSON.stringify(blocks.map((b) => (b.kind === "mohr" ? b.caption : b)));

describe("buildReportModel", () => {
  it("when built, then the sections come in the report's order: cover, scope, inputs, method, one per location, comparison, cautions", () => {
    const model = buildReportModel(content(), draft);
    expect(model.sections.map((s) => s.id)).toEqual([
      "cover",
      "scope",
      "inputs",
      "method",
      "location-1",
      "location-2",
      "comparison",
      "cautions",
    ]);
    expect(model.sections.filter((s) => s.id.startsWith("location")).every((s) => s.pageBreakBefore)).toBe(
      true,
    );
  });

  it("when built twice from the same content, then the models are equal and the content is not changed (pure)", () => {
    const c = content();
    const before = JSON.stringify(c);
    expect(buildReportModel(c, draft)).toEqual(buildReportModel(c, draft));
    expect(JSON.stringify(c)).toBe(before);
  });

  it("when a plane state σx 90, σy −30, τxy 40 MPa is reported, then σ1, σ3 and σ1's direction follow the plane-stress transformation (recalled from memory)", () => {
    const section = buildReportModel(content(), draft).sections.find((s) => s.id === "location-1")!;
    const principal = section.blocks.find(
      (b): b is Extract<ReportBlock, { kind: "table" }> =>
        b.kind === "table" && b.columns[0].title === "Principal",
    )!;
    expect(principal.rows[0][1]).toBe(fixed(centre + radius, 1));
    expect(principal.rows[2][1]).toBe(fixed(centre - radius, 1));
    const [x, y, z] = [Math.cos(thetaP), Math.sin(thetaP), 0].map((v) => fixed(v, 3));
    expect(principal.rows[0][2]).toBe(`(${x}, ${y}, ${z})`);
  });

  it("when a state is reported, then its Mohr figure comes from core/diagrams with σ3 left of σ2 left of σ1 and τmax = (σ1 − σ3)/2 (Mohr's circle, recalled from memory)", () => {
    const section = buildReportModel(content(), draft).sections.find((s) => s.id === "location-1")!;
    const figure = section.blocks.find(
      (b): b is Extract<ReportBlock, { kind: "mohr" }> => b.kind === "mohr",
    )!.figure;
    const at = (name: string) => figure.principal.find((p) => p.text === name)!.cx;
    expect(at("σ3")).toBeLessThan(at("σ2"));
    expect(at("σ2")).toBeLessThan(at("σ1"));
    expect(Number(figure.maxShear.text.replace("τmax = ", ""))).toBeCloseTo(radius, 1);
    expect(figure.halfDisks).toHaveLength(3);
  });

  it("when the project is in US units, then stresses are written in ksi (1 psi = 6894.757 Pa, NIST SP 811; recalled from memory)", () => {
    const model = buildReportModel(content("US"), draft);
    expect(model.unit).toBe("ksi");
    const section = model.sections.find((s) => s.id === "location-1")!;
    const components = section.blocks.find(
      (b): b is Extract<ReportBlock, { kind: "table" }> =>
        b.kind === "table" && b.columns[0].title.startsWith("σx"),
    )!;
    expect(components.columns[0].title).toBe("σx, ksi");
    expect(Number(components.rows[0][0])).toBeCloseTo((90 * MPA) / 6894757, 2);
  });

  it("when the report is a draft, then it carries the draft watermark and its pages name the draft; a record names its number, revision and id and has no watermark", () => {
    const d = buildReportModel(content(), draft);
    expect(d.watermark).toBe(DRAFT_WATERMARK);
    expect(d.pageIdentifier).toContain("DRAFT of Nozzle N2");
    const r = buildReportModel(content(), recordMeta);
    expect(r.watermark).toBeNull();
    expect(r.pageIdentifier).toBe("Record CR-0012 rev. A · c17d9cfd-8fa0-4cef-9e7d-60819203b4c5");
    const cover = texts(r.sections[0].blocks);
    expect(cover).toContain("0f".repeat(32));
    expect(cover).toContain("not signed");
  });

  it("when the comparison has a governing check, then the comparison section states governingSentence's words and the cautions close the report", () => {
    const model = buildReportModel(content(), draft);
    expect(texts(model.sections.find((s) => s.id === "comparison")!.blocks)).toContain(
      governingSentence(governing),
    );
    const cautions = texts(model.sections.at(-1)!.blocks);
    expect(cautions).toContain(RESULTS_CAUTION);
    expect(cautions).toContain(RESPONSIBILITY);
    expect(model.caution).toBe(RESULTS_CAUTION);
  });

  it("when a state carries the calculator it came from, then a section lists the calculator, its version and its inputs", () => {
    const c = content();
    const state = c.inputs.loadCases[0].states[0] as (typeof c.inputs.loadCases)[0]["states"][0] & {
      calculator?: unknown;
    };
    state.calculator = {
      name: "thin-wall",
      version: 1,
      inputs: {
        units: "si",
        numbers: { p: { value: 2, unit: "MPa" }, r: { value: 500, unit: "mm" } },
        choices: { shape: "cylinder" },
      },
    };
    const section = buildReportModel(c, draft).sections.find((s) => s.id === "calculators")!;
    const text = texts(section.blocks);
    expect(text).toContain("Operating at Nozzle neck: Thin-walled cylinder and sphere (version 1, units si)");
    expect(text).toContain('["p","2 MPa"]');
    expect(text).toContain('["shape","cylinder"]');
    expect(buildReportModel(content(), draft).sections.some((s) => s.id === "calculators")).toBe(false);
  });

  it("when a location uses a published grade, then the inputs list its standard and the note to verify it against the certificate", () => {
    const inputs = texts(buildReportModel(content(), draft).sections.find((s) => s.id === "inputs")!.blocks);
    expect(inputs).toContain("verify them against your material certificate");
    expect(inputs).toContain("Mill certificate 4711");
  });

  it("when the record holds a stress classification line and a point table, then each has a section after the comparison, in the order frozen, carrying the record's values as they are", () => {
    const c = content();
    // The values below are the record's own; the report repeats them (no computation here).
    c.results.linearizations = [
      {
        id: "c17b9cfd-8fa0-4cef-9e7d-6f8192a3b4c5",
        name: "Nozzle neck, inside to outside",
        caseId: ID.operating,
        caseName: "Operating",
        locationName: "Nozzle neck",
        category: "local membrane, primary",
        equivalent: "von-mises",
        stressUnit: "MPa",
        checks: [
          {
            rule: "PL ≤ 1.5 S",
            value: 151.25,
            limit: 207,
            ratio: 0.7307,
            verdict: "pass",
            source: "Check A",
          },
          {
            rule: "PL + Pb ≤ 1.5 S",
            value: 199.5,
            limit: 207,
            ratio: 0.9638,
            verdict: "close",
            source: "Check B",
          },
        ],
        governingRule: "PL + Pb ≤ 1.5 S",
      },
    ];
    c.results.pointTables = [
      {
        tableId: "d28c0d0e-9ab1-4d0f-8e8e-708192a3b4c6",
        fileName: "nozzle-fe.csv",
        caseId: ID.operating,
        caseName: "Operating",
        category: "operating",
        pointCount: 1204,
        material: { label: "Test plate", note: "Sy 250 MPa" },
        perCriterion: [
          {
            criterion: "von-mises",
            status: "evaluated",
            reason: null,
            governing: { index: 17, id: 1018, x: 12.5, y: 0, z: 3.25 },
            factor: 1.62,
            utilisation: 0.926,
            verdict: "close",
            requiredFactor: 1.5,
            category: null,
            countFail: 0,
            countClose: 3,
          },
        ],
      },
    ];
    c.pointTableFiles = [{ tableId: "d28c0d0e-9ab1-4d0f-8e8e-708192a3b4c6", sha256: "ab".repeat(32) }];
    c.linearizationEnds = [
      {
        id: "c17b9cfd-8fa0-4cef-9e7d-6f8192a3b4c5",
        lengthUnit: "mm",
        pointCount: 11,
        thickness: 12,
        start: [0, 0, 0],
        end: [12, 0, 0],
        equivalent: {
          label: "von Mises",
          membrane: 151.25,
          membranePlusBending: { start: 199.5, end: 103 },
          peak: { start: 4.5, end: 0 },
        },
      },
    ];
    const model = buildReportModel(recordContentSchema.parse(c), draft);
    const ids = model.sections.map((s) => s.id);
    expect(ids.slice(ids.indexOf("comparison"))).toEqual([
      "comparison",
      "linearizations",
      "point-tables",
      "cautions",
    ]);

    const lines = model.sections.find((s) => s.id === "linearizations")!;
    const lineTable = lines.blocks.find((b) => b.kind === "table")!;
    expect(lineTable.kind === "table" && lineTable.rows).toEqual([
      ["PL ≤ 1.5 S", "151.3", "207.0", "0.73", "✓ passes", "Check A"],
      ["PL + Pb ≤ 1.5 S", "199.5", "207.0", "0.96", "≈ close", "Check B"],
    ]);
    expect(texts(lines.blocks)).toContain('["Classification","local membrane, primary"]');
    expect(texts(lines.blocks)).toContain('["Governing check","PL + Pb ≤ 1.5 S"]');
    expect(texts(lines.blocks)).toContain(
      '["Line","from (0, 0, 0) to (12, 0, 0) mm; thickness 12 mm; 11 points"]',
    );
    const ends = lines.blocks.filter((b) => b.kind === "table")[1];
    expect(ends.kind === "table" && ends.columns[0].title).toBe("Equivalent stress (von Mises)");
    // One column of values aligned on the decimal point (the largest, 199.5, sets one decimal).
    expect(ends.kind === "table" && ends.rows).toEqual([
      ["Membrane (M)", "151.3", "151.3"],
      ["Membrane + bending (M + B)", "199.5", "103.0"],
      ["Peak", "4.5", "0.0"],
    ]);

    const tables = model.sections.find((s) => s.id === "point-tables")!;
    const text = texts(tables.blocks);
    expect(text).toContain('["File","nozzle-fe.csv"]');
    expect(text).toContain(`["SHA-256","${"ab".repeat(32)}"]`);
    expect(text).toContain('["Points","1204"]');
    const pointTable = tables.blocks.find((b) => b.kind === "table")!;
    expect(pointTable.kind === "table" && pointTable.rows).toEqual([
      ["von Mises", "1018", "(12.5, 0, 3.25)", "1.62", "1.50", "92.6 %", "≈ close", "0 / 3"],
    ]);
  });

  it("when the record holds neither lines nor point tables, then the report has no such sections", () => {
    const ids = buildReportModel(content(), draft).sections.map((s) => s.id);
    expect(ids).not.toContain("linearizations");
    expect(ids).not.toContain("point-tables");
  });

  it("when the record covers the whole project, then its cover and scope section say so with the project's counts", () => {
    const model = buildReportModel(content(), recordMeta);
    const sentence = "This record covers the whole project: 1 load case and 2 locations.";
    expect(texts(model.sections.find((s) => s.id === "cover")!.blocks)).toContain(sentence);
    expect(texts(model.sections.find((s) => s.id === "scope")!.blocks)).toContain(sentence);
    expect(JSON.stringify(model)).not.toContain("results outside it");
    const draftCover = texts(buildReportModel(content(), draft).sections[0].blocks);
    expect(draftCover).toContain("This draft covers the whole project: 1 load case and 2 locations.");
  });

  it("when the record covers chosen load cases and locations, then its cover and scope section say how many of how many, by name, and that results outside it are not part of it", () => {
    const whole = content();
    const subset = recordContentSchema.parse({
      ...whole,
      scope: {
        loadCases: [{ id: ID.operating, name: "Operating" }],
        locations: [{ id: ID.neck, name: "Nozzle neck" }],
        projectLoadCases: 3,
        projectLocations: 2,
      },
    });
    const model = buildReportModel(subset, recordMeta);
    const sentence =
      "This record covers 1 of 3 load cases (Operating) and 1 of 2 locations (Nozzle neck); results outside it are not part of this record.";
    expect(texts(model.sections.find((s) => s.id === "cover")!.blocks)).toContain(sentence);
    expect(texts(model.sections.find((s) => s.id === "scope")!.blocks)).toContain(sentence);
    expect(JSON.stringify(model)).not.toContain("covers the whole project");
  });
});
