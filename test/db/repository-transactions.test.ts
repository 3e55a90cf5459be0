import { Op, QueryTypes, type Transaction } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { insertAuditEvent, listAuditEvents } from "../../db/repositories/audit";
import {
  countLiveCombinations,
  createCombination,
  findLiveCombination,
  listLiveCombinations,
  nextCombinationPosition,
  replaceTerms,
  termRowsOf,
  updateCombination,
} from "../../db/repositories/combinations";
import {
  countLiveLoadCases,
  createLoadCase,
  findLiveLoadCase,
  listLiveLoadCases,
  liveLoadCaseIdsAmong,
  loadCaseNames,
  nextLoadCasePosition,
  updateLoadCase,
} from "../../db/repositories/load-cases";
import {
  countLiveLocations,
  createLocation,
  findLiveLocation,
  listLiveLocations,
  liveLocationIdsAmong,
  locationNames,
  nextLocationPosition,
  updateLocation,
} from "../../db/repositories/locations";
import {
  createMaterial,
  findLiveMaterial,
  listLiveMaterials,
  updateMaterial,
} from "../../db/repositories/materials";
import {
  countProjects,
  createProject,
  findLiveProject,
  listLiveProjects,
  projectCounts,
  projectNamesOf,
  updateProject,
} from "../../db/repositories/projects";
import {
  currentStatesOf,
  retireCurrentState,
  stateRevisions,
  writeStressStates,
} from "../../db/repositories/stress-states";
import {
  countLiveOfKind,
  destroyForGood,
  markDeleted,
  markRestored,
  trashableRows,
} from "../../db/repositories/trash";
import { userNames } from "../../db/repositories/users";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

const TABLES = [
  "projects",
  "locations",
  "load_cases",
  "stress_states",
  "combinations",
  "combination_terms",
  "materials",
  "audit_events",
];

/** Row count and a digest of every row of each project table (test files run one at a time). */
async function snapshot(transaction?: Transaction): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const table of TABLES) {
    const [row] = await context.sequelize.query<{ n: number; digest: string }>(
      `SELECT count(*)::int AS n, md5(coalesce(string_agg(x::text, '|' ORDER BY x::text), '')) AS digest FROM ${table} x`,
      { type: QueryTypes.SELECT, transaction },
    );
    out[table] = `${row.n}:${row.digest}`;
  }
  return out;
}

class Rollback extends Error {}

let team: ProjectTeam;
let ids: {
  projectId: string;
  locationId: string;
  trashedLocationId: string;
  loadCaseId: string;
  combinationId: string;
  materialId: string;
};

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(
    team,
    {
      name: `Repository transactions ${Date.now()}`,
      requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
    },
    ["nozzle", "skirt"],
  );
  const base = wsPath(team, `/projects/${made.projectId}`);
  const loadCase = await team.editor.agent
    .post(`${base}/load-cases`)
    .send({ name: "Operating", states: [{ locationId: made.locationIds[0], stress: mpa(80, 40) }] })
    .expect(201);
  const combination = await team.editor.agent
    .post(`${base}/combinations`)
    .send({ name: "Operating x 1.2", terms: [{ loadCaseId: loadCase.body.loadCase.id, factor: 1.2 }] })
    .expect(201);
  const material = await team.editor.agent
    .post(wsPath(team, "/materials"))
    .send({ name: "Plate P265", unit: "MPa", yield: 265, ultimateTension: 410 })
    .expect(201);
  await team.editor.agent.delete(`${base}/locations/${made.locationIds[1]}`).expect(204);
  ids = {
    projectId: made.projectId,
    locationId: made.locationIds[0],
    trashedLocationId: made.locationIds[1],
    loadCaseId: loadCase.body.loadCase.id,
    combinationId: combination.body.combination.id,
    materialId: material.body.material.id,
  };
});

