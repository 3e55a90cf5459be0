import { parsePointTable } from "../../core";
import type { Role } from "../../core/contract/workspaces";
import { Combination } from "../../db/models/combination";
import { CombinationTerm } from "../../db/models/combination-term";
import { Linearization } from "../../db/models/linearization";
import { LoadCase } from "../../db/models/load-case";
import { Location } from "../../db/models/location";
import { Material } from "../../db/models/material";
import { PointTable } from "../../db/models/point-table";
import { Project } from "../../db/models/project";
import { StressState } from "../../db/models/stress-state";
import { storePointTableContent } from "../../db/repositories/point-tables";
import { chunksOf } from "../../db/repositories/point-table-chunks";
import type { Actor, RoleFixture } from "./role-fixture";

/**
 * The role-matrix rows of the project area (projects, locations, load cases, materials, …),
 * spread into the table of test/api/role-matrix.test.ts. Each row's request builds what it
 * acts on in the fixture's fresh workspace, straight in the database.
 */
type Row = {
  who: "public" | "signed-in" | Role;
  ok: number;
  except?: Partial<Record<Actor, number>>;
  request: (f: RoleFixture) => Promise<{ path: string; body?: Record<string, unknown> }>;
};

type World = {
  projectId: string;
  locationId: string;
  loadCaseId: string;
  materialId: string;
  combinationId: string;
};

const worlds = new WeakMap<RoleFixture, Promise<World>>();

/** A project with one location, one load case with a state there, and a library material. */
export function projectWorld(f: RoleFixture): Promise<World> {
  if (!worlds.has(f)) {
    worlds.set(
      f,
      (async () => {
        const material = await Material.create({
          workspaceId: f.workspaceId,
          name: "Matrix steel",
          unit: "MPa",
          yieldPa: 300e6,
        });
        const project = await Project.create({
          workspaceId: f.workspaceId,
          name: "Matrix project",
          requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
          defaultMaterialId: material.id,
        });
        const location = await Location.create({ projectId: project.id, name: "weld toe" });
        const loadCase = await LoadCase.create({ projectId: project.id, name: "Lift" });
        await StressState.create({
          loadCaseId: loadCase.id,
          locationId: location.id,
          revision: 1,
          xxPa: 100e6,
          yyPa: 0,
          zzPa: 0,
          xyPa: 0,
          yzPa: 0,
          zxPa: 0,
          unit: "MPa",
          source: "typed",
        });
        const combination = await Combination.create({ projectId: project.id, name: "1.5 × lift" });
        await CombinationTerm.create({
          combinationId: combination.id,
          loadCaseId: loadCase.id,
          factor: 1.5,
          position: 0,
        });
        return {
          projectId: project.id,
          locationId: location.id,
          loadCaseId: loadCase.id,
          materialId: material.id,
          combinationId: combination.id,
        };
      })(),
    );
  }
  return worlds.get(f)!;
}

const ws = (f: RoleFixture, rest = "") => `/api/workspaces/${f.workspaceId}${rest}`;
const inProject = async (f: RoleFixture, rest = "") =>
  ws(f, `/projects/${(await projectWorld(f)).projectId}${rest}`);
const mpaState = { unit: "MPa", components: { xx: 50, yy: 10, zz: 0, xy: 5, yz: 0, zx: 0 } };

