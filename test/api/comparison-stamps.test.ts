import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { QueryTypes, type Transaction } from "sequelize";
import { comparisonQuerySchema } from "../../core/contract/comparison";
import { comparisonInputFrom, loadComparisonSource, PROJECT_SQL } from "../../api/domain/comparison/load";
import { comparisonPageWithSections } from "../../api/domain/comparison/sections";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

/**
 * The comparison's answer is kept by the stamp of its inputs (db/comparison-stamps.ts): these
 * tests make every kind of change to every table the comparison reads, through the API and
 * straight in SQL, and check that the next answer is the one computed afresh from the database,
 * never the kept one.
 */

const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

const sequelize = context.sequelize;
const query = comparisonQuerySchema.parse({});

let team: ProjectTeam;
let projectId: string;
let base: string;
let plate: string;
let weld: string;
let materialId: string;
const caseIds: Record<string, string> = {};
let combinationId: string;
let otherProjectId: string;

/** Runs `sql` with `replacements` (in `transaction` when given) and returns its rows. */
async function sql<Row extends object>(
  text: string,
  replacements: Record<string, unknown> = {},
  transaction?: Transaction,
): Promise<Row[]> {
  return sequelize.query<Row>(text, { type: QueryTypes.SELECT, replacements, transaction });
}

/** Every statement the app sends while `run` runs (Sequelize's logging hook; prepared ones log too). */
async function statementsDuring(run: () => Promise<unknown>): Promise<string[]> {
  const statements: string[] = [];
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  const before = options.logging;
  options.logging = (text: string) => void statements.push(text);
  try {
    await run();
  } finally {
    options.logging = before;
  }
  return statements;
}

/** The comparison as the API answers it now. */
async function served(): Promise<unknown> {
  return (await team.viewer.agent.get(`${base}/comparison`).expect(200)).body;
}

/** The comparison computed afresh from what the database holds now, bypassing every kept answer. */
async function computedAfresh(): Promise<unknown> {
  const loaded = await loadComparisonSource(sequelize, team.workspaceId, projectId);
  if (!loaded) throw new Error("the project is not live");
  return JSON.parse(
    JSON.stringify(await comparisonPageWithSections(comparisonInputFrom(projectId, loaded.source), query)),
  );
}

/** The answer the API gives now, after checking it was kept (one statement: the session with the stamp). */
async function keptAnswer(): Promise<unknown> {
  await served();
  let body: unknown;
  const statements = await statementsDuring(async () => (body = await served()));
  expect(statements, "the second read of an unchanged comparison is sent from the kept answer").toHaveLength(
    1,
  );
  return body;
}

/** Makes a change, then checks the API's answer changed and is the one computed afresh. */
async function expectChangedBy(change: () => Promise<unknown>): Promise<void> {
  const before = await keptAnswer();
  await change();
  const after = await served();
  expect(after).not.toEqual(before);
  expect(after).toEqual(await computedAfresh());
}

async function currentVersion(kind: "load-cases" | "locations" | "combinations", id: string) {
  return (await team.editor.agent.get(`${base}/${kind}/${id}`).expect(200)).body;
}

async function stampsOf(...scopes: string[]): Promise<Record<string, number>> {
  const rows = await sql<{ scope_id: string; stamp: string }>(
    `select scope_id, stamp from comparison_stamps where scope_id in (:scopes)`,
    { scopes },
  );
  return Object.fromEntries(scopes.map((s) => [s, Number(rows.find((r) => r.scope_id === s)?.stamp ?? 0)]));
}

beforeAll(async () => {
  team = await projectTeam(app);
  const material = await team.editor.agent
    .post(wsPath(team, "/materials"))
    .send({ name: "Plate, heat 77", unit: "MPa", yield: 300, ultimateTension: 450, ultimateCompression: 450 })
    .expect(201);
  materialId = material.body.material.id;
  const made = await projectWithLocations(
    team,
    { name: "Stamped", defaultMaterial: { kind: "published", id: "sa516-70" } },
    ["plate", "weld toe"],
  );
  projectId = made.projectId;
  [plate, weld] = made.locationIds;
  base = wsPath(team, `/projects/${projectId}`);
  const version = (await team.editor.agent.get(`${base}/locations/${plate}`).expect(200)).body.location
    .version;
  await team.editor.agent
    .patch(`${base}/locations/${plate}`)
    .send({ version, material: { kind: "workspace", id: materialId } })
    .expect(200);
  for (const [name, scale] of [
    ["Operating", 1],
    ["Test", 1.4],
  ] as const) {
    const created = await team.editor.agent
      .post(`${base}/load-cases`)
      .send({
        name,
        states: [
          { locationId: plate, stress: mpa(100 * scale, 40 * scale) },
          { locationId: weld, stress: mpa(80 * scale, 20 * scale, 0, 15 * scale) },
        ],
      })
      .expect(201);
    caseIds[name] = created.body.loadCase.id;
  }
  const combination = await team.editor.agent
    .post(`${base}/combinations`)
    .send({
      name: "Operating + test",
      terms: [
        { loadCaseId: caseIds.Operating, factor: 1 },
        { loadCaseId: caseIds.Test, factor: 0.5 },
      ],
    })
    .expect(201);
  combinationId = combination.body.combination.id;
  otherProjectId = (await projectWithLocations(team, { name: "Bystander" }, ["elsewhere"])).projectId;
});