/** Each write of the repositories, run inside the transaction it is given. */
const WRITES: [string, (t: Transaction) => Promise<unknown>][] = [
  [
    "createProject",
    (t) =>
      createProject(
        {
          workspaceId: team.workspaceId,
          name: "Rolled back",
          requirements: [],
          defaultMaterialId: null,
          defaultPublishedMaterial: null,
          createdBy: team.editor.user.id,
          updatedBy: team.editor.user.id,
        },
        t,
      ),
  ],
  ["updateProject", (t) => updateProject(ids.projectId, { name: "Renamed, rolled back" }, t)],
  [
    "createLocation",
    (t) =>
      createLocation(
        { projectId: ids.projectId, name: "Rolled back", position: 9, createdBy: null, updatedBy: null },
        t,
      ),
  ],
  ["updateLocation", (t) => updateLocation(ids.locationId, { note: "rolled back" }, t)],
  [
    "createLoadCase",
    (t) =>
      createLoadCase(
        {
          projectId: ids.projectId,
          name: "Rolled back",
          category: "",
          description: "",
          position: 9,
          createdBy: null,
          updatedBy: null,
        },
        t,
      ),
  ],
  ["updateLoadCase", (t) => updateLoadCase(ids.loadCaseId, { description: "rolled back" }, t)],
  [
    "createCombination",
    (t) =>
      createCombination(
        {
          projectId: ids.projectId,
          name: "Rolled back",
          description: "",
          position: 9,
          createdBy: null,
          updatedBy: null,
        },
        [{ loadCaseId: ids.loadCaseId, factor: 2 }],
        t,
      ),
  ],
  ["updateCombination", (t) => updateCombination(ids.combinationId, { description: "rolled back" }, t)],
  ["replaceTerms", (t) => replaceTerms(ids.combinationId, [{ loadCaseId: ids.loadCaseId, factor: 3 }], t)],
  [
    "createMaterial",
    (t) =>
      createMaterial(
        { workspaceId: team.workspaceId, name: "Rolled back", unit: "MPa", createdBy: null, updatedBy: null },
        t,
      ),
  ],
  ["updateMaterial", (t) => updateMaterial(ids.materialId, { note: "rolled back" }, t)],
  [
    "writeStressStates",
    (t) =>
      writeStressStates(
        [
          {
            loadCaseId: ids.loadCaseId,
            locationId: ids.locationId,
            componentsPa: { xx: 1, yy: 2, zz: 3, xy: 0, yz: 0, zx: 0 },
            unit: "Pa",
            source: "typed",
            note: "",
            createdBy: null,
          },
        ],
        t,
      ),
  ],
  ["retireCurrentState", (t) => retireCurrentState(ids.loadCaseId, ids.locationId, t)],
  [
    "insertAuditEvent",
    (t) =>
      insertAuditEvent(
        {
          workspaceId: team.workspaceId,
          projectId: ids.projectId,
          entityType: "project",
          entityId: ids.projectId,
          action: "update",
          actorId: null,
          actorName: "test",
          summary: "rolled back",
        },
        t,
      ),
  ],
  ["markDeleted", (t) => markDeleted("location", ids.locationId, team.editor.user.id, t)],
  ["markRestored", (t) => markRestored("location", ids.trashedLocationId, t)],
  ["destroyForGood", (t) => destroyForGood("combination", ids.combinationId, t)],
];

