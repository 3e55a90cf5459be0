import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { comparisonSchema } from "../../core/contract/comparison";
import { Project } from "../../db/models/project";
import * as migration from "../../db/migrations/20261203-0743-add-category-requirements";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
beforeAll(async () => {
  team = await projectTeam(app);
});

const defaults = [
  { criterion: "von-mises", requiredFactor: 1.5 },
  { criterion: "tresca", requiredFactor: 2 },
];

describe("allowables per load-case category (projects routes)", () => {
  it("when an editor gives factors per category, then the project keeps them beside the default and a change is versioned and audited", async () => {
    const made = await projectWithLocations(
      team,
      {
        name: "Categories",
        requirements: defaults,
        categoryRequirements: [{ category: "test", factors: { "von-mises": 1.1, tresca: 1.25 } }],
      },
      [],
    );
    const path = wsPath(team, `/projects/${made.projectId}`);
    const got = (await team.viewer.agent.get(path).expect(200)).body.project;
    expect(got).toMatchObject({
      requirements: defaults,
      categoryRequirements: [{ category: "test", factors: { "von-mises": 1.1, tresca: 1.25 } }],
      includeUnsuitedCriteria: false,
    });
    const changed = await team.editor.agent
      .patch(path)
      .send({
        version: got.version,
        categoryRequirements: [
          { category: "test", factors: { "von-mises": 1.1 } },
          { category: "Hydro-proof", factors: { tresca: 1.3 } },
        ],
        includeUnsuitedCriteria: true,
      })
      .expect(200);
    expect(changed.body.project.version).toBe(got.version + 1);
    expect(changed.body.project.categoryRequirements[1]).toEqual({
      category: "Hydro-proof",
      factors: { tresca: 1.3 },
    });
    expect(changed.body.project.includeUnsuitedCriteria).toBe(true);
    const audit = await team.viewer.agent.get(wsPath(team, `/audit?entityId=${made.projectId}`)).expect(200);
    const update = audit.body.events.find((e: { action: string }) => e.action === "update");
    expect(Object.keys(update.changes).sort()).toEqual(["categoryRequirements", "includeUnsuitedCriteria"]);
  });

  it("when a category repeats, gives a factor of zero, or names a criterion the project does not check, then 400 names the field and nothing changes", async () => {
    const twice = await team.editor.agent.post(wsPath(team, "/projects")).send({
      name: "Twice",
      requirements: defaults,
      categoryRequirements: [
        { category: "test", factors: {} },
        { category: " Test ", factors: {} },
      ],
    });
    expect(twice.status).toBe(400);
    expect(twice.body.error.details[0]).toMatchObject({ path: "categoryRequirements.1.category" });
    const zero = await team.editor.agent.post(wsPath(team, "/projects")).send({
      name: "Zero",
      requirements: defaults,
      categoryRequirements: [{ category: "test", factors: { tresca: 0 } }],
    });
    expect(zero.status).toBe(400);
    expect(zero.body.error.details[0].path).toBe("categoryRequirements.0.factors.tresca");
    const stray = await team.editor.agent.post(wsPath(team, "/projects")).send({
      name: "Stray",
      requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
      categoryRequirements: [{ category: "upset", factors: { tresca: 1.2 } }],
    });
    expect(stray.status).toBe(400);
    expect(stray.body.error.details[0]).toMatchObject({
      path: "categoryRequirements.0.factors.tresca",
      message: expect.stringMatching(/does not check Tresca/),
    });

    // Dropping a criterion from the default while a category still gives it a factor is refused too.
    const made = await projectWithLocations(
      team,
      {
        name: "Keep",
        requirements: defaults,
        categoryRequirements: [{ category: "upset", factors: { tresca: 1.2 } }],
      },
      [],
    );
    const path = wsPath(team, `/projects/${made.projectId}`);
    const drop = await team.editor.agent
      .patch(path)
      .send({ version: 1, requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }] });
    expect(drop.status).toBe(400);
    expect(drop.body.error.details[0].path).toBe("categoryRequirements.0.factors.tresca");
    const after = (await team.viewer.agent.get(path).expect(200)).body.project;
    expect(after).toMatchObject({ version: 1, requirements: defaults });
  });
});