export const projectAreaRows: Record<string, Row> = {
  "GET /api/workspaces/{workspaceId}/materials": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: ws(f, "/materials") }),
  },
  "POST /api/workspaces/{workspaceId}/materials": {
    who: "editor",
    ok: 201,
    request: async (f) => ({ path: ws(f, "/materials"), body: { name: "New steel", yield: 250 } }),
  },
  "GET /api/workspaces/{workspaceId}/materials/{materialId}": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: ws(f, `/materials/${(await projectWorld(f)).materialId}`) }),
  },
  "PATCH /api/workspaces/{workspaceId}/materials/{materialId}": {
    who: "editor",
    ok: 200,
    request: async (f) => ({
      path: ws(f, `/materials/${(await projectWorld(f)).materialId}`),
      body: { version: 1, yield: 310 },
    }),
  },
  "DELETE /api/workspaces/{workspaceId}/materials/{materialId}": {
    who: "editor",
    ok: 204,
    request: async (f) => ({ path: ws(f, `/materials/${(await projectWorld(f)).materialId}`) }),
  },

  "GET /api/workspaces/{workspaceId}/projects": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: ws(f, "/projects") }),
  },
  "POST /api/workspaces/{workspaceId}/projects": {
    who: "editor",
    ok: 201,
    request: async (f) => ({ path: ws(f, "/projects"), body: { name: "Made in matrix" } }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f) }),
  },
  "PATCH /api/workspaces/{workspaceId}/projects/{projectId}": {
    who: "editor",
    ok: 200,
    request: async (f) => ({ path: await inProject(f), body: { version: 1, name: "Renamed" } }),
  },
  "DELETE /api/workspaces/{workspaceId}/projects/{projectId}": {
    who: "editor",
    ok: 204,
    request: async (f) => ({ path: await inProject(f) }),
  },

  "GET /api/workspaces/{workspaceId}/projects/{projectId}/locations": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, "/locations") }),
  },
  "POST /api/workspaces/{workspaceId}/projects/{projectId}/locations": {
    who: "editor",
    ok: 201,
    request: async (f) => ({ path: await inProject(f, "/locations"), body: { name: "lug eye" } }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/locations/{locationId}": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, `/locations/${(await projectWorld(f)).locationId}`) }),
  },
  "PATCH /api/workspaces/{workspaceId}/projects/{projectId}/locations/{locationId}": {
    who: "editor",
    ok: 200,
    request: async (f) => ({
      path: await inProject(f, `/locations/${(await projectWorld(f)).locationId}`),
      body: { version: 1, note: "checked" },
    }),
  },
  "DELETE /api/workspaces/{workspaceId}/projects/{projectId}/locations/{locationId}": {
    who: "editor",
    ok: 204,
    request: async (f) => ({ path: await inProject(f, `/locations/${(await projectWorld(f)).locationId}`) }),
  },

  "GET /api/workspaces/{workspaceId}/projects/{projectId}/load-cases": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, "/load-cases") }),
  },
  "POST /api/workspaces/{workspaceId}/projects/{projectId}/load-cases": {
    who: "editor",
    ok: 201,
    request: async (f) => ({
      path: await inProject(f, "/load-cases"),
      body: {
        name: "Tilted lift",
        states: [{ locationId: (await projectWorld(f)).locationId, stress: mpaState }],
      },
    }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, `/load-cases/${(await projectWorld(f)).loadCaseId}`) }),
  },
  "PATCH /api/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}": {
    who: "editor",
    ok: 200,
    request: async (f) => ({
      path: await inProject(f, `/load-cases/${(await projectWorld(f)).loadCaseId}`),
      body: { version: 1, category: "lifting" },
    }),
  },
  "DELETE /api/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}": {
    who: "editor",
    ok: 204,
    request: async (f) => ({ path: await inProject(f, `/load-cases/${(await projectWorld(f)).loadCaseId}`) }),
  },
  "PUT /api/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}/states/{locationId}": {
    who: "editor",
    ok: 200,
    request: async (f) => {
      const w = await projectWorld(f);
      return {
        path: await inProject(f, `/load-cases/${w.loadCaseId}/states/${w.locationId}`),
        body: { version: 1, stress: mpaState },
      };
    },
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}/states/{locationId}/revisions":
    {
      who: "viewer",
      ok: 200,
      request: async (f) => {
        const w = await projectWorld(f);
        return { path: await inProject(f, `/load-cases/${w.loadCaseId}/states/${w.locationId}/revisions`) };
      },
    },

  ...linearizationRows(),

  "GET /api/workspaces/{workspaceId}/projects/{projectId}/combinations": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, "/combinations") }),
  },
  "POST /api/workspaces/{workspaceId}/projects/{projectId}/combinations": {
    who: "editor",
    ok: 201,
    request: async (f) => ({
      path: await inProject(f, "/combinations"),
      body: { name: "2 × lift", terms: [{ loadCaseId: (await projectWorld(f)).loadCaseId, factor: 2 }] },
    }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/combinations/{combinationId}": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({
      path: await inProject(f, `/combinations/${(await projectWorld(f)).combinationId}`),
    }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/combinations/{combinationId}/results": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({
      path: await inProject(f, `/combinations/${(await projectWorld(f)).combinationId}/results`),
    }),
  },
  "PATCH /api/workspaces/{workspaceId}/projects/{projectId}/combinations/{combinationId}": {
    who: "editor",
    ok: 200,
    request: async (f) => ({
      path: await inProject(f, `/combinations/${(await projectWorld(f)).combinationId}`),
      body: { version: 1, name: "Renamed" },
    }),
  },
  "DELETE /api/workspaces/{workspaceId}/projects/{projectId}/combinations/{combinationId}": {
    who: "editor",
    ok: 204,
    request: async (f) => ({
      path: await inProject(f, `/combinations/${(await projectWorld(f)).combinationId}`),
    }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/comparison": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, "/comparison") }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/report.pdf": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, "/report.pdf") }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/report-content": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, "/report-content") }),
  },

  "GET /api/workspaces/{workspaceId}/audit": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: ws(f, "/audit") }),
  },
  "GET /api/workspaces/{workspaceId}/trash": {
    who: "editor",
    ok: 200,
    request: async (f) => ({ path: ws(f, "/trash") }),
  },
  "POST /api/workspaces/{workspaceId}/trash/{kind}/{itemId}/restore": {
    who: "editor",
    ok: 204,
    request: async (f) => ({ path: ws(f, `/trash/load-case/${await trashedCase(f)}/restore`) }),
  },
  "DELETE /api/workspaces/{workspaceId}/trash/{kind}/{itemId}": {
    who: "owner",
    ok: 204,
    request: async (f) => ({ path: ws(f, `/trash/load-case/${await trashedCase(f)}`) }),
  },
  "GET /api/workspaces/{workspaceId}/projects/{projectId}/export": {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await inProject(f, "/export") }),
  },
  "POST /api/workspaces/{workspaceId}/project-imports": {
    who: "editor",
    ok: 201,
    request: async (f) => ({
      path: ws(f, "/project-imports"),
      body: {
        format: "sigmacube.project",
        schemaVersion: 1,
        exportedAt: new Date().toISOString(),
        project: {
          name: "Imported in matrix",
          description: "",
          unitSystem: "SI",
          requirements: [{ criterion: "tresca", requiredFactor: 1.5 }],
          defaultMaterial: null,
        },
        materials: [],
        locations: [],
        loadCases: [],
        combinations: [],
      },
    }),
  },
};

