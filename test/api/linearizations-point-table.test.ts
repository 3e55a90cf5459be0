import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  linearizationPreviewSchema,
  pathFromPointTableResponseSchema,
} from "../../core/contract/linearizations";
import { pointTableSchema } from "../../core/contract/point-tables";
import { buildTestApp } from "../support/app";
import { projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

const sha256 = (text: string) => createHash("sha256").update(text).digest("hex");

/**
 * A wall 10 mm thick along global x (y = z = 0), its nodes at x = 0 … 10 in the table in reverse
 * order, with a linear hoop stress σyy = 200 − 20·x + 12.5 MPa: membrane 112.5 and bending ±100 MPa
 * (a linear distribution is membrane + bending, common practice, no source). Node 5 is listed twice
 * (once per element around it) with σyy 10 MPa above and below its value, so the mean keeps the line
 * linear. Ten decoy nodes 2 mm beside the wall must not be picked.
 */
function wallTable(): string {
  const rows = ["id,x,y,z,sxx,syy,szz,sxy,syz,szx"];
  for (let i = 10; i >= 0; i--) {
    const syy = 212.5 - 20 * i;
    if (i === 5) {
      rows.push(`${100 + i},${i},0,0,-1,${syy + 10},50,0,0,0`);
      rows.push(`${200 + i},${i},0,0,-1,${syy - 10},50,0,0,0`);
    } else rows.push(`${100 + i},${i},0,0,-1,${syy},50,0,0,0`);
  }
  for (let i = 0; i < 10; i++) rows.push(`${300 + i},${i + 0.5},2,0,999,999,999,0,0,0`);
  return rows.join("\n") + "\n";
}

const COLUMNS = { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 };

let team: ProjectTeam;
let casePath: string;
let withXyz: string;
let withoutXyz: string;

async function upload(text: string, columns: Record<string, number>): Promise<string> {
  const declared = await team.editor.agent.post(`${casePath}/point-tables`).send({
    fileName: "wall-nodes.csv",
    sizeBytes: Buffer.byteLength(text),
    sha256: sha256(text),
    layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
    columns,
    unit: "MPa",
    idKind: "number",
  });
  expect(declared.status, JSON.stringify(declared.body)).toBe(201);
  const put = await team.editor.agent
    .put(`${casePath}/point-tables/${declared.body.id}/content`)
    .set("Content-Type", "text/csv")
    .send(text);
  expect(put.status, JSON.stringify(put.body)).toBe(200);
  return pointTableSchema.parse(put.body).id;
}

const pick = (body: Record<string, unknown>, agent = team.editor.agent) =>
  agent.post(`${casePath}/linearizations/path-from-point-table`).send(body);

const fieldsOf = (r: { body: { error: { details: { path: string }[] } } }) =>
  r.body.error.details.map((d) => d.path);

beforeAll(async () => {
  team = await projectTeam(app);
  const { projectId } = await projectWithLocations(team, { name: "Picked lines" }, []);
  const c = await team.editor.agent
    .post(wsPath(team, `/projects/${projectId}/load-cases`))
    .send({ name: "Design pressure" })
    .expect(201);
  casePath = wsPath(team, `/projects/${projectId}/load-cases/${c.body.loadCase.id}`);
  withXyz = await upload(wallTable(), COLUMNS);
  const plain = "sxx,syy,szz,sxy,syz,szx\n1,2,3,0,0,0\n4,5,6,0,0,0\n";
  withoutXyz = await upload(plain, { xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 });
});

describe("picking a path from a stored point table", () => {
  it("when the ends and a tolerance are given, then the nodes on the line come back sorted along it in the table's unit, coincident nodes merged, decoys left out", async () => {
    const r = await pick({ tableId: withXyz, start: [0, 0, 0], end: [10, 0, 0], tolerance: 0.1 });
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    const picked = pathFromPointTableResponseSchema.parse(r.body);
    expect(picked.found).toBe(12);
    expect(picked.pointCount).toBe(11);
    expect(picked.table.unit).toBe("MPa");
    expect(picked.path).not.toBeNull();
    const path = picked.path!;
    expect(path.points.map((p) => p.distance)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(path.points[0].yy).toBe(212.5);
    expect(path.points[5].yy).toBe(112.5);
    expect(path.lineDirection).toEqual([1, 0, 0]);
    expect(picked.notes.join(" ")).toMatch(/mean of their tensors/);
    expect(picked.warnings).toEqual([]);

    // The picked path, as the form sends it, linearizes to the linear wall's membrane and bending.
    const preview = await team.editor.agent.post(`${casePath}/linearizations/preview`).send({
      name: "Picked wall",
      path,
      secondAxis: [0, 1, 0],
      classification: { membrane: "local", stresses: "primary" },
      allowables: { source: "typed", S: 138 },
    });
    expect(preview.status, JSON.stringify(preview.body)).toBe(200);
    const { result } = linearizationPreviewSchema.parse(preview.body);
    expect(result.membrane[1]).toBeCloseTo(112.5, 9);
    expect(result.bending.start[1]).toBeCloseTo(100, 9);
    expect(result.peak.end[1]).toBeCloseTo(0, 9);
  });

  it("when the ends are given the other way round, then the path runs from the outside in", async () => {
    const r = await pick({ tableId: withXyz, start: [10, 0, 0], end: [0, 0, 0], tolerance: 0.1 });
    const picked = pathFromPointTableResponseSchema.parse(r.body);
    expect(picked.path!.points[0].yy).toBe(12.5);
    expect(picked.path!.lineDirection).toEqual([-1, 0, 0]);
  });

  it("when the tolerance takes in fewer than three nodes, then 200 says how many, warns, and gives no path", async () => {
    const r = await pick({ tableId: withXyz, start: [0, 0, 5], end: [10, 0, 5], tolerance: 0.1 });
    expect(r.status).toBe(200);
    const picked = pathFromPointTableResponseSchema.parse(r.body);
    expect(picked.pointCount).toBe(0);
    expect(picked.path).toBeNull();
    expect(picked.warnings[0]).toMatch(/needs at least 3/);
  });

  it("when a viewer picks, then it is allowed (nothing is saved); an outsider gets 404", async () => {
    await pick(
      { tableId: withXyz, start: [0, 0, 0], end: [10, 0, 0], tolerance: 0.1 },
      team.viewer.agent,
    ).expect(200);
    await pick(
      { tableId: withXyz, start: [0, 0, 0], end: [10, 0, 0], tolerance: 0.1 },
      team.outsider.agent,
    ).expect(404);
  });
});

describe("refusing a pick (400 naming the field)", () => {
  it("when the table has no x y z columns, then 400 names tableId and says why", async () => {
    const r = await pick({ tableId: withoutXyz, start: [0, 0, 0], end: [1, 0, 0], tolerance: 0.1 });
    expect(r.status).toBe(400);
    expect(fieldsOf(r)).toEqual(["tableId"]);
    expect(JSON.stringify(r.body)).toMatch(/no x y z columns/);
  });

  it("when the table is not one of this load case's, then 400 names tableId", async () => {
    const r = await pick({
      tableId: "00000000-0000-4000-8000-000000000000",
      start: [0, 0, 0],
      end: [1, 0, 0],
      tolerance: 0.1,
    });
    expect(r.status).toBe(400);
    expect(fieldsOf(r)).toEqual(["tableId"]);
  });

  it("when the two ends coincide, then 400 names end; a zero tolerance names tolerance; an end of two numbers names start", async () => {
    const same = await pick({ tableId: withXyz, start: [1, 2, 3], end: [1, 2, 3], tolerance: 0.1 });
    expect(same.status).toBe(400);
    expect(fieldsOf(same)).toEqual(["end"]);
    const zero = await pick({ tableId: withXyz, start: [0, 0, 0], end: [1, 0, 0], tolerance: 0 });
    expect(fieldsOf(zero)).toEqual(["tolerance"]);
    const short = await pick({ tableId: withXyz, start: [0, 0], end: [1, 0, 0], tolerance: 0.1 });
    expect(fieldsOf(short)[0]).toMatch(/^start/);
    const missing = await pick({ start: [0, 0, 0], end: [1, 0, 0], tolerance: 0.1 });
    expect(fieldsOf(missing)).toEqual(["tableId"]);
  });

  it("when a pick was refused, then the table's points are still there", async () => {
    const r = await pick({ tableId: withXyz, start: [0, 0, 0], end: [10, 0, 0], tolerance: 0.1 });
    expect(pathFromPointTableResponseSchema.parse(r.body).found).toBe(12);
  });
});
