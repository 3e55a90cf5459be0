import type { RecordContent } from "../../../../../core/contract/records";
import type { RecordDetail, RecordSummary } from "../../../entities/record/api-types";

/*
 * A small frozen record for the model tests: the CT-7 shell with one location, one load case
 * (uniaxial 165 MPa, a "close" Tresca check against SA-516 Grade 70) and one combination.
 * Every number is fictional, as in the demo.
 */

export const IDS = {
  project: "7a1c0000-0000-4000-8000-000000000001",
  workspace: "7a1c0000-0000-4000-8000-000000000002",
  location: "7a1c0000-0000-4000-8000-000000000003",
  hydro: "7a1c0000-0000-4000-8000-000000000004",
  combination: "7a1c0000-0000-4000-8000-000000000005",
  originator: "7a1c0000-0000-4000-8000-00000000000a",
  checker: "7a1c0000-0000-4000-8000-00000000000b",
  editor: "7a1c0000-0000-4000-8000-00000000000c",
};

export const HYDRO_ROW = `case:${IDS.hydro}:${IDS.location}`;
export const COMBINATION_ROW = `combination:${IDS.combination}:${IDS.location}`;

const MPA = 1e6;

const row = (
  rowId: string,
  kind: "load-case" | "combination",
  caseName: string,
  sx: number,
  factor: number,
) => ({
  rowId,
  kind,
  caseId: kind === "combination" ? IDS.combination : IDS.hydro,
  caseName,
  category: kind === "combination" ? "" : "test",
  locationId: IDS.location,
  locationName: "mid-shell",
  caseVersion: 6,
  stateRevision: kind === "combination" ? null : 6,
  allowable: { category: null, label: "project default" },
  material: { label: "SA-516 Grade 70", kind: "published" as const, note: "" },
  componentsPa: { xx: sx, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
  principalPa: [sx, 0, 0] as [number, number, number],
  vonMisesPa: sx,
  trescaPa: sx,
  maxShearPa: sx / 2,
  checks: [
    {
      status: "evaluated" as const,
      criterion: "tresca" as const,
      requiredFactor: 1.5,
      category: null,
      factor,
      utilisation: 1.5 / factor,
      verdict: factor >= 1.65 ? ("pass" as const) : factor >= 1.5 ? ("close" as const) : ("fail" as const),
      unsuited: null,
    },
    {
      status: "not-evaluated" as const,
      criterion: "max-principal" as const,
      requiredFactor: 2,
      category: null,
      missing: ["ultimate tension"],
      reason: "the material has no ultimate tension",
    },
  ],
});

export function recordContent(): RecordContent {
  const hydroRow = row(HYDRO_ROW, "load-case", "Hydrostatic test", 165 * MPA, 1.58);
  const governing = {
    criterion: "tresca" as const,
    rowId: HYDRO_ROW,
    caseName: "Hydrostatic test",
    locationName: "mid-shell",
    factor: 1.58,
    requiredFactor: 1.5,
    category: null,
    utilisation: 0.95,
    verdict: "close" as const,
  };
  return {
    format: "sigmacube.record",
    contentVersion: 1,
    engine: { name: "sigmacube-core", version: "0.1.0" },
    takenAt: "2026-12-01T10:00:00.000Z",
    project: { id: IDS.project, workspaceId: IDS.workspace, version: 9 },
    inputs: {
      format: "sigmacube.project",
      schemaVersion: 2,
      exportedAt: "2026-12-01T10:00:00.000Z",
      project: {
        name: "CT-7 shell",
        description: "",
        unitSystem: "SI",
        requirements: [
          { criterion: "tresca", requiredFactor: 1.5 },
          { criterion: "max-principal", requiredFactor: 2 },
        ],
        categoryRequirements: [{ category: "test", factors: { tresca: 1.25 } }],
        includeUnsuitedCriteria: false,
        defaultMaterial: { kind: "published", id: "sa516-70" },
      },
      materials: [],
      locations: [{ key: "L1", name: "mid-shell", note: "", material: null }],
      loadCases: [
        {
          key: "C1",
          name: "Hydrostatic test",
          category: "test",
          description: "",
          states: [
            {
              location: "L1",
              unit: "MPa",
              componentsPa: { xx: 165 * MPA, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
              source: "typed",
              note: "",
              calculator: null,
            },
          ],
        },
      ],
      combinations: [{ name: "Test + wind", description: "", terms: [{ loadCase: "C1", factor: 1.2 }] }],
    },
    ids: {
      materials: {},
      locations: { L1: IDS.location },
      loadCases: { C1: IDS.hydro },
    },
    stateRevisions: [
      {
        loadCase: "C1",
        location: "L1",
        revision: 6,
        savedAt: "2026-11-30T09:00:00.000Z",
        savedBy: IDS.editor,
      },
    ],
    results: {
      projectId: IDS.project,
      requirements: [
        { criterion: "tresca", requiredFactor: 1.5 },
        { criterion: "max-principal", requiredFactor: 2 },
      ],
      categoryRequirements: [],
      includeUnsuitedCriteria: false,
      rows: [hydroRow, row(COMBINATION_ROW, "combination", "Test + wind", 198 * MPA, 1.31)],
      governing: [governing],
      governingOverall: governing,
      governingByLocation: [],
      summary:
        "governs: Hydrostatic test at mid-shell, Tresca, SF 1.58 against 1.5 required (the project default)",
      skipped: [],
      cautions: [],
    },
  };
}

export const person = (id: string, name: string) => ({ id, name });

export function recordSummary(overrides: Partial<RecordSummary> = {}): RecordSummary {
  return {
    id: "7a1c0000-0000-4000-8000-0000000000r1",
    number: 1,
    revision: "A",
    status: "submitted",
    hash: "3fa9c0de",
    engineVersion: "0.1.0",
    reason: "First issue for check",
    requiredApprovals: 1,
    submittedBy: person(IDS.originator, "Ona Ferreby"),
    submittedAt: "2026-12-01T10:00:00.000Z",
    approvals: [],
    returned: null,
    approvedAt: null,
    scope: null,
    ...overrides,
  };
}

export function recordDetail(overrides: Partial<RecordDetail> = {}): RecordDetail {
  return { ...recordSummary(), content: recordContent(), comments: [], events: [], ...overrides };
}
