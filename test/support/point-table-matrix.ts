import { createHash } from "node:crypto";
import { parsePointTable } from "../../core";
import type { Role } from "../../core/contract/workspaces";
import { PointTable } from "../../db/models/point-table";
import { storePointTableContent } from "../../db/repositories/point-tables";
import { chunksOf } from "../../db/repositories/point-table-chunks";
import type { Actor, RoleFixture } from "./role-fixture";
import { projectWorld } from "./project-area-matrix";

/**
 * The role-matrix rows of the point-table routes, spread into the table of
 * test/api/role-matrix.test.ts. Each row builds what it acts on in the fixture's fresh
 * workspace (the project world's load case), straight in the database.
 */
type Row = {
  who: "public" | "signed-in" | Role;
  ok: number;
  except?: Partial<Record<Actor, number>>;
  request: (
    f: RoleFixture,
  ) => Promise<{ path: string; body?: Record<string, unknown> | string; contentType?: string }>;
};

const CSV = "id,xx,yy,zz,xy,yz,zx\n1,100,0,0,0,0,0\n2,0,0,0,50,0,0\n";
const MAPPING = {
  layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
  columns: { id: 0, xx: 1, yy: 2, zz: 3, xy: 4, yz: 5, zx: 6 },
  unit: "MPa",
  idKind: "number",
} as const;
const declaration = {
  fileName: "matrix.csv",
  sizeBytes: Buffer.byteLength(CSV),
  sha256: createHash("sha256").update(CSV).digest("hex"),
  ...MAPPING,
};

/** A table of the world's load case: awaiting its content, or (with `ready`) holding CSV's two points. */
async function makeTable(f: RoleFixture, ready: boolean): Promise<string> {
  const world = await projectWorld(f);
  const table = await PointTable.create({
    projectId: world.projectId,
    loadCaseId: world.loadCaseId,
    fileName: declaration.fileName,
    sizeBytes: declaration.sizeBytes,
    sha256: declaration.sha256,
    layout: MAPPING.layout,
    columns: MAPPING.columns,
    unit: MAPPING.unit,
    idKind: MAPPING.idKind,
  });
  if (ready) {
    const parsed = parsePointTable(CSV, { ...MAPPING.layout, columns: MAPPING.columns, unit: "MPa" });
    await f.context.sequelize.transaction((transaction) =>
      storePointTableContent(
        table.id,
        {
          chunks: chunksOf(parsed),
          pointCount: parsed.count,
          hasCoordinates: false,
          badRows: parsed.badRows,
        },
        transaction,
      ),
    );
  }
  return table.id;
}

const tables = async (f: RoleFixture, rest = "") => {
  const world = await projectWorld(f);
  return `/api/workspaces/${f.workspaceId}/projects/${world.projectId}/load-cases/${world.loadCaseId}/point-tables${rest}`;
};
const readyTable = async (f: RoleFixture, rest = "") => tables(f, `/${await makeTable(f, true)}${rest}`);

const base = "/api/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}/point-tables";

export const pointTableRows: Record<string, Row> = {
  [`GET ${base}`]: { who: "viewer", ok: 200, request: async (f) => ({ path: await tables(f) }) },
  [`POST ${base}`]: {
    who: "editor",
    ok: 201,
    request: async (f) => ({ path: await tables(f), body: { ...declaration } }),
  },
  [`PUT ${base}/{tableId}/content`]: {
    who: "editor",
    ok: 200,
    request: async (f) => ({
      path: await tables(f, `/${await makeTable(f, false)}/content`),
      body: CSV,
      contentType: "text/csv",
    }),
  },
  [`GET ${base}/{tableId}`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await readyTable(f) }),
  },
  [`GET ${base}/{tableId}/columns`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await readyTable(f, "/columns") }),
  },
  [`GET ${base}/{tableId}/ids`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await readyTable(f, "/ids") }),
  },
  [`GET ${base}/{tableId}/download`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await readyTable(f, "/download") }),
  },
  [`DELETE ${base}/{tableId}`]: {
    who: "editor",
    ok: 204,
    request: async (f) => ({ path: await readyTable(f) }),
  },
  [`POST ${base}/{tableId}/keep`]: {
    who: "editor",
    ok: 201,
    request: async (f) => ({ path: await readyTable(f, "/keep"), body: { points: [2] } }),
  },
};