describe("repositories and transactions", () => {
  it.each(WRITES)(
    "when %s runs in a transaction that rolls back, then it changed the tables inside it and nothing is left after",
    async (_name, write) => {
      const before = await snapshot();
      await expect(
        context.sequelize.transaction(async (transaction) => {
          await write(transaction);
          expect(await snapshot(transaction)).not.toEqual(before);
          throw new Rollback();
        }),
      ).rejects.toBeInstanceOf(Rollback);
      expect(await snapshot()).toEqual(before);
    },
  );

  it("when rows are made inside a transaction, then every read given it sees them and the same read without it does not", async () => {
    const seen: Record<string, [boolean, boolean]> = {};
    await expect(
      context.sequelize.transaction(async (t) => {
        const project = await createProject(
          {
            workspaceId: team.workspaceId,
            name: `Only inside ${Date.now()}`,
            requirements: [],
            defaultMaterialId: null,
            defaultPublishedMaterial: null,
            createdBy: team.editor.user.id,
            updatedBy: team.editor.user.id,
          },
          t,
        );
        const p = project.id;
        const location = await createLocation(
          { projectId: p, name: "inside", position: 0, createdBy: null, updatedBy: null },
          t,
        );
        const loadCase = await createLoadCase(
          {
            projectId: p,
            name: "inside",
            category: "",
            description: "",
            position: 0,
            createdBy: null,
            updatedBy: null,
          },
          t,
        );
        const combination = await createCombination(
          { projectId: p, name: "inside", description: "", position: 0, createdBy: null, updatedBy: null },
          [{ loadCaseId: loadCase.id, factor: 1 }],
          t,
        );
        const material = await createMaterial(
          { workspaceId: team.workspaceId, name: "inside", unit: "MPa", createdBy: null, updatedBy: null },
          t,
        );
        await writeStressStates(
          [
            {
              loadCaseId: loadCase.id,
              locationId: location.id,
              componentsPa: { xx: 5, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
              unit: "Pa",
              source: "typed",
              note: "",
              createdBy: null,
            },
          ],
          t,
        );
        const trashed = await createLocation(
          { projectId: p, name: "inside, trashed", position: 1, createdBy: null, updatedBy: null },
          t,
        );
        await markDeleted("location", trashed.id, team.editor.user.id, t);
        await insertAuditEvent(
          {
            workspaceId: team.workspaceId,
            projectId: p,
            entityType: "project",
            entityId: p,
            action: "create",
            actorId: null,
            actorName: "test",
            summary: "inside",
          },
          t,
        );

        /** Whether the read finds the rows made above, with the transaction and without it. */
        const reads: [string, (tx?: Transaction) => Promise<boolean>][] = [
          [
            "findLiveProject",
            async (tx) => !!(await findLiveProject(team.workspaceId, p, { transaction: tx })),
          ],
          [
            "listLiveProjects",
            async (tx) => (await listLiveProjects(team.workspaceId, tx)).some((r) => r.id === p),
          ],
          [
            "projectNamesOf",
            async (tx) => (await projectNamesOf(team.workspaceId, tx)).some((r) => r.id === p),
          ],
          ["projectCounts", async (tx) => (await projectCounts([p], tx)).get(p)!.locations === 1],
          ["findLiveLocation", async (tx) => !!(await findLiveLocation(p, location.id, { transaction: tx }))],
          ["listLiveLocations", async (tx) => (await listLiveLocations(p, tx)).length === 1],
          [
            "liveLocationIdsAmong",
            async (tx) => (await liveLocationIdsAmong(p, [location.id], tx)).size === 1,
          ],
          ["locationNames", async (tx) => (await locationNames([location.id], tx)).size === 1],
          ["countLiveLocations", async (tx) => (await countLiveLocations(p, tx)) === 1],
          ["nextLocationPosition", async (tx) => (await nextLocationPosition(p, tx)) === 2],
          ["findLiveLoadCase", async (tx) => !!(await findLiveLoadCase(p, loadCase.id, { transaction: tx }))],
          ["listLiveLoadCases", async (tx) => (await listLiveLoadCases(p, tx)).length === 1],
          [
            "liveLoadCaseIdsAmong",
            async (tx) => (await liveLoadCaseIdsAmong(p, [loadCase.id], tx)).size === 1,
          ],
          ["loadCaseNames", async (tx) => (await loadCaseNames([loadCase.id], tx)).size === 1],
          ["countLiveLoadCases", async (tx) => (await countLiveLoadCases(p, tx)) === 1],
          ["nextLoadCasePosition", async (tx) => (await nextLoadCasePosition(p, tx)) === 1],
          [
            "findLiveCombination",
            async (tx) => !!(await findLiveCombination(p, combination.id, { transaction: tx })),
          ],
          ["listLiveCombinations", async (tx) => (await listLiveCombinations(p, tx)).length === 1],
          ["countLiveCombinations", async (tx) => (await countLiveCombinations(p, tx)) === 1],
          ["nextCombinationPosition", async (tx) => (await nextCombinationPosition(p, tx)) === 1],
          ["termRowsOf", async (tx) => (await termRowsOf([combination.id], tx)).length === 1],
          [
            "findLiveMaterial",
            async (tx) => !!(await findLiveMaterial(team.workspaceId, material.id, { transaction: tx })),
          ],
          [
            "listLiveMaterials",
            async (tx) => (await listLiveMaterials(team.workspaceId, tx)).some((m) => m.id === material.id),
          ],
          ["currentStatesOf", async (tx) => (await currentStatesOf([loadCase.id], tx)).length === 1],
          ["stateRevisions", async (tx) => (await stateRevisions(loadCase.id, location.id, tx)).length === 1],
          [
            "listAuditEvents",
            async (tx) =>
              (await listAuditEvents({ workspaceId: team.workspaceId, projectId: p, limit: 10 }, tx))
                .length === 1,
          ],
          [
            "trashableRows",
            async (tx) =>
              (await trashableRows("location", team.workspaceId, [p], { deletedAt: { [Op.ne]: null } }, tx))
                .length === 1,
          ],
          ["countLiveOfKind", async (tx) => (await countLiveOfKind("location", p, tx)) === 1],
        ];
        for (const [name, read] of reads) seen[name] = [await read(t), await read(undefined)];
        throw new Rollback();
      }),
    ).rejects.toBeInstanceOf(Rollback);
    const expected = Object.fromEntries(Object.keys(seen).map((name) => [name, [true, false]]));
    expect(seen).toEqual(expected);
    expect(Object.keys(seen)).toHaveLength(28);
  });

  it("when user names and the project count are read, then they answer from the committed rows", async () => {
    const names = await userNames([team.editor.user.id, team.owner.user.id]);
    expect(names.get(team.editor.user.id)).toBe("Editor One");
    expect(names.get(team.owner.user.id)).toBe("Owner");
    expect(await countProjects(team.workspaceId)).toBe(1);
  });
});