describe("the migration that adds category allowables", () => {
  it("when it is undone and applied again over an existing project, then the project's requirements survive as the default with no category factors (up → down → up)", async () => {
    const sequelize = Project.sequelize!;
    const rollback = new Error("roll back the schema test");
    const seen: unknown[] = [];
    await expect(
      sequelize.transaction(async (transaction) => {
        const context = { queryInterface: sequelize.getQueryInterface(), sequelize, transaction };
        await migration.down(context);
        const [columns] = await sequelize.query(
          `select column_name from information_schema.columns where table_name = 'projects' and column_name in ('category_requirements', 'include_unsuited_criteria')`,
          { transaction },
        );
        seen.push(columns);
        // A project as it was stored before the migration.
        await sequelize.query(
          `insert into projects (workspace_id, name, requirements) values ('${team.workspaceId}', 'Before categories', '[{"criterion":"tresca","requiredFactor":1.8},{"criterion":"von-mises","requiredFactor":1.6}]')`,
          { transaction },
        );
        await migration.up(context);
        const [rows] = await sequelize.query(
          `select requirements, category_requirements, include_unsuited_criteria from projects where name = 'Before categories'`,
          { transaction },
        );
        seen.push(rows);
        throw rollback;
      }),
    ).rejects.toBe(rollback);
    expect(seen[0]).toEqual([]);
    expect(seen[1]).toEqual([
      {
        requirements: [
          { criterion: "tresca", requiredFactor: 1.8 },
          { criterion: "von-mises", requiredFactor: 1.6 },
        ],
        category_requirements: [],
        include_unsuited_criteria: false,
      },
    ]);
    // Rolled back: the table is as the migrations left it.
    expect(await Project.count({ where: { name: "Before categories" } })).toBe(0);
  });
});

describe("the comparison with factors per category", () => {
  it("when a test case is checked against its own lower factor, then its rows use it, say so, and the governing search weighs each row against its own factor", async () => {
    const made = await projectWithLocations(
      team,
      {
        name: "Vessel with category allowables",
        requirements: defaults,
        categoryRequirements: [{ category: "test", factors: { "von-mises": 1.1, tresca: 1.25 } }],
        defaultMaterial: { kind: "published", id: "s355" },
      },
      ["shell"],
    );
    const base = wsPath(team, `/projects/${made.projectId}`);
    const [shell] = made.locationIds;
    // Uniaxial σ: von Mises and Tresca n = Sy/σ = 355/σ (common practice, no source).
    for (const [name, category, s] of [
      ["Design", "design", 150],
      ["Hydrotest", "Test", 250],
      ["Untagged", "", 100],
    ] as const) {
      await team.editor.agent
        .post(`${base}/load-cases`)
        .send({ name, category, states: [{ locationId: shell, stress: mpa(s, 0) }] })
        .expect(201);
    }
    const c = comparisonSchema.parse((await team.viewer.agent.get(`${base}/comparison`).expect(200)).body);
    const row = (name: string) => c.rows.find((r) => r.caseName === name)!;
    expect(row("Hydrotest").allowable).toEqual({ category: "test", label: "the “test” factors" });
    expect(row("Hydrotest").checks).toEqual([
      expect.objectContaining({
        criterion: "von-mises",
        requiredFactor: 1.1,
        category: "test",
        verdict: "pass",
      }),
      expect.objectContaining({
        criterion: "tresca",
        requiredFactor: 1.25,
        category: "test",
        verdict: "pass",
      }),
    ]);
    expect(row("Design").allowable).toEqual({
      category: null,
      label: "the project default (no factors given for “design”)",
    });
    expect(row("Untagged").allowable.label).toBe("the project default");
    // Design: n = 355/150 = 2.367; Tresca u = 2/2.367 = 0.845. Hydrotest: n = 1.42; Tresca u = 1.25/1.42 = 0.880.
    const tresca = c.governing.find((g) => g.criterion === "tresca")!;
    expect(tresca).toMatchObject({ caseName: "Hydrotest", requiredFactor: 1.25, category: "test" });
    expect(tresca.utilisation).toBeCloseTo((1.25 * 250) / 355, 12);
    // Von Mises: design u = 1.5·150/355 = 0.634; hydrotest u = 1.1·250/355 = 0.775.
    expect(c.summary).toBe(
      "governs: Hydrotest at shell, Tresca, SF 1.42 against 1.25 required (the “test” factors)",
    );
  });
});
