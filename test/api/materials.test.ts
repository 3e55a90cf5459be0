import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PUBLISHED_MATERIALS, STRESS_UNITS, CRITERIA } from "../../core";
import { materialListSchema, STRESS_UNIT_NAMES } from "../../core/contract/materials";
import { CRITERION_NAMES } from "../../core/contract/projects";
import { buildTestApp } from "../support/app";
import { projectTeam, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
beforeAll(async () => {
  team = await projectTeam(app);
});

describe("materials", () => {
  it("when the shared contract's unit and criterion lists are compared with core's, then they are equal", () => {
    expect([...STRESS_UNIT_NAMES]).toEqual([...STRESS_UNITS]);
    expect([...CRITERION_NAMES]).toEqual([...CRITERIA]);
  });

  it("when a viewer lists materials, then the built-in list is core's, in Pa, each with its standard and the note to verify", async () => {
    const list = materialListSchema.parse(
      (await team.viewer.agent.get(wsPath(team, "/materials")).expect(200)).body,
    );
    expect(list.published.map((m) => m.id)).toEqual(PUBLISHED_MATERIALS.map((m) => m.id));
    const s355 = list.published.find((m) => m.id === "s355")!;
    expect(s355).toMatchObject({ standard: "EN 10025-2", yieldPa: 355e6, ultimateTensionPa: 470e6 });
    for (const m of list.published) expect(m.note).toMatch(/verify against/);
  });

  it("when an editor adds a material in ksi, then it is stored in Pa and keeps its unit; a viewer cannot add one", async () => {
    const created = await team.editor.agent.post(wsPath(team, "/materials")).send({
      name: "Lug plate, heat 4471",
      unit: "ksi",
      yield: 50,
      ultimateTension: 70,
      reference: "mill certificate 4471",
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    // 1 ksi = 6.894757293168e6 Pa (exact definitions of lbf and inch).
    expect(created.body.material.yieldPa).toBeCloseTo(50 * 6.894757293168361e6, 2);
    expect(created.body.material).toMatchObject({ unit: "ksi", ultimateCompressionPa: null, version: 1 });
    await team.viewer.agent.post(wsPath(team, "/materials")).send({ name: "No", yield: 1 }).expect(403);
  });

  it("when a strength is negative or Poisson's ratio is 0.6, then 400 names the field", async () => {
    const bad = await team.editor.agent
      .post(wsPath(team, "/materials"))
      .send({ name: "Bad", yield: -5, poissonRatio: 0.6 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual([
      "poissonRatio",
      "yield",
    ]);
    // A strength that is finite as typed but would be Infinity in Pa is refused, not stored as null.
    const huge = await team.editor.agent
      .post(wsPath(team, "/materials"))
      .send({ name: "Huge", unit: "GPa", yield: 1e300 });
    expect(huge.status).toBe(400);
    expect(huge.body.error.details[0].path).toBe("yield");
  });

  it("when an editor changes a material with a stale version, then 409; with the right one the value changes and deletion hides it", async () => {
    const created = await team.editor.agent
      .post(wsPath(team, "/materials"))
      .send({ name: "Shaft steel", yield: 420 })
      .expect(201);
    const path = wsPath(team, `/materials/${created.body.material.id}`);
    const changed = await team.editor.agent.patch(path).send({ version: 1, yield: 430 }).expect(200);
    expect(changed.body.material).toMatchObject({ version: 2, yieldPa: 430e6 });
    const stale = await team.editor2.agent.patch(path).send({ version: 1, yield: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details.currentVersion).toBe(2);
    await team.reviewer.agent.delete(path).expect(403);
    await team.editor.agent.delete(path).expect(204);
    await team.editor.agent.get(path).expect(404);
  });
});
