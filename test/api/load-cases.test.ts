import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadCaseResponseSchema, loadCaseListSchema } from "../../core/contract/load-cases";
import { convertStress } from "../../core";
import { AuditEvent } from "../../db/models/audit-event";
import { StressState } from "../../db/models/stress-state";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let projectId: string;
let shell: string;
let junction: string;
const casesPath = () => wsPath(team, `/projects/${projectId}/load-cases`);

beforeAll(async () => {
  team = await projectTeam(app);
  ({
    projectId,
    locationIds: [shell, junction],
  } = await projectWithLocations(team, { name: "Vessel" }, ["mid-shell", "head junction"]));
});

describe("load cases: create, read, update, delete per role", () => {
  it("when an editor creates a case with states in MPa and ksi, then they are stored in Pa and shown back in the unit entered", async () => {
    const response = await team.editor.agent.post(casesPath()).send({
      name: "Design",
      category: "design",
      states: [
        { locationId: shell, stress: mpa(67.5, 33.75), source: "typed" },
        {
          locationId: junction,
          stress: { unit: "ksi", components: { xx: 10, yy: 5, zz: 0, xy: 1, yz: 0, zx: 0 } },
          source: "pasted",
        },
      ],
    });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    const { loadCase } = loadCaseResponseSchema.parse(response.body);
    expect(loadCase.version).toBe(1);
    const atShell = loadCase.states.find((s) => s.locationId === shell)!;
    expect(atShell.componentsPa.xx).toBe(67.5e6);
    expect(atShell.components.xx).toBeCloseTo(67.5, 12);
    const row = await StressState.findOne({ where: { loadCaseId: loadCase.id, locationId: junction } });
    // 1 ksi = 1000 lbf/in² = 6.894757…e6 Pa (exact definition of the pound-force and inch).
    expect(row!.xxPa).toBeCloseTo(10 * 6894757.293168361, 3);
    expect(row!.unit).toBe("ksi");
    expect(row!.xxPa).toBe(convertStress(10, "ksi", "Pa"));
  });

  it("when a viewer or a reviewer lists cases, then they read them; when they create one, then 403 and nothing is stored", async () => {
    for (const reader of [team.viewer, team.reviewer]) {
      const list = await reader.agent.get(casesPath()).expect(200);
      expect(loadCaseListSchema.parse(list.body).loadCases.map((c) => c.name)).toContain("Design");
      const refused = await reader.agent.post(casesPath()).send({ name: "Sneaky" });
      expect(refused.status).toBe(403);
    }
    const list = await team.editor.agent.get(casesPath()).expect(200);
    expect(list.body.loadCases.map((c: { name: string }) => c.name)).not.toContain("Sneaky");
  });

  it("when an outsider asks for the cases, then 404 (the workspace is not revealed)", async () => {
    await team.outsider.agent.get(casesPath()).expect(404);
  });

  it("when a stress is not finite, has an unknown unit or an asymmetric matrix, then 400 names each field", async () => {
    const raw = `{"name":"Bad","states":[{"locationId":"${shell}","stress":{"unit":"MPa","components":{"xx":1e999,"yy":0,"zz":0,"xy":0,"yz":0,"zx":0}}}]}`;
    const infinite = await team.editor.agent
      .post(casesPath())
      .set("Content-Type", "application/json")
      .send(raw);
    expect(infinite.status).toBe(400);
    expect(infinite.body.error.details).toContainEqual(
      expect.objectContaining({ path: "states.0.stress.components.xx" }),
    );

    const unit = await team.editor.agent.post(casesPath()).send({
      name: "Bad",
      states: [{ locationId: shell, stress: { unit: "bar", components: mpa(1, 1).components } }],
    });
    expect(unit.status).toBe(400);
    expect(unit.body.error.details[0].path).toBe("states.0.stress.unit");

    const asymmetric = await team.editor.agent.post(casesPath()).send({
      name: "Bad",
      states: [
        {
          locationId: shell,
          stress: {
            unit: "MPa",
            matrix: [
              [100, 20, 0],
              [25, 50, 0],
              [0, 0, 0],
            ],
          },
        },
      ],
    });
    expect(asymmetric.status).toBe(400);
    expect(asymmetric.body.error.details[0].path).toBe("states.0.stress.matrix.0.1");
    expect(asymmetric.body.error.details[0].message).toMatch(/not symmetric/);

    // Finite in GPa but Infinity once converted to Pa: refused at the boundary, never stored.
    const overflowing = await team.editor.agent.post(casesPath()).send({
      name: "Bad",
      states: [
        {
          locationId: shell,
          stress: { unit: "GPa", components: { xx: 1e300, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 } },
        },
      ],
    });
    expect(overflowing.status).toBe(400);
    expect(overflowing.body.error.details[0]).toMatchObject({
      path: "states.0.stress.components.xx",
      message: "must be at most 1e+12 in magnitude (in the unit given)",
    });
    const comparison = await team.editor.agent.get(wsPath(team, `/projects/${projectId}/comparison`));
    expect(comparison.status).toBe(200);

    const notHere = await team.editor.agent.post(casesPath()).send({
      name: "Bad",
      states: [{ locationId: "00000000-0000-4000-8000-000000000000", stress: mpa(1, 1) }],
    });
    expect(notHere.status).toBe(400);
    expect(notHere.body.error.details[0].path).toBe("states.0.locationId");

    const list = await team.editor.agent.get(casesPath()).expect(200);
    expect(list.body.loadCases.map((c: { name: string }) => c.name)).not.toContain("Bad");
  });

  it("when a symmetric matrix is given, then it is stored as its six components", async () => {
    const response = await team.editor.agent.post(casesPath()).send({
      name: "Matrix case",
      states: [
        {
          locationId: shell,
          stress: {
            unit: "MPa",
            matrix: [
              [100, 20, 0],
              [20, 50, 5],
              [0, 5, -10],
            ],
          },
        },
      ],
    });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    expect(response.body.loadCase.states[0].componentsPa).toEqual({
      xx: 100e6,
      yy: 50e6,
      zz: -10e6,
      xy: 20e6,
      yz: 5e6,
      zx: 0,
    });
  });
});