describe("every table the comparison reads raises the stamp", () => {
  it("when the comparison's input statement names a table, then that table carries the three stamp triggers (a new input table needs watchComparisonInputs in its migration)", async () => {
    const tables = [...new Set([...PROJECT_SQL.matchAll(/\b(?:FROM|JOIN)\s+([a-z_]+)/gi)].map((m) => m[1]))];
    expect(tables).toEqual(expect.arrayContaining(["projects", "stress_states", "materials"]));
    const triggers = await sql<{ name: string }>(
      `select tgname as name from pg_trigger where not tgisinternal and tgname like '%_comparison_stamp_%'`,
    );
    const names = new Set(triggers.map((t) => t.name));
    const missing = tables
      .filter((t) => t !== "comparison_stamps")
      .flatMap((t) => ["insert", "update", "delete"].map((event) => `${t}_comparison_stamp_${event}`))
      .filter((name) => !names.has(name));
    expect(missing).toEqual([]);
  });
});

describe("the comparison after every kind of change through the API", () => {
  it("when a state is saved, then the answer is computed afresh", async () => {
    await expectChangedBy(async () => {
      const { loadCase } = await currentVersion("load-cases", caseIds.Operating);
      await team.editor.agent
        .put(`${base}/load-cases/${caseIds.Operating}/states/${plate}`)
        .send({ version: loadCase.version, stress: mpa(150, 40) })
        .expect(200);
    });
  });

  it("when a load case is renamed, then the answer is computed afresh", async () => {
    await expectChangedBy(async () => {
      const { loadCase } = await currentVersion("load-cases", caseIds.Test);
      await team.editor.agent
        .patch(`${base}/load-cases/${caseIds.Test}`)
        .send({ version: loadCase.version, name: "Hydrotest" })
        .expect(200);
    });
  });

  it("when a location is renamed, then the answer is computed afresh", async () => {
    await expectChangedBy(async () => {
      const { location } = await currentVersion("locations", weld);
      await team.editor.agent
        .patch(`${base}/locations/${weld}`)
        .send({ version: location.version, name: "weld toe, north" })
        .expect(200);
    });
  });

  it("when a workspace material's strength changes, then the answer of a project using it is computed afresh", async () => {
    await expectChangedBy(async () => {
      const material = await team.editor.agent.get(wsPath(team, `/materials/${materialId}`)).expect(200);
      await team.editor.agent
        .patch(wsPath(team, `/materials/${materialId}`))
        .send({ version: material.body.material.version, unit: "MPa", yield: 200 })
        .expect(200);
    });
  });

  it("when a location's material is changed, then the answer is computed afresh", async () => {
    await expectChangedBy(async () => {
      const { location } = await currentVersion("locations", weld);
      await team.editor.agent
        .patch(`${base}/locations/${weld}`)
        .send({ version: location.version, material: { kind: "workspace", id: materialId } })
        .expect(200);
    });
  });

  it("when a combination's factors change, then the answer is computed afresh", async () => {
    await expectChangedBy(async () => {
      const { combination } = await currentVersion("combinations", combinationId);
      await team.editor.agent
        .patch(`${base}/combinations/${combinationId}`)
        .send({
          version: combination.version,
          terms: [
            { loadCaseId: caseIds.Operating, factor: 1.2 },
            { loadCaseId: caseIds.Test, factor: 0.5 },
          ],
        })
        .expect(200);
    });
  });

  it("when the project's required factors change, then the answer is computed afresh", async () => {
    await expectChangedBy(async () => {
      const project = await team.editor.agent.get(base).expect(200);
      await team.editor.agent
        .patch(base)
        .send({
          version: project.body.project.version,
          requirements: [{ criterion: "tresca", requiredFactor: 2 }],
        })
        .expect(200);
    });
  });

  it("when a stress classification line is saved in a case, then the answer is computed afresh", async () => {
    const points = Array.from({ length: 5 }, (_, i) => ({
      distance: i,
      xx: 0,
      yy: 100 - 10 * i,
      zz: 0,
      xy: 0,
      yz: 0,
      zx: 0,
    }));
    await expectChangedBy(() =>
      team.editor.agent
        .post(`${base}/load-cases/${caseIds.Test}/linearizations`)
        .send({
          name: "Wall at the nozzle",
          locationId: null,
          path: {
            positions: "distance",
            lengthUnit: "mm",
            stressUnit: "MPa",
            lineDirection: [1, 0, 0],
            points,
          },
          secondAxis: [0, 1, 0],
          classification: { membrane: "general", stresses: "primary" },
          allowables: { source: "typed", S: 138 },
        })
        .expect(201),
    );
  });

  it("when a location is added, then the answer is computed afresh", async () => {
    await expectChangedBy(() =>
      team.editor.agent.post(`${base}/locations`).send({ name: "nozzle" }).expect(201),
    );
  });

  it("when a load case is deleted and then restored from the trash, then each answer is computed afresh", async () => {
    await expectChangedBy(() => team.editor.agent.delete(`${base}/load-cases/${caseIds.Test}`).expect(204));
    await expectChangedBy(() =>
      team.editor.agent.post(wsPath(team, `/trash/load-case/${caseIds.Test}/restore`)).expect(204),
    );
  });

  it("when a combination is deleted, then the answer is computed afresh", async () => {
    await expectChangedBy(() =>
      team.editor.agent.delete(`${base}/combinations/${combinationId}`).expect(204),
    );
  });

  it("when the project is deleted, then its comparison is 404 at once, not the kept answer", async () => {
    const doomed = await projectWithLocations(team, { name: "Doomed" }, ["here"]);
    const path = wsPath(team, `/projects/${doomed.projectId}`);
    await team.viewer.agent.get(`${path}/comparison`).expect(200);
    await team.viewer.agent.get(`${path}/comparison`).expect(200);
    await team.editor.agent.delete(path).expect(204);
    await team.viewer.agent.get(`${path}/comparison`).expect(404);
  });
});

