import { afterAll, describe, expect, inject, it } from "vitest";
import { comparisonPageSchema, comparisonSchema } from "../../core/contract/comparison";
import { ensureDatabase } from "../../db/ensure-database";
import { migrate } from "../../db/migrate";
import { seedDemo } from "../../db/seed";
import { freezeForSeed } from "../../api/domain/records/seed-freeze";
import { recordDetailSchema, recordListSchema } from "../../core/contract/records";
import { recordHash } from "../../api/domain/records/content";
import { buildTestApp } from "../support/app";
import { browserAgent } from "../support/accounts";

describe("the demo seed's projects step", () => {
  const adminUrl = inject("adminUrl");
  const databaseUrl = adminUrl.replace(/\/postgres$/, "/sigmacube_seed_projects");
  let closeApp: () => Promise<void> = async () => {};
  afterAll(() => closeApp());

  it("when the demo is seeded, then the CT-7 projects are there, the hydrostatic test governs at the junction and fails 1.5, the rest pass, and the shaft has an approved record and the shell one returned with comments", async () => {
    await ensureDatabase(adminUrl, "sigmacube_seed_projects");
    const { app, context, close } = buildTestApp({ databaseUrl, webDist: null });
    closeApp = close;
    await migrate(context.sequelize);
    const lines: string[] = [];
    await seedDemo(context.sequelize, (l) => lines.push(l), freezeForSeed(context.sequelize));
    const line = lines.find((l) => l.includes("ines.okafor-lund@quillon.example"))!;
    const agent = browserAgent(app);
    await agent
      .post("/api/auth/sign-in")
      .send({ email: "ines.okafor-lund@quillon.example", password: line.trim().split(/\s+/).pop() })
      .expect(200);
    const [workspace] = (await agent.get("/api/workspaces").expect(200)).body.workspaces;
    const { projects } = (await agent.get(`/api/workspaces/${workspace.id}/projects`).expect(200)).body;
    expect(projects.map((p: { name: string }) => p.name)).toEqual([
      "CT-7 agitator shaft",
      "CT-7 lifting lug",
      "CT-7 nozzle N2 (FE points)",
      "CT-7 shell and heads",
    ]);
    const compare = async (name: string) => {
      const p = projects.find((x: { name: string }) => x.name === name);
      return comparisonSchema.parse(
        (await agent.get(`/api/workspaces/${workspace.id}/projects/${p.id}/comparison`).expect(200)).body,
      );
    };

    const shell = await compare("CT-7 shell and heads");
    expect(shell.rows).toHaveLength(8);
    // Hand check of the governing row: σx = pr/2t + 133p = 43.875 + 155.61 = 199.49 MPa at 1.17 MPa,
    // σθ = pr/t = 87.75 MPa, σ3 = 0; Tresca n = 260 / 199.49 = 1.30 (< 1.5 required).
    expect(shell.summary).toBe(
      "governs: Hydrostatic test at head-to-shell junction, Tresca, SF 1.30 against 1.5 required (the project default)",
    );
    const failing = shell.rows.filter((r) =>
      r.checks.some((c) => c.status === "evaluated" && c.verdict === "fail"),
    );
    expect(failing.map((r) => `${r.caseName} @ ${r.locationName}`)).toEqual([
      "Hydrostatic test @ head-to-shell junction",
    ]);
    // Mid-shell design: σvm = (√3/2)·pr/t = 58.46 MPa (thin-wall membrane, common practice).
    const design = shell.rows.find((r) => r.caseName === "Design" && r.locationName === "mid-shell")!;
    expect(design.vonMisesPa / 1e6).toBeCloseTo((Math.sqrt(3) / 2) * 67.5, 6);

    const shaft = await compare("CT-7 agitator shaft");
    // Steady running: σ = 32·420e3/(π·45³) + 4·3000/(π·45²) = 46.95 + 1.89 MPa, τ = 16·850e3/(π·45³) = 47.51 MPa.
    const steady = shaft.rows.find((r) => r.caseName === "Steady running")!;
    expect(steady.componentsPa.xx / 1e6).toBeCloseTo(48.83, 2);
    expect(steady.componentsPa.xy / 1e6).toBeCloseTo(47.51, 2);
    expect(shaft.governing.every((g) => g.verdict !== "fail")).toBe(true);

    const lug = await compare("CT-7 lifting lug");
    expect(lug.rows.some((r) => r.kind === "combination")).toBe(true);
    // The rosette was read at the weld toe only: the pin hole has no state for it, and says so.
    expect(lug.skipped).toEqual([
      {
        caseName: "Proof load (rosette)",
        locationName: "pin hole net section",
        reason: "no stress state entered here",
      },
    ]);
    expect(lug.cautions.join(" ")).toMatch(/superposition/);
    // Rosette: σx = E/(1−ν²)(εx + νεy) = 210000/0.91 × 393e-6 = 90.69 MPa (rectangular rosette equations).
    const proof = lug.rows.find((r) => r.caseName === "Proof load (rosette)")!;
    expect(proof.componentsPa.xx / 1e6).toBeCloseTo(90.69, 2);
    // The rosette state keeps its readings, E and ν as the rosette calculator's inputs.
    const lugProject = projects.find((x: { name: string }) => x.name === "CT-7 lifting lug");
    const lugCases = (
      await agent.get(`/api/workspaces/${workspace.id}/projects/${lugProject.id}/load-cases`).expect(200)
    ).body.loadCases;
    const rosette = lugCases.find((c: { name: string }) => c.name === "Proof load (rosette)").states[0];
    expect(rosette.calculator).toMatchObject({
      name: "rosette",
      inputs: {
        numbers: {
          e1: { value: 420, unit: "µε" },
          E: { value: 210, unit: "GPa" },
          nu: { value: 0.3, unit: "" },
        },
      },
    });
    // The proof-factored tilted lift at the weld toe comes close to 1.8 without failing.
    expect(lug.governing.map((g) => g.verdict)).toEqual(["close", "close"]);

    const nozzleProject = projects.find((x: { name: string }) => x.name === "CT-7 nozzle N2 (FE points)");
    const nozzle = comparisonPageSchema.parse(
      (await agent.get(`/api/workspaces/${workspace.id}/projects/${nozzleProject.id}/comparison`).expect(200))
        .body,
    );
    expect(nozzle.rows).toEqual([]);
    // The hydrostatic test's point table: the bore's edge on the x axis carries the peak hoop stress,
    // 3·σθ − σx = 2.5·σθ for a hole in a 1 : 2 biaxial membrane field (Kirsch's solution, handbook
    // formula, recalled from memory), σθ = p·r/t = 1.17 × 600 / 8 MPa; von Mises there is that one
    // stress (σr = 0 at a free edge). SA-516-70's Sy is 260 MPa in core's list.
    const [table] = nozzle.pointTables!;
    expect(table).toMatchObject({ caseName: "Hydrostatic test", pointCount: 30_000 });
    const vm = table.perCriterion[0];
    expect(vm).toMatchObject({
      criterion: "von-mises",
      verdict: "fail",
      governing: { id: 200_001, x: 50, y: 0 },
    });
    expect(vm.factor!).toBeCloseTo(260 / (2.5 * ((1.17 * 600) / 8)), 4);
    // one small region fails: a few rings near the bore, on either side of the x axis
    expect(vm.countFail).toBeGreaterThan(0);
    expect(vm.countFail).toBeLessThan(0.02 * 30_000);
    expect(nozzle.summary).toContain('point 200001 of "ct7-n2-hydrotest-points.csv"');

    // The demo's calculation records: the shaft approved by someone other than its originator,
    // the shell returned with a comment on the record and one on the failing row.
    const recordsOf = async (name: string) => {
      const p = projects.find((x: { name: string }) => x.name === name);
      const base = `/api/workspaces/${workspace.id}/projects/${p.id}`;
      const { records } = recordListSchema.parse((await agent.get(`${base}/records`).expect(200)).body);
      expect(records).toHaveLength(1);
      const detail = recordDetailSchema.parse(
        (await agent.get(`${base}/records/${records[0].id}`).expect(200)).body,
      );
      expect(recordHash(detail.content)).toBe(detail.hash);
      return detail;
    };
    const approved = await recordsOf("CT-7 agitator shaft");
    expect(approved.status).toBe("approved");
    expect(approved.submittedBy.name).toBe("Teo Valdric");
    expect(approved.approvals.map((a) => a.by.name)).toEqual(["Ines Okafor-Lund"]);
    // Nothing changed after the approval, so the demo's review does not warn that results differ.
    const shaftProject = projects.find((x: { name: string }) => x.name === "CT-7 agitator shaft");
    const review = (
      await agent.get(`/api/workspaces/${workspace.id}/projects/${shaftProject.id}/review`).expect(200)
    ).body;
    expect(review.status).toBe("approved");
    expect(review.currentDiffersFromApproved).toBe(false);
    const returned = await recordsOf("CT-7 shell and heads");
    expect(returned.status).toBe("returned");
    expect(returned.returned?.by.name).toBe("Ines Okafor-Lund");
    expect(returned.submittedBy.name).toBe("Teo Valdric");
    const rowComment = returned.comments.find((c) => c.rowId !== null)!;
    const commentedRow = returned.content.results.rows.find((r) => r.rowId === rowComment.rowId)!;
    expect(`${commentedRow.caseName} @ ${commentedRow.locationName}`).toBe(
      "Hydrostatic test @ head-to-shell junction",
    );
    expect(returned.comments.some((c) => c.rowId === null)).toBe(true);
  });
});
