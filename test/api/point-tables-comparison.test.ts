import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { comparisonPageSchema } from "../../core/contract/comparison";
import { keepPointsResponseSchema, pointTableDetailSchema } from "../../core/contract/point-tables";
import { buildTestApp } from "../support/app";
import { projectTeam, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

const sha256 = (text: string) => createHash("sha256").update(text).digest("hex");

/** Yield strength of the test material, MPa (an invented library material). */
const SY = 250;

/**
 * Three points in MPa; against Sy = 250 MPa and a required factor of 1.5:
 * - id 10, uniaxial 100: σvm = σ1 − σ3 = 100 (uniaxial, common practice, no source) → n = 2.5;
 * - id 20, pure shear τ = 100 at (5, 6, 7): σvm = √3·τ, σ1 − σ3 = 2τ (pure-shear Mohr's circle,
 *   handbook formula, recalled from memory) → n_tresca = 1.25, u = 1.2: fails and governs;
 * - id 30, uniaxial 50 → n = 5.
 */
const CSV =
  "id;x;y;z;xx;yy;zz;xy;yz;zx\n10;0;0;0;100;0;0;0;0;0\n20;5;6;7;0;0;0;100;0;0\n30;1;1;1;50;0;0;0;0;0\n";

let team: ProjectTeam;
let projectPath: string;
let projectVersion: number;
let casePath: string;
let tableId: string;

async function comparison() {
  const r = await team.viewer.agent.get(`${projectPath}/comparison`).expect(200);
  return comparisonPageSchema.parse(r.body);
}

beforeAll(async () => {
  team = await projectTeam(app);
  const material = await team.editor.agent
    .post(wsPath(team, "/materials"))
    .send({ name: "Nozzle forging (invented)", yield: SY })
    .expect(201);
  const project = await team.editor.agent
    .post(wsPath(team, "/projects"))
    .send({
      name: "Nozzle FE comparison",
      requirements: [
        { criterion: "von-mises", requiredFactor: 1.5 },
        { criterion: "tresca", requiredFactor: 1.5 },
      ],
      defaultMaterial: { kind: "workspace", id: material.body.material.id },
    })
    .expect(201);
  projectPath = wsPath(team, `/projects/${project.body.project.id}`);
  projectVersion = project.body.project.version;
  const loadCase = await team.editor.agent
    .post(`${projectPath}/load-cases`)
    .send({ name: "Hydrotest", category: "test" })
    .expect(201);
  casePath = `${projectPath}/load-cases/${loadCase.body.loadCase.id}/point-tables`;
  const declared = await team.editor.agent
    .post(casePath)
    .send({
      fileName: "n2.csv",
      sizeBytes: Buffer.byteLength(CSV),
      sha256: sha256(CSV),
      layout: { separator: ";", header: true },
      columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
      unit: "MPa",
    })
    .expect(201);
  tableId = declared.body.id;
  await team.editor.agent
    .put(`${casePath}/${tableId}/content`)
    .set("Content-Type", "application/octet-stream")
    .send(Buffer.from(CSV))
    .expect(200);
});

describe("point tables in the comparison", () => {
  it("when the project has a table, then the comparison lists it per criterion and its governing point governs the project", async () => {
    const c = await comparison();
    expect(c.pointTables).toHaveLength(1);
    const t = c.pointTables![0];
    expect(t).toMatchObject({
      tableId,
      fileName: "n2.csv",
      caseName: "Hydrotest",
      category: "test",
      pointCount: 3,
    });
    const tresca = t.perCriterion.find((p) => p.criterion === "tresca")!;
    expect(tresca.governing).toMatchObject({ id: 20, x: 5, y: 6, z: 7 });
    expect(tresca.factor).toBeCloseTo(SY / 200, 12);
    expect(tresca).toMatchObject({ verdict: "fail", requiredFactor: 1.5, countFail: 1, countClose: 0 });
    // no location has a state yet, so the table's point governs
    expect(c.governingOverall).toMatchObject({ criterion: "tresca", caseName: "Hydrotest" });
    expect(c.summary).toContain('point 20 of "n2.csv"');
  });

  it("when the project's required factor changes, then the table is evaluated again against it", async () => {
    const patched = await team.editor.agent.patch(projectPath).send({
      version: projectVersion,
      requirements: [
        { criterion: "von-mises", requiredFactor: 1.1 },
        { criterion: "tresca", requiredFactor: 1.1 },
      ],
    });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    const t = (await comparison()).pointTables![0];
    const tresca = t.perCriterion.find((p) => p.criterion === "tresca")!;
    expect(tresca.requiredFactor).toBe(1.1);
    expect(tresca.utilisation).toBeCloseTo(1.1 / (SY / 200), 12);
    expect(tresca.verdict).toBe("pass");
    const detail = pointTableDetailSchema.parse((await team.viewer.agent.get(`${casePath}/${tableId}`)).body);
    expect(detail.evaluation!.perCriterion[1].requiredFactor).toBe(1.1);
  });

  it("when the governing point is kept as a location, then it is a row of the comparison with the point's state", async () => {
    const kept = await team.editor.agent
      .post(`${casePath}/${tableId}/keep`)
      .send({ points: [20], namePrefix: "N2 node" });
    expect(kept.status, JSON.stringify(kept.body)).toBe(201);
    const { locations } = keepPointsResponseSchema.parse(kept.body);
    expect(locations.map((l) => l.name)).toEqual(["N2 node 20"]);
    const c = await comparison();
    const row = c.rows.find((r) => r.locationId === locations[0].id)!;
    expect(row).toMatchObject({ caseName: "Hydrotest", locationName: "N2 node 20" });
    expect(row.componentsPa).toEqual({ xx: 0, yy: 0, zz: 0, xy: 100e6, yz: 0, zx: 0 });
    const tresca = row.checks.find((k) => k.criterion === "tresca")!;
    expect(tresca.status === "evaluated" && tresca.factor).toBeCloseTo(SY / 200, 12);
    const loadCase = await team.viewer.agent.get(casePath.replace(/\/point-tables$/, "")).expect(200);
    const state = loadCase.body.loadCase.states.find(
      (s: { locationId: string }) => s.locationId === locations[0].id,
    );
    expect(state.source).toBe("finite-element point");
  });

  it("when a point the table does not hold is kept, then 400 names it and no location is made", async () => {
    const before = (await team.viewer.agent.get(`${projectPath}/locations`).expect(200)).body.locations
      .length;
    const r = await team.editor.agent.post(`${casePath}/${tableId}/keep`).send({ points: [10, 99] });
    expect(r.status).toBe(400);
    expect(r.body.error.details).toEqual([{ path: "points.1", message: "is not a point of this table" }]);
    const after = (await team.viewer.agent.get(`${projectPath}/locations`).expect(200)).body.locations.length;
    expect(after).toBe(before);
  });

  it("when no points or more than 50 are named, or a viewer asks, then it is refused", async () => {
    const none = await team.editor.agent.post(`${casePath}/${tableId}/keep`).send({ points: [] });
    expect(none.status).toBe(400);
    expect(none.body.error.details[0].path).toBe("points");
    const many = await team.editor.agent
      .post(`${casePath}/${tableId}/keep`)
      .send({ points: Array.from({ length: 51 }, (_, i) => i) });
    expect(many.status).toBe(400);
    expect(many.body.error.details[0].message).toContain("keepPerRequest");
    await team.viewer.agent
      .post(`${casePath}/${tableId}/keep`)
      .send({ points: [10] })
      .expect(403);
  });

  it("when the table is deleted, then the comparison no longer lists it", async () => {
    expect((await comparison()).pointTables).toHaveLength(1);
    await team.editor.agent.delete(`${casePath}/${tableId}`).expect(204);
    const c = await comparison();
    expect(c.pointTables).toEqual([]);
    expect(c.summary).not.toContain("n2.csv");
  });
});
