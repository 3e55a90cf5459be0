import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  combineLoadCases,
  evaluateState,
  findGoverning,
  type CheckRequirement,
  type StressTensor,
} from "../../core";
import { comparisonSchema, type Comparison } from "../../core/contract/comparison";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

// Thin-wall membrane stresses in a cylinder: σθ = pr/t, σx = pr/2t (the handbook thin-shell
// formulas; common practice, no source). r = 600 mm, t = 8 mm.
const hoop = (p: number) => (p * 600) / 8;
const BENDING = 70; // MPa, an invented bending stress at the head junction, on σx
const pressures = { Operating: 0.75, Design: 0.9, "Hydrostatic test": 1.17, "Vacuum upset": -0.1 } as const;

const requirements: CheckRequirement[] = [
  { criterion: "von-mises", requiredFactor: 1.5 },
  { criterion: "tresca", requiredFactor: 1.5 },
  { criterion: "max-principal", requiredFactor: 2 },
];
// SA-516 Grade 70 from core's built-in list: Sy 260 MPa, Su 485 MPa (values as core has them).
const material = { yield: 260e6, ultimateTension: 485e6, ultimateCompression: 485e6 };

let team: ProjectTeam;
let base: string;
let shell: string;
let junction: string;
let comparison: Comparison;
const tensors = new Map<string, StressTensor>();

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(
    team,
    { name: "CT-7", requirements, defaultMaterial: { kind: "published", id: "sa516-70" } },
    ["mid-shell", "head junction"],
  );
  base = wsPath(team, `/projects/${made.projectId}`);
  [shell, junction] = made.locationIds;
  const ids: Record<string, string> = {};
  for (const [name, p] of Object.entries(pressures)) {
    const states = [
      { locationId: shell, stress: mpa(hoop(p), hoop(p) / 2) },
      { locationId: junction, stress: mpa(hoop(p), hoop(p) / 2 + Math.sign(p) * BENDING) },
    ];
    const r = await team.editor.agent
      .post(`${base}/load-cases`)
      .send({ name, category: "design", states })
      .expect(201);
    ids[name] = r.body.loadCase.id;
    for (const s of states) {
      const c = s.stress.components;
      tensors.set(`${name}@${s.locationId}`, { xx: c.xx * 1e6, yy: c.yy * 1e6, zz: 0, xy: 0, yz: 0, zx: 0 });
    }
  }
  await team.editor.agent
    .post(`${base}/combinations`)
    .send({
      name: "Operating + upset",
      terms: [
        { loadCaseId: ids.Operating, factor: 1 },
        { loadCaseId: ids["Vacuum upset"], factor: 1 },
      ],
    })
    .expect(201);
  comparison = comparisonSchema.parse((await team.viewer.agent.get(`${base}/comparison`).expect(200)).body);
});

