import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { linearize } from "../../core";
import { comparisonPageSchema } from "../../core/contract/comparison";
import { LINEARIZATION_LIMITS } from "../../core/contract/limits";
import { linearizationResponseSchema } from "../../core/contract/linearizations";
import { AuditEvent } from "../../db/models/audit-event";
import { buildTestApp } from "../support/app";
import { linearWall } from "../support/linear-wall";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let project: string;
let base: string;
let nozzle: string;
let caseId: string;
const lines = (c = caseId) => `${base}/load-cases/${c}/linearizations`;

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(team, { name: "Linearization" }, ["nozzle"]);
  project = made.projectId;
  base = wsPath(team, `/projects/${project}`);
  [nozzle] = made.locationIds;
  const c = await team.editor.agent
    .post(`${base}/load-cases`)
    .send({ name: "Design pressure", states: [{ locationId: nozzle, stress: mpa(100, 50) }] })
    .expect(201);
  caseId = c.body.loadCase.id;
});

describe("saving and reading a line", () => {
  it("when an editor saves a linear hoop distribution, then the server's membrane is its mean, the bending its linear part and the peak zero, as core computes them", async () => {
    const body = linearWall(nozzle);
    const created = await team.editor.agent.post(lines()).send(body);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const { linearization } = linearizationResponseSchema.parse(created.body);
    const r = linearization.result;
    // Local frame: x along the line = global x, y = the given second axis = global y: σyy is the hoop stress.
    expect(r.membrane[1]).toBeCloseTo(100, 10);
    expect(r.bending.start[1]).toBeCloseTo(100, 10);
    expect(r.bending.end[1]).toBeCloseTo(-100, 10);
    expect(r.peak.start[1]).toBeCloseTo(0, 10);
    expect(r.thickness).toBe(10);
    // The same numbers as core's own linearize on the same arrays (the server must use it).
    const core = linearize({
      stresses: Float64Array.from(body.path.points.flatMap((p) => [p.xx, p.yy, p.zz, p.xy, p.yz, p.zx])),
      distances: Float64Array.from(body.path.points.map((p) => p.distance)),
      lineDirection: [1, 0, 0],
      secondAxis: [0, 1, 0],
      classification: { membrane: "local", stresses: "primary" },
      allowables: { S: 138 },
    });
    expect(r.equivalent.membranePlusBending).toEqual(core.equivalent.membranePlusBending);
    expect(r.checks.map((k) => [k.id, k.limit, k.verdict])).toEqual(
      core.checks.map((k) => [k.id, k.limit, k.verdict]),
    );
    expect(r.checks.map((k) => k.id)).toEqual(["PL", "PL+Pb"]);
    // 1.5 S = 207 MPa for both local-membrane checks (the rule as core/linearization/sources.ts states it, recalled from memory).
    expect(r.checks.every((k) => k.limit === 207)).toBe(true);

    const read = await team.viewer.agent.get(`${lines()}/${linearization.id}`).expect(200);
    expect(read.body.linearization.result.checks).toEqual(r.checks);
    expect(read.body.linearization.input.path.points).toHaveLength(11);
    const list = await team.viewer.agent.get(lines()).expect(200);
    expect(list.body.linearizations.map((l: { id: string }) => l.id)).toContain(linearization.id);
  });

  it("when a client sends a result of its own, then the server ignores it and stores its own computation", async () => {
    const body = {
      ...linearWall(nozzle, "Forged result"),
      result: { checks: [{ id: "PL", ratio: 0.01, verdict: "pass" }] },
    };
    const created = await team.editor.agent.post(lines()).send(body).expect(201);
    const plb = created.body.linearization.result.checks.find((k: { id: string }) => k.id === "PL+Pb");
    // Membrane + bending at the inside surface is the tensor (−1, 200, 50) MPa with no shear; its von Mises
    // stress by hand is √(½((−1 − 200)² + (200 − 50)² + (50 + 1)²)) = √32751 = 180.97 MPa (von Mises formula,
    // common practice, no source), against 1.5 S = 207 MPa.
    expect(plb.value).toBeCloseTo(Math.sqrt(32751), 9);
    expect(plb.ratio).toBeCloseTo(Math.sqrt(32751) / 207, 9);
  });

  it("when the allowables come from the location's material, then Sy and Su are read from it in the path's unit and SPS uses 2Sy", async () => {
    const material = await team.editor.agent
      .post(wsPath(team, "/materials"))
      .send({ name: "Plate steel", unit: "MPa", yield: 260, ultimateTension: 485 })
      .expect(201);
    const loc = await team.editor.agent
      .post(`${base}/locations`)
      .send({ name: "head knuckle", material: { kind: "workspace", id: material.body.material.id } })
      .expect(201);
    const body = {
      ...linearWall(nozzle, "Knuckle, primary + secondary"),
      locationId: loc.body.location.id,
      classification: { membrane: "local", stresses: "primary-plus-secondary" },
      allowables: { source: "material", S: 138 },
    };
    const created = await team.editor.agent.post(lines()).send(body);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const r = created.body.linearization.result;
    expect(r.allowables.Sy).toBeCloseTo(260, 9);
    expect(r.allowables.Su).toBeCloseTo(485, 9);
    // SPS = max(3S, 2Sy) = max(414, 520) = 520 when Sy/Su = 0.536 ≤ 0.7 (rule recalled from memory, core/linearization/sources.ts).
    expect(r.checks).toHaveLength(1);
    expect(r.checks[0].limit).toBeCloseTo(520, 9);
    expect(r.allowables.note).toContain("Plate steel");
  });
});