describe("the comparison after a change made straight in the database, table by table", () => {
  // Every statement kind (insert, update, delete) on every watched table, as another process or
  // a later migration might make it: the triggers, not the routes, keep the stamp.
  const changes: [string, () => Promise<unknown>][] = [
    [
      "projects (update)",
      () =>
        sql(
          `update projects set include_unsuited_criteria = not include_unsuited_criteria, requirements = '[{"criterion":"von-mises","requiredFactor":1.7}]' where id = :projectId`,
          { projectId },
        ),
    ],
    [
      "locations (update)",
      () => sql(`update locations set name = name || ' (sql)' where id = :plate`, { plate }),
    ],
    [
      "load_cases (update)",
      () => sql(`update load_cases set name = name || ' (sql)' where id = :id`, { id: caseIds.Operating }),
    ],
    [
      "stress_states (update)",
      () =>
        sql(`update stress_states set xx_pa = xx_pa * 1.5 where location_id = :plate and is_current`, {
          plate,
        }),
    ],
    [
      "stress_states (delete)",
      () =>
        sql(`delete from stress_states where location_id = :weld and load_case_id = :id`, {
          weld,
          id: caseIds.Operating,
        }),
    ],
    [
      "stress_states (insert)",
      () =>
        sql(
          `insert into stress_states (id, load_case_id, location_id, revision, is_current, xx_pa, yy_pa, zz_pa, xy_pa, yz_pa, zx_pa, unit, source) values (gen_random_uuid(), :id, :weld, 1000, true, 9e7, 1e7, 0, 0, 0, 0, 'MPa', 'typed')`,
          { weld, id: caseIds.Operating },
        ),
    ],
    [
      "materials (update)",
      () => sql(`update materials set yield_pa = yield_pa * 0.8 where id = :materialId`, { materialId }),
    ],
    [
      "combinations (insert)",
      async () => {
        const [k] = await sql<{ id: string }>(
          `insert into combinations (id, project_id, name, position, version, created_at, updated_at) values (gen_random_uuid(), :projectId, 'SQL combination', 99, 1, now(), now()) returning id`,
          { projectId },
        );
        combinationId = k.id;
      },
    ],
    [
      "combination_terms (insert)",
      () =>
        sql(
          `insert into combination_terms (id, combination_id, load_case_id, factor, position) values (gen_random_uuid(), :combinationId, :id, 2, 0)`,
          { combinationId, id: caseIds.Operating },
        ),
    ],
    [
      "combination_terms (update)",
      () =>
        sql(`update combination_terms set factor = 3 where combination_id = :combinationId`, {
          combinationId,
        }),
    ],
    [
      "combinations (update)",
      () =>
        sql(`update combinations set name = 'SQL combination, renamed' where id = :combinationId`, {
          combinationId,
        }),
    ],
    [
      "combination_terms (delete)",
      () => sql(`delete from combination_terms where combination_id = :combinationId`, { combinationId }),
    ],
    [
      "combinations (delete)",
      () => sql(`delete from combinations where id = :combinationId`, { combinationId }),
    ],
    [
      "locations (delete)",
      () => sql(`delete from locations where project_id = :projectId and name = 'nozzle'`, { projectId }),
    ],
    [
      "load_cases (delete, cascading to its states and terms)",
      () => sql(`delete from load_cases where id = :id`, { id: caseIds.Test }),
    ],
  ];

  it.each(changes)("when %s changes, then the answer is computed afresh", async (_what, change) => {
    await expectChangedBy(change);
  });
});

