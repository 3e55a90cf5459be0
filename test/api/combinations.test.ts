import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { combineLoadCases } from "../../core";
import { combinationResultsSchema, SUPERPOSITION_CAUTION } from "../../core/contract/combinations";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let base: string;
let shell: string;
let nozzle: string;
const cases: Record<string, string> = {};
const combos = () => `${base}/combinations`;

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(team, { name: "Combos" }, ["mid-shell", "nozzle"]);
  base = wsPath(team, `/projects/${made.projectId}`);
  [shell, nozzle] = made.locationIds;
  const add = async (name: string, states: { locationId: string; stress: ReturnType<typeof mpa> }[]) => {
    const r = await team.editor.agent.post(`${base}/load-cases`).send({ name, states }).expect(201);
    cases[name] = r.body.loadCase.id;
  };
  await add("Dead", [
    { locationId: shell, stress: mpa(10, -4, 0, 2) },
    { locationId: nozzle, stress: mpa(3, 1) },
  ]);
  await add("Pressure", [
    { locationId: shell, stress: mpa(60, 30) },
    { locationId: nozzle, stress: mpa(90, 45, 0, 12) },
  ]);
  // Wind has no state at the nozzle: the combination there must say so, not assume zero.
  await add("Wind", [
    {
      locationId: shell,
      stress: { unit: "MPa", components: { xx: -5, yy: 12, zz: 1, xy: 8, yz: -3, zx: 0.5 } },
    },
  ]);
});

describe("combinations", () => {
  it("when 1.0 × dead + 1.0 × pressure + 0.6 × wind is created, then its result at each location equals core's superposition of the stored states", async () => {
    const created = await team.editor.agent.post(combos()).send({
      name: "Dead + pressure + wind",
      terms: [
        { loadCaseId: cases.Dead, factor: 1 },
        { loadCaseId: cases.Pressure, factor: 1 },
        { loadCaseId: cases.Wind, factor: 0.6 },
      ],
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.combination.terms.map((t: { loadCaseName: string }) => t.loadCaseName)).toEqual([
      "Dead",
      "Pressure",
      "Wind",
    ]);

    const results = combinationResultsSchema.parse(
      (await team.viewer.agent.get(`${combos()}/${created.body.combination.id}/results`).expect(200)).body,
    );
    expect(results.caution).toBe(SUPERPOSITION_CAUTION);
    const atShell = results.results.find((r) => r.locationId === shell)!;
    if (atShell.status !== "combined") throw new Error("the shell has every case");
    const expected = combineLoadCases([
      { factor: 1, tensor: { xx: 10e6, yy: -4e6, zz: 0, xy: 2e6, yz: 0, zx: 0 } },
      { factor: 1, tensor: { xx: 60e6, yy: 30e6, zz: 0, xy: 0, yz: 0, zx: 0 } },
      { factor: 0.6, tensor: { xx: -5e6, yy: 12e6, zz: 1e6, xy: 8e6, yz: -3e6, zx: 0.5e6 } },
    ]);
    expect(atShell.componentsPa).toEqual(expected);
    // Hand sum (superposition, common practice, no source): σxx = 10 + 60 − 0.6·5 = 67 MPa.
    expect(atShell.componentsPa.xx).toBeCloseTo(67e6, 3);
    expect(atShell.componentsPa.yy).toBeCloseTo(33.2e6, 3);
    const atNozzle = results.results.find((r) => r.locationId === nozzle)!;
    expect(atNozzle).toMatchObject({
      status: "incomplete",
      missingCases: [{ id: cases.Wind, name: "Wind" }],
    });
  });

  it("when a term names its case in upper case, then it is the same case (UUIDs are case-insensitive)", async () => {
    const response = await team.editor.agent
      .post(combos())
      .send({ name: "Upper-case id", terms: [{ loadCaseId: cases.Dead.toUpperCase(), factor: 1 }] });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    expect(response.body.combination.terms[0].loadCaseId).toBe(cases.Dead);
  });

  it("when a term names a case of another project, a zero factor or the same case twice, then 400 names the field", async () => {
    const zero = await team.editor.agent
      .post(combos())
      .send({ name: "x", terms: [{ loadCaseId: cases.Dead, factor: 0 }] });
    expect(zero.status).toBe(400);
    expect(zero.body.error.details[0].path).toBe("terms.0.factor");
    const huge = await team.editor.agent
      .post(combos())
      .send({ name: "x", terms: [{ loadCaseId: cases.Dead, factor: 1e10 }] });
    expect(huge.status).toBe(400);
    expect(huge.body.error.details[0]).toMatchObject({
      path: "terms.0.factor",
      message: "must be at most 1000000 in magnitude",
    });
    const twice = await team.editor.agent.post(combos()).send({
      name: "x",
      terms: [
        { loadCaseId: cases.Dead, factor: 1 },
        { loadCaseId: cases.Dead, factor: 2 },
      ],
    });
    expect(twice.body.error.details[0].path).toBe("terms.1.loadCaseId");
    const other = await projectWithLocations(team, { name: "Elsewhere" }, []);
    const foreign = await team.editor.agent
      .post(wsPath(team, `/projects/${other.projectId}/combinations`))
      .send({ name: "x", terms: [{ loadCaseId: cases.Dead, factor: 1 }] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.details[0].path).toBe("terms.0.loadCaseId");
  });

  it("when a reviewer creates or changes a combination, then 403; an editor's stale version gets 409", async () => {
    await team.reviewer.agent
      .post(combos())
      .send({ name: "no", terms: [{ loadCaseId: cases.Dead, factor: 1 }] })
      .expect(403);
    const created = await team.editor.agent
      .post(combos())
      .send({ name: "Pressure only", terms: [{ loadCaseId: cases.Pressure, factor: 1.25 }] })
      .expect(201);
    const path = `${combos()}/${created.body.combination.id}`;
    await team.reviewer.agent.patch(path).send({ version: 1, name: "no" }).expect(403);
    const changed = await team.editor.agent
      .patch(path)
      .send({ version: 1, terms: [{ loadCaseId: cases.Pressure, factor: 1.5 }] })
      .expect(200);
    expect(changed.body.combination).toMatchObject({ version: 2, terms: [{ factor: 1.5 }] });
    await team.editor2.agent.patch(path).send({ version: 1, name: "stale" }).expect(409);
    await team.editor.agent.delete(path).expect(204);
    await team.editor.agent.get(path).expect(404);
  });

  it("when a case in a combination goes to the trash, then the combination's results say that case is missing", async () => {
    const temp = await team.editor.agent
      .post(`${base}/load-cases`)
      .send({ name: "Temporary", states: [{ locationId: shell, stress: mpa(1, 1) }] })
      .expect(201);
    const combo = await team.editor.agent
      .post(combos())
      .send({ name: "With temporary", terms: [{ loadCaseId: temp.body.loadCase.id, factor: 1 }] })
      .expect(201);
    await team.editor.agent.delete(`${base}/load-cases/${temp.body.loadCase.id}`).expect(204);
    const results = await team.editor.agent
      .get(`${combos()}/${combo.body.combination.id}/results`)
      .expect(200);
    expect(results.body.results.find((r: { locationId: string }) => r.locationId === shell)).toMatchObject({
      status: "incomplete",
      missingCases: [{ name: "Temporary" }],
    });
  });
});