/** A load case of the fixture's project, already in the trash. */
async function trashedCase(f: RoleFixture): Promise<string> {
  const w = await projectWorld(f);
  const c = await LoadCase.create({
    projectId: w.projectId,
    name: "Deleted by mistake",
    deletedAt: new Date(),
  });
  return c.id;
}

/** A stress classification line body: a uniform 100 MPa hoop stress through a 10 mm wall. */
const lineBody = {
  name: "Matrix line",
  path: {
    positions: "distance",
    lengthUnit: "mm",
    stressUnit: "MPa",
    lineDirection: [1, 0, 0],
    points: [0, 5, 10].map((distance) => ({ distance, xx: 0, yy: 100, zz: 0, xy: 0, yz: 0, zx: 0 })),
  },
  classification: { membrane: "general", stresses: "primary" },
  allowables: { source: "typed", S: 150 },
};

/** A line saved straight in the database under the fixture's load case (a fresh one per request). */
async function savedLine(f: RoleFixture): Promise<string> {
  const w = await projectWorld(f);
  const line = await Linearization.create({
    projectId: w.projectId,
    loadCaseId: w.loadCaseId,
    name: "Stored line",
    input: {
      path: { ...lineBody.path },
      secondAxis: null,
      classification: lineBody.classification,
      allowables: { source: "typed", S: 150, Sy: null, Su: null, timeDependent: false },
      equivalent: "von-mises",
      bending: "annex-5a",
    },
    summary: {
      classification: lineBody.classification,
      equivalent: "von-mises",
      stressUnit: "MPa",
      pointCount: 3,
      checks: [],
      allowables: { S: 150, Sy: null, Su: null, timeDependent: false, note: "S, Sy and Su as typed." },
    },
  });
  return line.id;
}