describe("bad input", () => {
  const bad = async (body: unknown) => {
    const r = await team.editor.agent.post(lines()).send(body as object);
    expect(r.status, JSON.stringify(r.body)).toBe(400);
    return (r.body.error.details as { path: string }[]).map((d) => d.path);
  };

  it("when a line has two points, then 400 naming path.points", async () => {
    const body = linearWall(nozzle);
    body.path.points = body.path.points.slice(0, 2);
    expect(await bad(body)).toContain("path.points");
  });

  it("when points are placed by distance without a direction, then 400 naming path.lineDirection", async () => {
    const body = { ...linearWall(nozzle), path: { ...linearWall(nozzle).path, lineDirection: null } };
    expect(await bad(body)).toContain("path.lineDirection");
  });

  it("when a distance goes back, then 400 naming that point's distance, and nothing is stored", async () => {
    const before = (await team.viewer.agent.get(lines()).expect(200)).body.linearizations.length;
    const body = linearWall(nozzle, "Goes back");
    body.path.points[3].distance = 1.5;
    expect(await bad(body)).toContain("path.points.3.distance");
    const after = (await team.viewer.agent.get(lines()).expect(200)).body.linearizations.length;
    expect(after).toBe(before);
  });

  it("when a point lacks a component or S is not positive or the options are unknown, then 400 names each field", async () => {
    const body = linearWall(nozzle) as Record<string, unknown> & ReturnType<typeof linearWall>;
    const points = body.path.points.map((p) => ({ ...p })) as Record<string, unknown>[];
    delete points[4].zx;
    const paths = await bad({
      ...body,
      path: { ...body.path, points },
      allowables: { source: "typed", S: -5 },
      equivalent: "max-shear",
      bending: "some",
    });
    expect(paths).toEqual(
      expect.arrayContaining(["path.points.4.zx", "allowables.S", "equivalent", "bending"]),
    );
  });

  it("when the second axis lies along the line, then 400 naming secondAxis", async () => {
    expect(await bad({ ...linearWall(nozzle), secondAxis: [2, 0, 0] })).toContain("secondAxis");
  });

  it("when the location is not one of the project's, then 400 naming locationId", async () => {
    expect(await bad({ ...linearWall(nozzle), locationId: crypto.randomUUID() })).toContain("locationId");
  });

  it(`when a line has more than ${LINEARIZATION_LIMITS.pointsPerLine} points, then 400 naming path.points`, async () => {
    const body = linearWall(nozzle);
    body.path.points = Array.from({ length: LINEARIZATION_LIMITS.pointsPerLine + 1 }, (_, i) => ({
      distance: i,
      xx: 0,
      yy: 1,
      zz: 0,
      xy: 0,
      yz: 0,
      zx: 0,
    }));
    expect(await bad(body)).toContain("path.points");
  });

  it("when the positions are so close together that the bending integral overflows, then 400 naming path.points", async () => {
    const body = linearWall(nozzle);
    body.path.points = body.path.points.slice(0, 3).map((p, i) => ({ ...p, distance: i * 1e-200 }));
    expect(await bad(body)).toContain("path.points");
  });

  it("when the load case is not the project's, then 404", async () => {
    await team.editor.agent.post(lines(crypto.randomUUID())).send(linearWall(nozzle)).expect(404);
  });
});

