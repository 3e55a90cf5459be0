import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Components } from "../../core/contract/load-cases";
import { ct7RosetteCalculatorInputs } from "../../core/demo-data/ct7-scenario";
import { LoadCase } from "../../db/models/load-case";
import { Project } from "../../db/models/project";
import { StressState } from "../../db/models/stress-state";
import { writeStressStates } from "../../db/repositories/stress-states";
import { createDemoProject } from "../../db/seed-projects";
import { buildTestApp } from "../support/app";
import { projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

// Components in MPa whose values times 1e6 are exact doubles, so MPa → Pa loses nothing on
// any path and the stored Pa can be compared exactly.
const IN_MPA: Components = { xx: 120, yy: -35.5, zz: 0, xy: 12.25, yz: -8, zx: 3 };
const IN_PA: Components = { xx: 120e6, yy: -35.5e6, zz: 0, xy: 12.25e6, yz: -8e6, zx: 3e6 };
const NOTE = "rosette R2 at the weld toe, third shift";

let team: ProjectTeam;

beforeAll(async () => {
  team = await projectTeam(app);
});

/** The columns the writer sets from a state (ids, parents and time differ per path by design). */
function storedColumns(row: StressState) {
  return {
    revision: row.revision,
    isCurrent: row.isCurrent,
    xxPa: row.xxPa,
    yyPa: row.yyPa,
    zzPa: row.zzPa,
    xyPa: row.xyPa,
    yzPa: row.yzPa,
    zxPa: row.zxPa,
    unit: row.unit,
    source: row.source,
    note: row.note,
    calculator: row.calculator,
    createdBy: row.createdBy,
  };
}

/** The rosette's inputs the state came from (kept by every writer alike). */
const ROSETTE_INPUTS = ct7RosetteCalculatorInputs();

/** Every stored revision of the project's only load case. */
async function rowsOfProject(projectId: string) {
  const cases = await LoadCase.findAll({ where: { projectId } });
  expect(cases).toHaveLength(1);
  return StressState.findAll({ where: { loadCaseId: cases[0].id }, order: [["revision", "ASC"]] });
}

describe("the one writer of stress-state rows", () => {
  it("when the same state is saved through the API, imported from a file and seeded, then the three stored rows are identical but for their ids", async () => {
    // Through the API, as an editor enters it.
    const made = await projectWithLocations(
      team,
      {
        name: `Writer via API ${Date.now()}`,
        requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
      },
      ["weld toe"],
    );
    const base = wsPath(team, `/projects/${made.projectId}`);
    await team.editor.agent
      .post(`${base}/load-cases`)
      .send({
        name: "Hydrotest",
        category: "test",
        states: [
          {
            locationId: made.locationIds[0],
            stress: { unit: "MPa", components: IN_MPA },
            source: "measured",
            note: NOTE,
            calculator: ROSETTE_INPUTS,
          },
        ],
      })
      .expect(201);
    const viaApi = await rowsOfProject(made.projectId);

    // Through the import, from that project's export file.
    const file = (await team.editor.agent.get(`${base}/export`).expect(200)).body;
    file.project.name = `Writer via import ${Date.now()}`;
    const imported = await team.editor.agent.post(wsPath(team, "/project-imports")).send(file).expect(201);
    const viaImport = await rowsOfProject(imported.body.project.id);

    // Through the demo seed's project writer, with the same state in Pa.
    const seededName = `Writer via seed ${Date.now()}`;
    await context.sequelize.transaction((transaction) =>
      createDemoProject(
        transaction,
        team.workspaceId,
        team.editor.user.id,
        {
          name: seededName,
          description: "",
          requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
          material: { publishedId: "s355" },
          locations: ["weld toe"],
          cases: [
            {
              name: "Hydrotest",
              category: "test",
              description: "",
              states: [
                {
                  location: "weld toe",
                  tensor: IN_PA,
                  source: "measured",
                  note: NOTE,
                  calculator: ROSETTE_INPUTS,
                },
              ],
            },
          ],
          combinations: [],
        },
        {},
      ),
    );
    const seeded = await Project.findOne({ where: { name: seededName, workspaceId: team.workspaceId } });
    const viaSeed = await rowsOfProject(seeded!.id);

    const expected = {
      revision: 1,
      isCurrent: true,
      xxPa: 120e6,
      yyPa: -35.5e6,
      zzPa: 0,
      xyPa: 12.25e6,
      yzPa: -8e6,
      zxPa: 3e6,
      unit: "MPa",
      source: "measured",
      note: NOTE,
      calculator: ROSETTE_INPUTS,
      createdBy: team.editor.user.id,
    };
    expect(viaApi.map(storedColumns)).toEqual([expected]);
    expect(viaImport.map(storedColumns)).toEqual([expected]);
    expect(viaSeed.map(storedColumns)).toEqual([expected]);
  });

  it("when one call names a (case, location) pair twice and a later call names it again, then the revisions run 1, 2, 3, only the last is current, and each reports the row it replaced", async () => {
    const made = await projectWithLocations(
      team,
      { name: `Writer revisions ${Date.now()}`, requirements: [{ criterion: "tresca", requiredFactor: 2 }] },
      ["keyway"],
    );
    const created = await team.editor.agent
      .post(wsPath(team, `/projects/${made.projectId}/load-cases`))
      .send({ name: "Start-up", states: [] })
      .expect(201);
    const state = (xx: number) => ({
      loadCaseId: created.body.loadCase.id as string,
      locationId: made.locationIds[0],
      componentsPa: { ...IN_PA, xx },
      unit: "Pa",
      source: "typed",
      note: "",
      createdBy: team.editor.user.id,
    });
    const first = await writeStressStates([state(1e6), state(2e6)]);
    expect(first.map((w) => [w.saved.revision, w.saved.xxPa, w.previous?.revision ?? null])).toEqual([
      [1, 1e6, null],
      [2, 2e6, 1],
    ]);
    const second = await writeStressStates([state(3e6)]);
    expect(second[0].saved.revision).toBe(3);
    expect(second[0].previous?.id).toBe(first[1].saved.id);

    const rows = await rowsOfProject(made.projectId);
    expect(rows.map((r) => [r.revision, r.isCurrent, r.xxPa])).toEqual([
      [1, false, 1e6],
      [2, false, 2e6],
      [3, true, 3e6],
    ]);
  });
});
