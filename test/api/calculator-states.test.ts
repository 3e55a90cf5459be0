import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PROJECT_EXPORT_SCHEMA_VERSION } from "../../core/contract/project-export";
import { StressState } from "../../db/models/stress-state";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

// States saved from a calculator keep the calculator's name, version and every input with its
// unit; bad inputs are refused naming the field; export and import carry them.

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let projectId: string;
let locationIds: string[];
let caseId: string;

/**
 * A thin-walled cylinder, p = 2 MPa, inside radius 500 mm, wall 10 mm: σθ = pr/t = 100 MPa,
 * σx = pr/(2t) = 50 MPa (thin-wall membrane formulas, any strength-of-materials text).
 */
const thinWall = () => ({
  name: "thin-wall",
  version: 1,
  inputs: {
    units: "si",
    numbers: {
      p: { value: 2, unit: "MPa" },
      r: { value: 500, unit: "mm" },
      t: { value: 10, unit: "mm" },
    },
    choices: { shape: "cylinder", given: "inner", form: "inside-radius", radial: "membrane" },
  },
});

const base = () => wsPath(team, `/projects/${projectId}/load-cases`);

async function caseVersion(): Promise<number> {
  const r = await team.editor.agent.get(`${base()}/${caseId}`).expect(200);
  return r.body.loadCase.version;
}

async function putState(locationId: string, body: Record<string, unknown>) {
  return team.editor.agent
    .put(`${base()}/${caseId}/states/${locationId}`)
    .send({ version: await caseVersion(), ...body });
}

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(
    team,
    {
      name: `Calculator states ${Date.now()}`,
      requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
    },
    ["mid-shell", "bore", "weld toe"],
  );
  projectId = made.projectId;
  locationIds = made.locationIds;
  const c = await team.editor.agent.post(base()).send({ name: "Design", category: "design" }).expect(201);
  caseId = c.body.loadCase.id;
});