/** A ready point table with coordinates under the fixture's load case: three nodes along x. */
async function tableWithCoordinates(f: RoleFixture): Promise<string> {
  const w = await projectWorld(f);
  const csv = "x,y,z,xx,yy,zz,xy,yz,zx\n0,0,0,0,100,0,0,0,0\n5,0,0,0,100,0,0,0,0\n10,0,0,0,100,0,0,0,0\n";
  const layout = { separator: ",", decimal: ".", skipRows: 0, header: true } as const;
  const columns = { x: 0, y: 1, z: 2, xx: 3, yy: 4, zz: 5, xy: 6, yz: 7, zx: 8 };
  const table = await PointTable.create({
    projectId: w.projectId,
    loadCaseId: w.loadCaseId,
    fileName: "matrix-wall.csv",
    sizeBytes: csv.length,
    sha256: "0".repeat(64),
    layout,
    columns,
    unit: "MPa",
    idKind: "number",
  });
  const parsed = parsePointTable(csv, { ...layout, columns, unit: "MPa" });
  await f.context.sequelize.transaction((transaction) =>
    storePointTableContent(
      table.id,
      { chunks: chunksOf(parsed), pointCount: parsed.count, hasCoordinates: true, badRows: parsed.badRows },
      transaction,
    ),
  );
  return table.id;
}

/** The rows of the linearization routes under …/load-cases/{loadCaseId}/linearizations. */
function linearizationRows(): Record<string, Row> {
  const base = "/api/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}/linearizations";
  const lines = async (f: RoleFixture, rest = "") =>
    inProject(f, `/load-cases/${(await projectWorld(f)).loadCaseId}/linearizations${rest}`);
  return {
    [`GET ${base}`]: { who: "viewer", ok: 200, request: async (f) => ({ path: await lines(f) }) },
    [`POST ${base}`]: {
      who: "editor",
      ok: 201,
      request: async (f) => ({ path: await lines(f), body: lineBody }),
    },
    [`POST ${base}/preview`]: {
      who: "viewer",
      ok: 200,
      request: async (f) => ({ path: await lines(f, "/preview"), body: lineBody }),
    },
    [`POST ${base}/path-from-point-table`]: {
      who: "viewer",
      ok: 200,
      request: async (f) => ({
        path: await lines(f, "/path-from-point-table"),
        body: { tableId: await tableWithCoordinates(f), start: [0, 0, 0], end: [10, 0, 0], tolerance: 0.1 },
      }),
    },
    [`GET ${base}/{linearizationId}`]: {
      who: "viewer",
      ok: 200,
      request: async (f) => ({ path: await lines(f, `/${await savedLine(f)}`) }),
    },
    [`PUT ${base}/{linearizationId}`]: {
      who: "editor",
      ok: 200,
      request: async (f) => ({
        path: await lines(f, `/${await savedLine(f)}`),
        body: { version: 1, ...lineBody },
      }),
    },
    [`DELETE ${base}/{linearizationId}`]: {
      who: "editor",
      ok: 204,
      request: async (f) => ({ path: await lines(f, `/${await savedLine(f)}`) }),
    },
  };
}
