import { createHash } from "node:crypto";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POINT_TABLE_LIMITS } from "../../core/contract/limits";
import {
  pointTableDetailSchema,
  pointTableListSchema,
  pointTableSchema,
} from "../../core/contract/point-tables";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import { projectTeam, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

const sha256 = (text: string) => createHash("sha256").update(text).digest("hex");

/** Yield strength of the test material, MPa (an invented library material). */
const SY = 250;

/**
 * Four good points and one bad row, in MPa. Expected results by hand (von Mises and Tresca
 * against Sy = 250 MPa, required factor 1.5 — the "test" category's 1.5 replaces the default 2):
 * - id 1, uniaxial 100: σvm = 100 (uniaxial σvm = |σ|, common practice, no source) → n = 2.5;
 * - id 2, pure shear τ = 100: σvm = √3·τ = 173.2, σ1 − σ3 = 2τ = 200 (pure-shear Mohr's circle,
 *   handbook formula, recalled from memory) → n_vm = 1.443 (fails), n_tresca = 1.25 (fails);
 * - id 3, uniaxial 160 → n = 1.5625: within 10 % above 1.5, so "close" (the product's close band);
 * - line 5 ("abc") is a bad row;
 * - id 5, hydrostatic −50: σvm = 0 and σ1 − σ3 = 0 (common practice, no source) → n infinite.
 */
const CSV = [
  "id,x,y,z,sxx,syy,szz,sxy,syz,szx",
  "1,0,0,0,100,0,0,0,0,0",
  "2,1,0.5,0,0,0,0,100,0,0",
  "3,2,0,0,160,0,0,0,0,0",
  "4,3,0,0,abc,0,0,0,0,0",
  "5,4,0,0,-50,-50,-50,0,0,0",
  "",
].join("\n");

const MAPPING = {
  layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
  columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
  unit: "MPa",
  idKind: "number",
};

const declaration = (text: string, overrides: Record<string, unknown> = {}) => ({
  fileName: "nozzle-points.csv",
  sizeBytes: Buffer.byteLength(text),
  sha256: sha256(text),
  ...MAPPING,
  ...overrides,
});

let team: ProjectTeam;
let projectPath: string;
let casePath: string;

beforeAll(async () => {
  team = await projectTeam(app);
  const material = await team.editor.agent
    .post(wsPath(team, "/materials"))
    .send({ name: "Nozzle forging (invented)", yield: SY })
    .expect(201);
  const project = await team.editor.agent
    .post(wsPath(team, "/projects"))
    .send({
      name: "Nozzle FE",
      requirements: [
        { criterion: "von-mises", requiredFactor: 2 },
        { criterion: "tresca", requiredFactor: 2 },
      ],
      categoryRequirements: [{ category: "test", factors: { "von-mises": 1.5, tresca: 1.5 } }],
      defaultMaterial: { kind: "workspace", id: material.body.material.id },
    })
    .expect(201);
  projectPath = wsPath(team, `/projects/${project.body.project.id}`);
  casePath = await newCase("Hydrotest");
});

/** A new "test" load case of the project (each group of tests its own, below the table limit); its tables' path. */
async function newCase(name: string): Promise<string> {
  const loadCase = await team.editor.agent
    .post(`${projectPath}/load-cases`)
    .send({ name, category: "test" })
    .expect(201);
  return `${projectPath}/load-cases/${loadCase.body.loadCase.id}/point-tables`;
}

/** Declares and uploads `text` as a new table of the case at `casePath`; returns the PUT's answer. */
async function upload(text: string, overrides: Record<string, unknown> = {}) {
  const declared = await team.editor.agent.post(casePath).send(declaration(text, overrides));
  expect(declared.status, JSON.stringify(declared.body)).toBe(201);
  const put = await team.editor.agent
    .put(`${casePath}/${declared.body.id}/content`)
    .set("Content-Type", "text/csv")
    .send(text);
  expect(put.status, JSON.stringify(put.body)).toBe(200);
  return pointTableSchema.parse(put.body);
}

describe("declaring a point table", () => {
  it("when an editor declares a table, then it answers 201 awaiting its content with the mapping as sent", async () => {
    const r = await team.editor.agent.post(casePath).send(declaration(CSV));
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const table = pointTableSchema.parse(r.body);
    expect(table.status).toBe("awaiting-content");
    expect(table.pointCount).toBe(0);
    expect(table.columns).toEqual(MAPPING.columns);
    expect(table.sha256).toBe(sha256(CSV));
    expect(table.evaluation).toBeNull();
  });

  it("when a viewer or a reviewer declares a table, then it is refused with 403; an outsider gets 404", async () => {
    await team.viewer.agent.post(casePath).send(declaration(CSV)).expect(403);
    await team.reviewer.agent.post(casePath).send(declaration(CSV)).expect(403);
    await team.outsider.agent.post(casePath).send(declaration(CSV)).expect(404);
  });

  it("when the declaration has a bad hash, a column used twice and a decimal comma with comma separators, then 400 names each field", async () => {
    const r = await team.editor.agent.post(casePath).send(
      declaration(CSV, {
        sha256: "not-a-hash",
        columns: { ...MAPPING.columns, yy: 4 },
        layout: { separator: ",", decimal: ",", skipRows: 0, header: true },
      }),
    );
    expect(r.status).toBe(400);
    const paths = (r.body.error.details as { path: string }[]).map((d) => d.path).sort();
    expect(paths).toEqual(["columns.yy", "layout.decimal", "sha256"]);
  });

  it("when a component column is missing or the unit is unknown, then 400 names it", async () => {
    const { xx: _xx, ...withoutXx } = MAPPING.columns;
    const r = await team.editor.agent
      .post(casePath)
      .send(declaration(CSV, { columns: withoutXx, unit: "bar" }));
    expect(r.status).toBe(400);
    const paths = (r.body.error.details as { path: string }[]).map((d) => d.path).sort();
    expect(paths).toEqual(["columns.xx", "unit"]);
  });

  it("when the declared size is past the byte limit, then 413 names the limit and the field", async () => {
    const r = await team.editor.agent
      .post(casePath)
      .send(declaration(CSV, { sizeBytes: POINT_TABLE_LIMITS.bytesPerTable + 1 }));
    expect(r.status).toBe(413);
    expect(r.body.error.id).toBe("point_table_too_large");
    expect(r.body.error.details).toMatchObject({ limit: "bytesPerTable", path: "sizeBytes" });
    expect(r.body.error.message).toContain("bytesPerTable");
  });
});

describe("the number of tables", () => {
  it("when a load case already holds its most tables, then one more is refused with 400 naming the limit", async () => {
    const path = await newCase("Full");
    for (let i = 0; i < POINT_TABLE_LIMITS.tablesPerLoadCase; i++) {
      await team.editor.agent.post(path).send(declaration(CSV)).expect(201);
    }
    const r = await team.editor.agent.post(path).send(declaration(CSV));
    expect(r.status).toBe(400);
    expect(r.body.error.id).toBe("point_table_limit");
    expect(r.body.error.details).toMatchObject({
      limit: "tablesPerLoadCase",
      max: POINT_TABLE_LIMITS.tablesPerLoadCase,
      requested: POINT_TABLE_LIMITS.tablesPerLoadCase + 1,
    });
  });
});

describe("sending a table's content", () => {
  beforeAll(async () => {
    casePath = await newCase("Content");
  });

  it("when the file is sent, then the points are stored, bad rows reported by line, and each criterion's governing point matches the hand results", async () => {
    const table = await upload(CSV);
    expect(table.status).toBe("ready");
    expect(table.pointCount).toBe(4);
    expect(table.hasCoordinates).toBe(true);
    expect(table.badRows.count).toBe(1);
    expect(table.badRows.first[0].line).toBe(5);
    expect(table.badRows.first[0].reason).toContain("abc");
    const e = table.evaluation!;
    expect(e.countFail).toBe(1);
    expect(e.countClose).toBe(1);
    const vm = e.perCriterion.find((c) => c.criterion === "von-mises")!;
    expect(vm.requiredFactor).toBe(1.5);
    expect(vm.category).toBe("test");
    expect(vm.governing).toMatchObject({ id: 2, x: 1, y: 0.5, z: 0, verdict: "fail" });
    expect(vm.governing!.factor).toBeCloseTo(SY / (Math.sqrt(3) * 100), 12);
    expect(vm.countFail).toBe(1);
    expect(vm.countClose).toBe(1);
    const tresca = e.perCriterion.find((c) => c.criterion === "tresca")!;
    expect(tresca.governing!.id).toBe(2);
    expect(tresca.governing!.factor).toBeCloseTo(SY / 200, 12);
    expect(tresca.governing!.utilisation).toBeCloseTo(1.5 / (SY / 200), 12);
  });

  it("when the body's SHA-256 differs from the declared one, then 400 names sha256 and the table still awaits its content", async () => {
    const declared = await team.editor.agent.post(casePath).send(declaration(CSV)).expect(201);
    const altered = CSV.replace("100,0,0,0,0,0\n2", "101,0,0,0,0,0\n2");
    const r = await team.editor.agent
      .put(`${casePath}/${declared.body.id}/content`)
      .set("Content-Type", "text/plain")
      .send(altered);
    expect(r.status).toBe(400);
    expect(r.body.error.details[0].path).toBe("sha256");
    const after = await team.viewer.agent.get(`${casePath}/${declared.body.id}`).expect(200);
    expect(after.body.status).toBe("awaiting-content");
  });

  it("when the body is shorter or longer than declared, then 400 names sizeBytes", async () => {
    const declared = await team.editor.agent.post(casePath).send(declaration(CSV)).expect(201);
    const path = `${casePath}/${declared.body.id}/content`;
    const short = await team.editor.agent.put(path).set("Content-Type", "text/csv").send(CSV.slice(0, -3));
    expect(short.status).toBe(400);
    expect(short.body.error.details[0].path).toBe("sizeBytes");
    const long = await team.editor.agent.put(path).set("Content-Type", "text/csv").send(`${CSV}9\n`);
    expect(long.status).toBe(400);
    expect(long.body.error.details[0].path).toBe("sizeBytes");
  });

  it("when the content is sent as JSON, then 415 says which types are accepted", async () => {
    const declared = await team.editor.agent.post(casePath).send(declaration(CSV)).expect(201);
    const r = await team.editor.agent.put(`${casePath}/${declared.body.id}/content`).send({ text: CSV });
    expect(r.status).toBe(415);
    expect(r.body.error.message).toContain("text/csv");
  });

  it("when no row can be read with the mapping, then 400 names the content and the first bad line", async () => {
    const text = "a;b\n1;2\n";
    const declared = await team.editor.agent
      .post(casePath)
      .send(
        declaration(text, {
          layout: { separator: ";", header: false },
          columns: { xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 },
        }),
      )
      .expect(201);
    const r = await team.editor.agent
      .put(`${casePath}/${declared.body.id}/content`)
      .set("Content-Type", "text/plain")
      .send(text);
    expect(r.status).toBe(400);
    expect(r.body.error.details[0].path).toBe("content");
    expect(r.body.error.details[0].message).toContain("line 1");
  });

  it("when content is sent twice, then the second is refused with 409 and the stored points stay", async () => {
    const table = await upload(CSV);
    const again = await team.editor.agent
      .put(`${casePath}/${table.id}/content`)
      .set("Content-Type", "text/csv")
      .send(CSV);
    expect(again.status).toBe(409);
    expect(again.body.error.id).toBe("content_present");
    const after = await team.viewer.agent.get(`${casePath}/${table.id}`).expect(200);
    expect(after.body.pointCount).toBe(4);
  });

  it("when a viewer sends content, then it is refused with 403", async () => {
    const declared = await team.editor.agent.post(casePath).send(declaration(CSV)).expect(201);
    await team.viewer.agent
      .put(`${casePath}/${declared.body.id}/content`)
      .set("Content-Type", "text/csv")
      .send(CSV)
      .expect(403);
  });
});

describe("reading a stored table", () => {
  let tableId: string;
  let olderId: string;
  beforeAll(async () => {
    casePath = await newCase("Reading");
    olderId = (await team.editor.agent.post(casePath).send(declaration(CSV)).expect(201)).body.id;
    tableId = (await upload(CSV)).id;
  });

  it("when a viewer lists the tables, then each carries its mapping and evaluation summary, newest first", async () => {
    const r = await team.viewer.agent.get(casePath).expect(200);
    const list = pointTableListSchema.parse(r.body);
    expect(list.map((t) => t.id)).toEqual([tableId, olderId]);
    expect(list[1].evaluation).toBeNull();
    const ours = list[0];
    expect(ours.columns).toEqual(MAPPING.columns);
    expect(ours.evaluation!.perCriterion.map((c) => c.criterion)).toEqual(["von-mises", "tresca"]);
    expect(ours.createdBy?.name).toBe("Editor One");
  });

  it("when a viewer reads one table, then the histogram counts every point and the worst points come highest first", async () => {
    const r = await team.viewer.agent.get(`${casePath}/${tableId}`).expect(200);
    const table = pointTableDetailSchema.parse(r.body);
    const e = table.evaluation!;
    expect(e.histogram.counts.reduce((a, b) => a + b, 0)).toBe(4);
    expect(e.worst.map((w) => w.id)).toEqual([2, 3, 1, 5]);
    // id 2 governs by Tresca (u = 1.5 / 1.25 = 1.2) over von Mises (u = 1.5 / 1.443 = 1.039)
    expect(e.worst[0].utilisation).toBeCloseTo(1.2, 12);
    expect(e.worst[0].componentsPa.xy).toBe(100e6);
    expect(e.worst[3]).toMatchObject({ id: 5, utilisation: 0, verdict: "pass" });
    // bins from u = 1 upward hold the failing points: only id 2
    const fromOne = Math.round(1 / e.histogram.binWidth);
    expect(e.histogram.counts.slice(fromOne).reduce((a, b) => a + b, 0)).toBe(1);
  });

  it("when the columns are read, then they are little-endian float64 columns in Pa with the point count in a header", async () => {
    const r = await team.viewer.agent
      .get(`${casePath}/${tableId}/columns`)
      .buffer(true)
      .parse((res, done) => {
        const parts: Buffer[] = [];
        res.on("data", (b: Buffer) => parts.push(b));
        res.on("end", () => done(null, Buffer.concat(parts)));
      })
      .expect(200);
    expect(r.headers["content-type"]).toBe("application/octet-stream");
    const n = Number(r.headers["x-point-count"]);
    expect(n).toBe(4);
    const body = r.body as Buffer;
    expect(body.length).toBe(9 * 8 * n);
    const column = (c: number) => Array.from({ length: n }, (_, k) => body.readDoubleLE(8 * (c * n + k)));
    expect(column(0)).toEqual([100e6, 0, 160e6, -50e6]); // xx
    expect(column(3)).toEqual([0, 100e6, 0, 0]); // xy
    expect(column(6)).toEqual([0, 1, 2, 4]); // x
    expect(column(7)).toEqual([0, 0.5, 0, 0]); // y
  });

  it("when the ids are read, then they come as a JSON array in table order", async () => {
    const r = await team.viewer.agent.get(`${casePath}/${tableId}/ids`).expect(200);
    expect(r.body).toEqual([1, 2, 3, 5]);
  });

  it("when the table is downloaded and uploaded again, then the same points come back under the original file name", async () => {
    const r = await team.viewer.agent.get(`${casePath}/${tableId}/download`).buffer(true).expect(200);
    expect(r.headers["content-type"]).toMatch(/^text\/csv/);
    expect(r.headers["content-disposition"]).toMatch(/^attachment; filename="?nozzle-points\.csv"?$/);
    const text = r.text;
    expect(text.split("\n")[0]).toBe("id,x,y,z,xx,yy,zz,xy,yz,zx");
    const again = await upload(text);
    expect(again.pointCount).toBe(4);
    expect(again.badRows.count).toBe(0);
    const columns = async (id: string) =>
      (
        await team.viewer.agent
          .get(`${casePath}/${id}/columns`)
          .buffer(true)
          .parse((res, done) => {
            const parts: Buffer[] = [];
            res.on("data", (b: Buffer) => parts.push(b));
            res.on("end", () => done(null, Buffer.concat(parts)));
          })
      ).body as Buffer;
    expect((await columns(again.id)).equals(await columns(tableId))).toBe(true);
  });

  it("when a table of another load case is asked for, then 404", async () => {
    const other = await team.editor.agent
      .post(`${projectPath}/load-cases`)
      .send({ name: "Other", category: "design" })
      .expect(201);
    await team.viewer.agent
      .get(`${projectPath}/load-cases/${other.body.loadCase.id}/point-tables/${tableId}`)
      .expect(404);
  });

  it("when a table still awaits its content, then its columns answer 409", async () => {
    const declared = await team.editor.agent.post(casePath).send(declaration(CSV)).expect(201);
    const r = await team.viewer.agent.get(`${casePath}/${declared.body.id}/columns`);
    expect(r.status).toBe(409);
    expect(r.body.error.id).toBe("awaiting_content");
  });
});

describe("text ids, whitespace layout and a decimal comma", () => {
  beforeAll(async () => {
    casePath = await newCase("Text ids");
  });

  it("when a whitespace table with text ids and decimal commas is sent, then ids stay text and values are read in the unit", async () => {
    const text = "title line\n  N1  1,5  0  0  0  0  0\r\n  N2  -2,25e1  0  0  0  0  0\r\n";
    const table = await upload(text, {
      layout: { separator: "whitespace", decimal: ",", skipRows: 1, header: false },
      columns: { id: 0, xx: 1, yy: 2, zz: 3, xy: 4, yz: 5, zx: 6 },
      unit: "kPa",
      idKind: "text",
    });
    expect(table.pointCount).toBe(2);
    expect(table.hasCoordinates).toBe(false);
    const ids = await team.viewer.agent.get(`${casePath}/${table.id}/ids`).expect(200);
    expect(ids.body).toEqual(["N1", "N2"]);
    const worst = (await team.viewer.agent.get(`${casePath}/${table.id}`).expect(200)).body.evaluation.worst;
    expect(worst.map((w: { id: string }) => w.id)).toEqual(["N2", "N1"]);
    expect(worst[0].componentsPa.xx).toBe(-22.5e3);
    expect(worst[0].x).toBeNull();
  });
});

describe("deleting a table", () => {
  beforeAll(async () => {
    casePath = await newCase("Deleting");
  });

  it("when a viewer deletes a table, then 403; when an editor does, then 204 and it is gone", async () => {
    const table = await upload(CSV);
    await team.viewer.agent.delete(`${casePath}/${table.id}`).expect(403);
    await team.editor.agent.delete(`${casePath}/${table.id}`).expect(204);
    await team.viewer.agent.get(`${casePath}/${table.id}`).expect(404);
    await team.viewer.agent.get(`${casePath}/${table.id}/ids`).expect(404);
  });

  it("when a request has no Origin header, then the delete is refused with 403 and the table stays", async () => {
    const table = await upload(CSV);
    const cookie = (await team.editor.agent.get("/api/auth/session")).request.cookies;
    await request(app).delete(`${casePath}/${table.id}`).set("Cookie", cookie).expect(403);
    await team.viewer.agent.get(`${casePath}/${table.id}`).set("Origin", TEST_ORIGIN).expect(200);
  });
});