describe("states saved from a calculator", () => {
  it("when a state is saved with its calculator inputs, then the case, the stored row and the revision history keep them", async () => {
    const saved = await putState(locationIds[0], {
      stress: mpa(50, 100),
      source: "calculator",
      calculator: thinWall(),
    });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const state = saved.body.loadCase.states.find(
      (s: { locationId: string }) => s.locationId === locationIds[0],
    );
    expect(state.source).toBe("calculator");
    expect(state.calculator).toEqual(thinWall());

    const row = await StressState.findOne({ where: { id: state.id } });
    expect(row?.calculator).toEqual(thinWall());

    // A later typed revision has none; the history still shows the calculator's one.
    await putState(locationIds[0], { stress: mpa(51, 100), source: "typed" }).then((r) =>
      expect(r.status).toBe(200),
    );
    const history = await team.viewer.agent
      .get(`${base()}/${caseId}/states/${locationIds[0]}/revisions`)
      .expect(200);
    expect(history.body.revisions.map((r: { calculator: unknown }) => r.calculator)).toEqual([
      null,
      thinWall(),
    ]);
  });

  it("when a load case is created with a calculator state, then the create route keeps the inputs too", async () => {
    const r = await team.editor.agent.post(base()).send({
      name: "Test",
      category: "test",
      states: [
        { locationId: locationIds[0], stress: mpa(50, 100), source: "calculator", calculator: thinWall() },
      ],
    });
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    expect(r.body.loadCase.states[0].calculator).toEqual(thinWall());
  });

  it("when the calculator inputs are wrong, then 400 names each field and nothing is stored", async () => {
    const before = await StressState.count({ where: { locationId: locationIds[1] } });
    const cases: [unknown, string][] = [
      [{ ...thinWall(), name: "slide-rule" }, "calculator.name"],
      [{ ...thinWall(), version: 99 }, "calculator.version"],
      [{ ...thinWall(), version: 0 }, "calculator.version"],
      [{ ...thinWall(), inputs: { ...thinWall().inputs, units: "furlongs" } }, "calculator.inputs.units"],
      [
        {
          ...thinWall(),
          inputs: {
            ...thinWall().inputs,
            numbers: { ...thinWall().inputs.numbers, t: { value: 10, unit: "in" } },
          },
        },
        "calculator.inputs.numbers.t.unit",
      ],
      [
        {
          ...thinWall(),
          inputs: {
            ...thinWall().inputs,
            numbers: { p: { value: 2, unit: "MPa" }, r: { value: 500, unit: "mm" } },
          },
        },
        "calculator.inputs.numbers.t",
      ],
      [
        {
          ...thinWall(),
          inputs: {
            ...thinWall().inputs,
            numbers: { ...thinWall().inputs.numbers, p: { value: "2", unit: "MPa" } },
          },
        },
        "calculator.inputs.numbers.p.value",
      ],
      [
        {
          ...thinWall(),
          inputs: {
            ...thinWall().inputs,
            numbers: { ...thinWall().inputs.numbers, q: { value: 1, unit: "" } },
          },
        },
        "calculator.inputs.numbers.q",
      ],
      [
        {
          ...thinWall(),
          inputs: { ...thinWall().inputs, choices: { ...thinWall().inputs.choices, shape: "cone" } },
        },
        "calculator.inputs.choices.shape",
      ],
      [
        {
          ...thinWall(),
          inputs: {
            ...thinWall().inputs,
            numbers: { ...thinWall().inputs.numbers, t: { value: -1, unit: "mm" } },
          },
        },
        "calculator.inputs.numbers.t.value",
      ],
      ["a calculator", "calculator"],
    ];
    for (const [calculator, path] of cases) {
      const r = await putState(locationIds[1], { stress: mpa(50, 100), source: "calculator", calculator });
      expect(r.status, `${path}: ${JSON.stringify(r.body)}`).toBe(400);
      expect(r.body.error.id).toBe("invalid_input");
      expect(r.body.error.details.map((d: { path: string }) => d.path)).toContain(path);
    }
    // Calculator inputs on a typed state contradict its source.
    const typed = await putState(locationIds[1], {
      stress: mpa(50, 100),
      source: "typed",
      calculator: thinWall(),
    });
    expect(typed.status).toBe(400);
    expect(typed.body.error.details.map((d: { path: string }) => d.path)).toContain("source");
    expect(await StressState.count({ where: { locationId: locationIds[1] } })).toBe(before);
  });

  it("when a rosette's measured state is saved with its readings, then it is accepted with the source measured", async () => {
    const rosette = {
      name: "rosette",
      version: 1,
      inputs: {
        units: "si",
        numbers: {
          e1: { value: 420, unit: "µε" },
          e2: { value: 150, unit: "µε" },
          e3: { value: -90, unit: "µε" },
          a1: { value: 0, unit: "°" },
          a2: { value: 45, unit: "°" },
          a3: { value: 90, unit: "°" },
          E: { value: 210, unit: "GPa" },
          nu: { value: 0.3, unit: "" },
          gfSet: { value: 2, unit: "" },
          gfGauge: { value: 2, unit: "" },
        },
        choices: { layout: "rectangular", gf: "as-read" },
      },
    };
    const r = await putState(locationIds[2], { stress: mpa(90, 8), source: "measured", calculator: rosette });
    expect(r.status, JSON.stringify(r.body)).toBe(200);
  });

  it("when the project is exported and imported, then each state keeps its calculator inputs (null where there were none)", async () => {
    const exported = await team.viewer.agent.get(wsPath(team, `/projects/${projectId}/export`)).expect(200);
    expect(exported.body.schemaVersion).toBe(PROJECT_EXPORT_SCHEMA_VERSION);
    expect(PROJECT_EXPORT_SCHEMA_VERSION).toBe(4);
    const design = exported.body.loadCases.find((c: { name: string }) => c.name === "Design");
    const byLocation = (key: string) => design.states.find((s: { location: string }) => s.location === key);
    expect(byLocation("l1").calculator).toBeNull(); // the later typed revision is the current one
    expect(byLocation("l3").calculator.name).toBe("rosette");
    const test = exported.body.loadCases.find((c: { name: string }) => c.name === "Test");
    expect(test.states[0].calculator).toEqual(thinWall());

    const other = await team.editor.agent
      .post("/api/workspaces")
      .send({ name: "Calculator copy" })
      .expect(201);
    const target = other.body.workspace.id;
    const imported = await team.editor.agent
      .post(`/api/workspaces/${target}/project-imports`)
      .send(exported.body);
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    const again = await team.editor.agent
      .get(`/api/workspaces/${target}/projects/${imported.body.project.id}/export`)
      .expect(200);
    const strip = (f: Record<string, unknown>) => ({ ...f, exportedAt: "" });
    expect(strip(again.body)).toEqual(strip(exported.body));
  });

  it("when a version-2 file (no calculator field) is imported, then its states are read with no calculator; a version-3 file without the field is refused naming it", async () => {
    const exported = await team.viewer.agent.get(wsPath(team, `/projects/${projectId}/export`)).expect(200);
    const v2 = structuredClone(exported.body);
    v2.schemaVersion = 2;
    v2.project.name = `Version two ${Date.now()}`;
    for (const c of v2.loadCases) for (const s of c.states) delete s.calculator;
    const imported = await team.editor.agent.post(wsPath(team, "/project-imports")).send(v2);
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    const again = await team.editor.agent
      .get(wsPath(team, `/projects/${imported.body.project.id}/export`))
      .expect(200);
    for (const c of again.body.loadCases) for (const s of c.states) expect(s.calculator).toBeNull();

    const v3 = { ...v2, schemaVersion: 3 };
    const refused = await team.editor.agent.post(wsPath(team, "/project-imports")).send(v3).expect(400);
    expect(refused.body.error.details.map((d: { path: string }) => d.path)).toContain(
      "loadCases.0.states.0.calculator",
    );

    const bad = structuredClone(exported.body);
    bad.loadCases[0].states[0].calculator = {
      ...thinWall(),
      inputs: { ...thinWall().inputs, units: "cubits" },
    };
    const badInputs = await team.editor.agent.post(wsPath(team, "/project-imports")).send(bad).expect(400);
    expect(badInputs.body.error.details.map((d: { path: string }) => d.path)).toContain(
      "loadCases.0.states.0.calculator.inputs.units",
    );
  });
});