describe("load cases: optimistic concurrency", () => {
  it("when two editors update the same case from the same version, then one gets 200, the other 409 with the current version, and the first value is stored", async () => {
    const created = await team.editor.agent
      .post(casesPath())
      .send({ name: "Operating", states: [{ locationId: shell, stress: mpa(56.25, 28.125) }] })
      .expect(201);
    const { id, version } = created.body.loadCase;
    const path = `${casesPath()}/${id}`;
    const [a, b] = await Promise.all([
      team.editor.agent.patch(path).send({ version, states: [{ locationId: shell, stress: mpa(60, 30) }] }),
      team.editor2.agent.patch(path).send({ version, states: [{ locationId: shell, stress: mpa(99, 99) }] }),
    ]);
    const statuses = [a.status, b.status].sort();
    expect(statuses).toEqual([200, 409]);
    const winner = a.status === 200 ? a : b;
    const loser = a.status === 200 ? b : a;
    expect(loser.body.error.details.currentVersion).toBe(version + 1);
    expect(loser.body.error.details.current.version).toBe(version + 1);
    const stored = await team.viewer.agent.get(path).expect(200);
    expect(stored.body.loadCase.states[0].componentsPa).toEqual(winner.body.loadCase.states[0].componentsPa);
    expect(stored.body.loadCase.version).toBe(version + 1);
  });

  it("when an editor saves with a stale version, then 409 and the newer value is kept", async () => {
    const created = await team.editor.agent.post(casesPath()).send({ name: "Stale" }).expect(201);
    const path = `${casesPath()}/${created.body.loadCase.id}`;
    await team.editor.agent.patch(path).send({ version: 1, description: "first" }).expect(200);
    const stale = await team.editor2.agent.patch(path).send({ version: 1, description: "second" });
    expect(stale.status).toBe(409);
    expect(stale.body.error.id).toBe("conflict");
    const now = await team.editor.agent.get(path).expect(200);
    expect(now.body.loadCase.description).toBe("first");
  });
});

describe("stress states: immutable revisions", () => {
  it("when a state is saved three times, then three revisions exist, the newest current, each audited", async () => {
    const created = await team.editor.agent
      .post(casesPath())
      .send({ name: "Revised", states: [{ locationId: junction, stress: mpa(10, 0) }] })
      .expect(201);
    const id = created.body.loadCase.id;
    const statePath = `${casesPath()}/${id}/states/${junction}`;
    const second = await team.editor.agent
      .put(statePath)
      .send({ version: 1, stress: mpa(20, 0), source: "calculator" })
      .expect(200);
    expect(second.body.loadCase.version).toBe(2);
    await team.editor.agent
      .put(statePath)
      .send({ version: 2, stress: mpa(30, 0), source: "measured", note: "gauge R1" })
      .expect(200);
    const stale = await team.editor2.agent.put(statePath).send({ version: 2, stress: mpa(40, 0) });
    expect(stale.status).toBe(409);

    const history = await team.reviewer.agent.get(`${statePath}/revisions`).expect(200);
    expect(
      history.body.revisions.map((r: { revision: number; componentsPa: { xx: number } }) => [
        r.revision,
        r.componentsPa.xx,
      ]),
    ).toEqual([
      [3, 30e6],
      [2, 20e6],
      [1, 10e6],
    ]);
    expect(history.body.revisions[0]).toMatchObject({ source: "measured", note: "gauge R1" });
    const events = await AuditEvent.findAll({
      where: { entityType: "stress-state", projectId },
      order: [["id", "ASC"]],
    });
    const forCase = events.filter((e) => (e.changes as { loadCaseId?: string })?.loadCaseId === id);
    expect(forCase.map((e) => e.action)).toEqual(["create", "update", "update"]);
  });

  it("when a viewer tries to save a state, then 403", async () => {
    const list = await team.viewer.agent.get(casesPath()).expect(200);
    const c = list.body.loadCases[0];
    const refused = await team.viewer.agent
      .put(`${casesPath()}/${c.id}/states/${shell}`)
      .send({ version: c.version, stress: mpa(1, 1) });
    expect(refused.status).toBe(403);
  });

  it("when an editor deletes a case, then it leaves the list (and is in the trash)", async () => {
    const created = await team.editor.agent.post(casesPath()).send({ name: "Temporary" }).expect(201);
    await team.reviewer.agent.delete(`${casesPath()}/${created.body.loadCase.id}`).expect(403);
    await team.editor.agent.delete(`${casesPath()}/${created.body.loadCase.id}`).expect(204);
    await team.editor.agent.get(`${casesPath()}/${created.body.loadCase.id}`).expect(404);
  });
});