describe("how the stamps are raised", () => {
  it("when a change commits, then only its own project's stamp rises, once per transaction however many statements it ran", async () => {
    const before = await stampsOf(projectId, otherProjectId, team.workspaceId);
    await sequelize.transaction(async (transaction) => {
      for (let i = 0; i < 5; i++) {
        await sql(
          `update locations set note = :note where project_id = :projectId`,
          { projectId, note: `n${i}` },
          transaction,
        );
      }
    });
    const after = await stampsOf(projectId, otherProjectId, team.workspaceId);
    expect(after[projectId]).toBe(before[projectId] + 1);
    expect(after[otherProjectId]).toBe(before[otherProjectId]);
    expect(after[team.workspaceId]).toBe(before[team.workspaceId]);
  });

  it("when a change is rolled back, then no stamp rises and no note is left behind", async () => {
    const before = await stampsOf(projectId);
    await expect(
      sequelize.transaction(async (transaction) => {
        await sql(`update stress_states set xx_pa = 0 where location_id = :plate`, { plate }, transaction);
        throw new Error("changed my mind");
      }),
    ).rejects.toThrow("changed my mind");
    expect(await stampsOf(projectId)).toEqual(before);
    const [{ count }] = await sql<{ count: string }>(`select count(*) from comparison_stamp_pending`);
    expect(Number(count)).toBe(0);
  });

  it("when transactions change a material and a location of one workspace in opposite orders at the same time, then none deadlocks and each raises both stamps once", async () => {
    const other = await team.editor.agent
      .post(wsPath(team, "/materials"))
      .send({ name: "Second plate", unit: "MPa", yield: 250 })
      .expect(201);
    const secondMaterial = other.body.material.id as string;
    const before = await stampsOf(projectId, team.workspaceId);
    const pause = () => new Promise((resolve) => setTimeout(resolve, 30));
    const touchMaterial = (id: string, transaction: Transaction) =>
      sql(`update materials set note = note || '.' where id = :id`, { id }, transaction);
    const touchLocation = (id: string, transaction: Transaction) =>
      sql(`update locations set note = note || '.' where id = :id`, { id }, transaction);
    // Different rows, so only the stamps are shared: a counter taken by the first statement would
    // deadlock here (material first holds the workspace's and waits for the project's, and back).
    const pairs = 4;
    const results = await Promise.allSettled(
      Array.from({ length: pairs }, () => [
        sequelize.transaction(async (t) => {
          await touchMaterial(materialId, t);
          await pause();
          await touchLocation(plate, t);
        }),
        sequelize.transaction(async (t) => {
          await touchLocation(weld, t);
          await pause();
          await touchMaterial(secondMaterial, t);
        }),
      ]).flat(),
    );
    expect(results.filter((r) => r.status === "rejected")).toEqual([]);
    const after = await stampsOf(projectId, team.workspaceId);
    expect(after[projectId]).toBe(before[projectId] + 2 * pairs);
    expect(after[team.workspaceId]).toBe(before[team.workspaceId] + 2 * pairs);
  });
});
