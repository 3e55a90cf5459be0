import { afterAll, describe, expect, inject, it } from "vitest";
import { comparisonSchema, type Comparison } from "../../core/contract/comparison";
import { loadCaseListSchema } from "../../core/contract/load-cases";
import { materialListSchema } from "../../core/contract/materials";
import { locationListSchema, projectResponseSchema, type Project } from "../../core/contract/projects";
import { ensureDatabase } from "../../db/ensure-database";
import { migrate } from "../../db/migrate";
import { seedDemo } from "../../db/seed";
import { criteriaResults } from "../../web/src/features/bench/model/derive";
import {
  benchFieldsOf,
  benchMaterialOf,
  combinationRequirementsFor,
  projectRequirementsFor,
} from "../../web/src/features/bench/model/project-requirements";
import { browserAgent } from "../support/accounts";
import { buildTestApp } from "../support/app";

/**
 * The bench and the comparison must give the same verdict for the same saved state: for every
 * row of the comparison, the state is opened the way the bench opens it from that row (a load
 * case's saved tensor and unit with its category's factors; a combination's superposed tensor
 * with the project default; the location's material in MPa; the project's choice on unsuited
 * criteria) and rated by the bench's own model; each check must match the comparison's —
 * status, required factor, category, factor and verdict.
 */
describe("the bench and the comparison agree on every row", () => {
  const adminUrl = inject("adminUrl");
  const databaseUrl = adminUrl.replace(/\/postgres$/, "/sigmacube_bench_agreement");
  let closeApp: () => Promise<void> = async () => {};
  afterAll(() => closeApp());

  type Agent = ReturnType<typeof browserAgent>;

  async function compareEveryRow(agent: Agent, base: string, workspaceId: string) {
    const comparison: Comparison = comparisonSchema.parse(
      (await agent.get(`${base}/comparison`).expect(200)).body,
    );
    const project: Project = projectResponseSchema.parse((await agent.get(base).expect(200)).body).project;
    const { loadCases } = loadCaseListSchema.parse((await agent.get(`${base}/load-cases`).expect(200)).body);
    const { locations } = locationListSchema.parse((await agent.get(`${base}/locations`).expect(200)).body);
    const materials = materialListSchema.parse(
      (await agent.get(`/api/workspaces/${workspaceId}/materials`).expect(200)).body,
    );
    let compared = 0;
    for (const row of comparison.rows) {
      const location = locations.find((l) => l.id === row.locationId)!;
      const material = benchMaterialOf(location.material ?? project.defaultMaterial, materials)!;
      // A load case opens with its saved tensor and its category's factors; a combination opens
      // with its superposed tensor (the link carries it) and the project default.
      const loadCase = loadCases.find((c) => c.id === row.caseId);
      const fields =
        row.kind === "load-case"
          ? benchFieldsOf(loadCase!, location.id)!
          : { tensor: row.componentsPa, unit: "Pa" as const };
      const { requirements } =
        row.kind === "load-case"
          ? projectRequirementsFor(project, loadCase!.category)
          : combinationRequirementsFor(project);
      const bench = criteriaResults(fields.tensor, fields.unit, material, requirements, {
        includeUnsuited: project.includeUnsuitedCriteria,
      });
      for (const check of row.checks) {
        const b = bench.find((r) => r.criterion === check.criterion)!;
        const where = `${row.caseName} at ${row.locationName}, ${check.criterion}`;
        expect(b.requiredFactor, where).toBe(check.requiredFactor);
        if (check.status === "evaluated") {
          if (!b.available)
            throw new Error(`${where}: the bench says "${b.reason}", the comparison rates it`);
          expect(b.verdict, where).toBe(check.verdict);
          expect(b.category, where).toBe(check.category);
          if (check.factor === null) expect(b.n, where).toBe(Infinity);
          else expect(Math.abs(b.n - check.factor), where).toBeLessThanOrEqual(1e-9 * check.factor);
        } else {
          expect(b.available, where).toBe(false);
          if (!b.available)
            expect(b.kind === "not-applicable", where).toBe(check.status === "not-applicable");
        }
        compared += 1;
      }
    }
    return { compared, comparison };
  }

  it("when the demo is seeded, and again after the shell project is given factors per category and asks for unsuited criteria, then every check of every row (load cases and combinations) has the bench's verdict and factor", async () => {
    await ensureDatabase(adminUrl, "sigmacube_bench_agreement");
    const { app, context, close } = buildTestApp({ databaseUrl, webDist: null });
    closeApp = close;
    await migrate(context.sequelize);
    const lines: string[] = [];
    await seedDemo(context.sequelize, (l) => lines.push(l));
    const line = lines.find((l) => l.includes("teo.valdric@quillon.example"))!;
    const agent = browserAgent(app);
    await agent
      .post("/api/auth/sign-in")
      .send({ email: "teo.valdric@quillon.example", password: line.trim().split(/\s+/).pop() })
      .expect(200);
    const [workspace] = (await agent.get("/api/workspaces").expect(200)).body.workspaces;
    const { projects } = (await agent.get(`/api/workspaces/${workspace.id}/projects`).expect(200)).body;
    let total = 0;
    for (const p of projects as { id: string }[]) {
      const { compared } = await compareEveryRow(
        agent,
        `/api/workspaces/${workspace.id}/projects/${p.id}`,
        workspace.id,
      );
      total += compared;
    }
    expect(total).toBeGreaterThan(20);

    // The shell project with allowables per category: a lower factor for the hydrostatic test, a
    // different one for the upset, and the unsuited criteria rated on request.
    const shell = (
      projects as { id: string; name: string; version: number; requirements: { criterion: string }[] }[]
    ).find((p) => p.name === "CT-7 shell and heads")!;
    const base = `/api/workspaces/${workspace.id}/projects/${shell.id}`;
    const criteria = shell.requirements.map((r) => r.criterion);
    await agent
      .patch(base)
      .send({
        version: shell.version,
        requirements: [
          ...shell.requirements,
          ...(criteria.includes("max-principal") ? [] : [{ criterion: "max-principal", requiredFactor: 3 }]),
        ],
        categoryRequirements: [
          { category: "test", factors: { tresca: 1.1, "von-mises": 1.1 } },
          { category: "upset", factors: { tresca: 1.8 } },
        ],
        includeUnsuitedCriteria: true,
      })
      .expect(200);
    const { compared, comparison } = await compareEveryRow(agent, base, workspace.id);
    expect(compared).toBeGreaterThan(8);
    // The per-category factors were really in play: the test rows used 1.1, and the summary names its allowables.
    const testRow = comparison.rows.find((r) => r.category === "test")!;
    expect(testRow.checks.find((c) => c.criterion === "tresca")).toMatchObject({
      requiredFactor: 1.1,
      category: "test",
    });
    expect(
      comparison.rows.some((r) => r.checks.some((c) => c.status === "evaluated" && c.unsuited !== null)),
    ).toBe(true);
  });
});