describe("roles and versions", () => {
  it("when a viewer lists, reads and previews, then 200; when a viewer saves, changes or deletes, then 403, an outsider gets 404, and nothing changes", async () => {
    const saved = (
      await team.editor.agent.post(lines()).send(linearWall(nozzle, "Viewer target")).expect(201)
    ).body.linearization;
    await team.viewer.agent.get(lines()).expect(200);
    await team.viewer.agent.get(`${lines()}/${saved.id}`).expect(200);
    const preview = await team.viewer.agent.post(`${lines()}/preview`).send(linearWall(nozzle)).expect(200);
    expect(preview.body.result.membrane[1]).toBeCloseTo(100, 10);
    await team.viewer.agent.post(lines()).send(linearWall(nozzle)).expect(403);
    await team.viewer.agent
      .put(`${lines()}/${saved.id}`)
      .send({ version: 1, ...linearWall(nozzle, "Renamed by viewer") })
      .expect(403);
    await team.viewer.agent.delete(`${lines()}/${saved.id}`).expect(403);
    // Someone outside the workspace is not told that it exists.
    await team.outsider.agent.get(lines()).expect(404);
    const read = await team.viewer.agent.get(`${lines()}/${saved.id}`).expect(200);
    expect(read.body.linearization.name).toBe("Viewer target");
  });

  it("when two editors change a line from the same version, then one gets 200 and the other 409 with the current version, and the first change is kept", async () => {
    const saved = (await team.editor.agent.post(lines()).send(linearWall(nozzle, "Contested")).expect(201))
      .body.linearization;
    const path = `${lines()}/${saved.id}`;
    const responses = await Promise.all([
      team.editor.agent.put(path).send({ version: 1, ...linearWall(nozzle, "First") }),
      team.editor2.agent.put(path).send({ version: 1, ...linearWall(nozzle, "Second") }),
    ]);
    const statuses = responses.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 409]);
    const winner = responses.find((r) => r.status === 200)!;
    const loser = responses.find((r) => r.status === 409)!;
    expect(loser.body.error.details.currentVersion).toBe(2);
    const read = await team.viewer.agent.get(path).expect(200);
    expect(read.body.linearization.version).toBe(2);
    expect(read.body.linearization.name).toBe(winner.body.linearization.name);
  });

  it("when an editor deletes a line, then it is gone and the audit trail keeps its inputs", async () => {
    const saved = (await team.editor.agent.post(lines()).send(linearWall(nozzle, "To delete")).expect(201))
      .body.linearization;
    await team.editor.agent.delete(`${lines()}/${saved.id}`).expect(204);
    await team.viewer.agent.get(`${lines()}/${saved.id}`).expect(404);
    const trail = await AuditEvent.findOne({ where: { entityId: saved.id, action: "delete" } });
    expect(trail?.entityType).toBe("linearization");
    expect(JSON.stringify(trail?.changes)).toContain('"distance":10');
  });
});

describe("limits and the comparison", () => {
  it(`when a case already holds ${LINEARIZATION_LIMITS.linesPerLoadCase} lines, then the next is refused with 400 project_limit`, async () => {
    const c = await team.editor.agent.post(`${base}/load-cases`).send({ name: "Crowded" }).expect(201);
    const id = c.body.loadCase.id;
    for (let i = 0; i < LINEARIZATION_LIMITS.linesPerLoadCase; i++) {
      await team.editor.agent
        .post(lines(id))
        .send(linearWall(nozzle, `Line ${i}`))
        .expect(201);
    }
    const refused = await team.editor.agent
      .post(lines(id))
      .send(linearWall(nozzle, "One too many"))
      .expect(400);
    expect(refused.body.error.id).toBe("project_limit");
    expect(refused.body.error.details.limit).toBe("linesPerLoadCase");
    await team.editor.agent.delete(`${base}/load-cases/${id}`).expect(204);
  });

  it("when a line is saved, changed and its case trashed, then the comparison lists it with its checks, follows the change, and drops it", async () => {
    const c = await team.editor.agent.post(`${base}/load-cases`).send({ name: "Hydrotest" }).expect(201);
    const id = c.body.loadCase.id;
    const comparison = async () =>
      comparisonPageSchema.parse((await team.viewer.agent.get(`${base}/comparison`).expect(200)).body);
    const before = await comparison();
    expect(before.linearizations.some((l) => l.caseId === id)).toBe(false);

    const saved = (await team.editor.agent.post(lines(id)).send(linearWall(nozzle, "Test line")).expect(201))
      .body.linearization;
    const first = (await comparison()).linearizations.find((l) => l.id === saved.id)!;
    expect(first).toMatchObject({ name: "Test line", caseName: "Hydrotest", locationName: "nozzle" });
    expect(first.category).toBe("local membrane, primary");
    expect(first.checks.map((k) => k.rule)).toEqual(["PL ≤ 1.5S", "PL + Pb ≤ 1.5S"]);
    expect(first.checks.every((k) => k.source.includes("recalled from memory"))).toBe(true);
    expect(first.governingRule).toBe("PL + Pb ≤ 1.5S");

    // A smaller S raises every ratio: the comparison must not answer from its earlier copy.
    await team.editor.agent
      .put(`${lines(id)}/${saved.id}`)
      .send({ version: 1, ...linearWall(nozzle, "Test line"), allowables: { source: "typed", S: 100 } })
      .expect(200);
    const second = (await comparison()).linearizations.find((l) => l.id === saved.id)!;
    expect(second.checks[1].limit).toBe(150);
    expect(second.checks[1].ratio).toBeGreaterThan(first.checks[1].ratio);

    await team.editor.agent.delete(`${base}/load-cases/${id}`).expect(204);
    expect((await comparison()).linearizations.some((l) => l.id === saved.id)).toBe(false);
  });
});
