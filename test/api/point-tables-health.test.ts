import { createHash } from "node:crypto";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { pointTableDetailSchema } from "../../core/contract/point-tables";
import { buildTestApp } from "../support/app";
import { projectTeam, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

/** Points in the table: several stored chunks, and a few hundred milliseconds of evaluation at least. */
const POINTS = 400_000;

/** A generated table: id, x y z and six components in MPa from a seeded sequence (no physics needed here). */
function generatedCsv(): string {
  let seed = 12345;
  const next = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed / 2147483648;
  };
  const lines = ["id,x,y,z,xx,yy,zz,xy,yz,zx"];
  for (let i = 1; i <= POINTS; i++) {
    const c = Array.from({ length: 6 }, () => (200 * next() - 100).toFixed(3));
    lines.push(`${i},${(i % 100) * 0.5},${Math.floor(i / 100) * 0.5},0,${c.join(",")}`);
  }
  return lines.join("\n") + "\n";
}

let team: ProjectTeam;
let projectPath: string;
let projectVersion: number;
let tablePath: string;

beforeAll(async () => {
  team = await projectTeam(app);
  const project = await team.editor.agent
    .post(wsPath(team, "/projects"))
    .send({
      name: "Large table",
      requirements: [
        { criterion: "von-mises", requiredFactor: 1.5 },
        { criterion: "tresca", requiredFactor: 1.5 },
      ],
      defaultMaterial: { kind: "published", id: "sa516-70" },
    })
    .expect(201);
  projectPath = wsPath(team, `/projects/${project.body.project.id}`);
  projectVersion = project.body.project.version;
  const loadCase = await team.editor.agent
    .post(`${projectPath}/load-cases`)
    .send({ name: "Design", category: "design" })
    .expect(201);
  const casePath = `${projectPath}/load-cases/${loadCase.body.loadCase.id}/point-tables`;
  const text = generatedCsv();
  const declared = await team.editor.agent
    .post(casePath)
    .send({
      fileName: "large.csv",
      sizeBytes: Buffer.byteLength(text),
      sha256: createHash("sha256").update(text).digest("hex"),
      layout: { separator: ",", header: true },
      columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
      unit: "MPa",
    })
    .expect(201);
  tablePath = `${casePath}/${declared.body.id}`;
  const put = await team.editor.agent.put(`${tablePath}/content`).set("Content-Type", "text/csv").send(text);
  expect(put.status, JSON.stringify(put.body).slice(0, 500)).toBe(200);
  expect(put.body.pointCount).toBe(POINTS);
}, 120_000);

describe("the API during a large evaluation", () => {
  it("when a table of 400,000 points is evaluated again, then /api/health keeps answering within 2 s meanwhile", async () => {
    // A new required factor makes the stored evaluation out of date: the next read evaluates again.
    await team.editor.agent
      .patch(projectPath)
      .send({
        version: projectVersion,
        requirements: [
          { criterion: "von-mises", requiredFactor: 1.6 },
          { criterion: "tresca", requiredFactor: 1.6 },
        ],
      })
      .expect(200);
    let done = false;
    const detail = team.viewer.agent.get(tablePath).then((r) => {
      done = true;
      return r;
    });
    const latencies: number[] = [];
    while (!done) {
      const began = performance.now();
      const health = await request(app).get("/api/health");
      if (done) break;
      expect(health.status).toBe(200);
      latencies.push(performance.now() - began);
    }
    const r = await detail;
    expect(r.status).toBe(200);
    const table = pointTableDetailSchema.parse(r.body);
    expect(table.evaluation!.perCriterion[0].requiredFactor).toBe(1.6);
    expect(table.evaluation!.histogram.counts.reduce((a, b) => a + b, 0)).toBe(POINTS);
    // Several health answers came back while the evaluation ran, none of them late.
    expect(latencies.length).toBeGreaterThanOrEqual(3);
    expect(Math.max(...latencies)).toBeLessThan(2000);
    console.log(
      `health answers during the evaluation: ${latencies.length}, slowest ${Math.max(...latencies).toFixed(0)} ms`,
    );
  }, 120_000);
});