describe("the comparison", () => {
  it("when four cases and a combination are at two locations, then there are ten rows and their values equal core's evaluation of the same inputs", () => {
    expect(comparison.rows).toHaveLength(10);
    for (const name of Object.keys(pressures)) {
      for (const locationId of [shell, junction]) {
        const row = comparison.rows.find((r) => r.caseName === name && r.locationId === locationId)!;
        const expected = evaluateState(tensors.get(`${name}@${locationId}`)!, material, requirements);
        expect(row.principalPa).toEqual(expected.principal);
        expect(row.vonMisesPa).toBe(expected.vonMises);
        expect(row.trescaPa).toBe(expected.tresca);
        expect(row.maxShearPa).toBe(expected.maxShear);
        for (const [i, check] of expected.checks.entries()) {
          if (check.criterion === "max-principal") {
            // SA-516-70 has a yield strength, so it is ductile: the brittle criterion is not applicable.
            expect(row.checks[i]).toMatchObject({ status: "not-applicable", criterion: "max-principal" });
            expect(check.status).toBe("not-applicable");
            continue;
          }
          if (check.status !== "evaluated") throw new Error("SA-516-70 has every strength");
          expect(row.checks[i]).toMatchObject({
            status: "evaluated",
            factor: check.factor,
            verdict: check.verdict,
            category: null,
          });
        }
      }
    }
  });

  it("when the design case at mid-shell is checked by hand, then von Mises is (√3/2)·pr/t and the factor is Sy over it", () => {
    // Plane membrane state σx = σθ/2: σvm = √(σθ² − σθ·σθ/2 + σθ²/4) = (√3/2)·σθ (common practice, no source).
    const row = comparison.rows.find((r) => r.caseName === "Design" && r.locationId === shell)!;
    expect(row.vonMisesPa / 1e6).toBeCloseTo((Math.sqrt(3) / 2) * 67.5, 9);
    const vm = row.checks.find((c) => c.criterion === "von-mises")!;
    if (vm.status !== "evaluated") throw new Error("evaluated");
    expect(vm.factor).toBeCloseTo(260 / ((Math.sqrt(3) / 2) * 67.5), 9);
  });

  it("when the governing case is asked for, then it is what core's findGoverning picks over the same rows, and the summary names it", () => {
    const order = [...Object.keys(pressures)];
    const coreRows = order.flatMap((name) =>
      [shell, junction].map((locationId) => ({
        caseId: name,
        locationId,
        evaluation: evaluateState(tensors.get(`${name}@${locationId}`)!, material, requirements),
      })),
    );
    const combined = [shell, junction].map((locationId) => ({
      caseId: "Operating + upset",
      locationId,
      evaluation: evaluateState(
        combineLoadCases([
          { factor: 1, tensor: tensors.get(`Operating@${locationId}`)! },
          { factor: 1, tensor: tensors.get(`Vacuum upset@${locationId}`)! },
        ]),
        material,
        requirements,
      ),
    }));
    const expected = findGoverning([...coreRows, ...combined]);
    expect(comparison.governing.map((g) => [g.criterion, g.caseName, g.factor])).toEqual(
      expected.map((g) => [g.criterion, g.caseId, g.check.factor]),
    );
    const vm = comparison.governing.find((g) => g.criterion === "von-mises")!;
    expect(vm).toMatchObject({ caseName: "Hydrostatic test", locationName: "head junction" });
    // Tresca governs: at the junction in the test σ1 = pr/2t + 70 = 113.875 MPa, σ3 = 0, so
    // n = 260 / 113.875 = 2.28 and u = 1.5 / 2.28 = 0.66, above von Mises' 0.60 (hand arithmetic).
    expect(comparison.summary).toBe(
      "governs: Hydrostatic test at head junction, Tresca, SF 2.28 against 1.5 required (the project default)",
    );
    expect(comparison.governingOverall).toMatchObject({ caseName: "Hydrostatic test", criterion: "tresca" });
  });

  it("when governing is asked per location, then each location's governing row is core's for that location", () => {
    const atShell = comparison.governingByLocation.find((g) => g.locationId === shell)!;
    expect(atShell.governing.find((g) => g.criterion === "tresca")).toMatchObject({
      caseName: "Hydrostatic test",
      locationName: "mid-shell",
    });
    // Tresca at mid-shell: σ1 − σ3 = σθ − 0 = pr/t, n = Sy / (pr/t) (common practice, no source).
    expect(atShell.governing.find((g) => g.criterion === "tresca")!.factor).toBeCloseTo(260 / hoop(1.17), 9);
  });

  it("when the combination is shown, then the superposition caution comes with it", () => {
    expect(comparison.cautions.join(" ")).toMatch(/superposition.*linear-elastic/);
    const combinationRow = comparison.rows.find((r) => r.kind === "combination" && r.locationId === shell)!;
    expect(combinationRow.componentsPa.xx).toBeCloseTo((hoop(0.75) + hoop(-0.1)) * 1e6, 3);
  });

  it("when a location has no material, then criteria are not evaluated and say which strengths are missing", async () => {
    const bare = await projectWithLocations(team, { name: "No material" }, ["somewhere"]);
    const p = wsPath(team, `/projects/${bare.projectId}`);
    await team.editor.agent
      .post(`${p}/load-cases`)
      .send({ name: "Any", states: [{ locationId: bare.locationIds[0], stress: mpa(100, 0) }] })
      .expect(201);
    const result = comparisonSchema.parse((await team.editor.agent.get(`${p}/comparison`).expect(200)).body);
    expect(result.rows[0].checks[0]).toEqual({
      status: "not-evaluated",
      criterion: "von-mises",
      requiredFactor: 1.5,
      category: null,
      missing: ["yield"],
      reason: "needs the yield strength Sy",
    });
    expect(result.summary).toBeNull();
  });

  it("when an editor saves a larger state, then the comparison updates and the governing case follows", async () => {
    const list = await team.editor.agent.get(`${base}/load-cases`).expect(200);
    const operating = list.body.loadCases.find((c: { name: string }) => c.name === "Operating");
    await team.editor.agent
      .put(`${base}/load-cases/${operating.id}/states/${shell}`)
      .send({ version: operating.version, stress: mpa(200, 100) })
      .expect(200);
    const after = comparisonSchema.parse(
      (await team.viewer.agent.get(`${base}/comparison`).expect(200)).body,
    );
    expect(after.governing.find((g) => g.criterion === "von-mises")).toMatchObject({
      caseName: "Operating",
      locationName: "mid-shell",
    });
    expect(after.summary).toMatch(/^governs: Operating at mid-shell/);
  });

  it("when a workspace material's yield is edited, then the next comparison's factors follow it (answers are never reused across changed inputs)", async () => {
    const created = await team.editor.agent
      .post(wsPath(team, "/materials"))
      .send({ name: "Shell plate, heat 20", unit: "MPa", yield: 300, ultimateTension: 500 })
      .expect(201);
    const materialId = created.body.material.id;
    const made = await projectWithLocations(
      team,
      { name: "Library edit", requirements, defaultMaterial: { kind: "workspace", id: materialId } },
      ["plate"],
    );
    const p = wsPath(team, `/projects/${made.projectId}`);
    await team.editor.agent
      .post(`${p}/load-cases`)
      .send({ name: "Uniaxial", states: [{ locationId: made.locationIds[0], stress: mpa(100, 0) }] })
      .expect(201);
    const factorOf = async () => {
      const result = comparisonSchema.parse(
        (await team.viewer.agent.get(`${p}/comparison`).expect(200)).body,
      );
      const check = result.rows[0].checks.find((c) => c.criterion === "von-mises")!;
      return check.status === "evaluated" ? check.factor : undefined;
    };
    // Uniaxial 100 MPa: von Mises = 100 MPa, so the factor is Sy / 100 MPa (the definition of
    // the von Mises safety factor; common practice, no source).
    expect(await factorOf()).toBeCloseTo(3, 12);
    expect(await factorOf()).toBeCloseTo(3, 12); // the same inputs answer the same
    await team.editor.agent
      .patch(wsPath(team, `/materials/${materialId}`))
      .send({ version: 1, unit: "MPa", yield: 250 })
      .expect(200);
    expect(await factorOf()).toBeCloseTo(2.5, 12);
  });
});
