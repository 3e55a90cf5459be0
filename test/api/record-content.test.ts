import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ENGINE_VERSION } from "../../core/constants/engine";
import { recordContentSchema } from "../../core/contract/records";
import { findProject } from "../../api/domain/projects/scope";
import { buildRecordContent, canonicalJson, recordHash } from "../../api/domain/records/content";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let projectId: string;
let locationIds: string[];

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(
    team,
    { name: "Record content", defaultMaterial: { kind: "published", id: "sa516-70" } },
    ["shell", "nozzle"],
  );
  projectId = made.projectId;
  locationIds = made.locationIds;
  const base = wsPath(team, `/projects/${projectId}`);
  const created = await team.editor.agent
    .post(`${base}/load-cases`)
    .send({
      name: "Design",
      states: [
        { locationId: locationIds[0], stress: mpa(120, 60) },
        { locationId: locationIds[1], stress: mpa(90, -30, 0, 40) },
      ],
    })
    .expect(201);
  // A second revision of one state, so the record must name revision 2 there.
  await team.editor.agent
    .put(`${base}/load-cases/${created.body.loadCase.id}/states/${locationIds[0]}`)
    .send({ version: created.body.loadCase.version, stress: mpa(130, 60) })
    .expect(200);
});

describe("the content of a frozen record", () => {
  it("when taken from a project, then it validates against the record schema and holds every comparison row, the engine version and each state's revision", async () => {
    const project = await findProject(team.workspaceId, projectId);
    const content = await buildRecordContent(context.sequelize, project);
    expect(() => recordContentSchema.parse(content)).not.toThrow();
    expect(content.engine.version).toBe(ENGINE_VERSION);
    expect(content.results.rows).toHaveLength(2);
    expect(content.results.governingOverall).not.toBeNull();
    const shell = Object.entries(content.ids.locations).find(([, id]) => id === locationIds[0])![0];
    const revisionAtShell = content.stateRevisions.find((s) => s.location === shell)!;
    expect(revisionAtShell.revision).toBe(2);
    expect(content.inputs.loadCases[0].states.find((s) => s.location === shell)!.componentsPa.xx).toBe(130e6);
  });

  it("when the same content is written with its keys in another order, then its hash does not change", async () => {
    const project = await findProject(team.workspaceId, projectId);
    const content = await buildRecordContent(context.sequelize, project);
    const reordered = JSON.parse(
      JSON.stringify(content, (_k, v: unknown) =>
        v !== null && typeof v === "object" && !Array.isArray(v)
          ? Object.fromEntries(Object.entries(v as object).reverse())
          : v,
      ),
    ) as typeof content;
    expect(canonicalJson(reordered)).toBe(canonicalJson(content));
    expect(recordHash(reordered)).toBe(recordHash(content));
    expect(recordHash({ ...content, takenAt: "2000-01-01T00:00:00.000Z" })).not.toBe(recordHash(content));
  });
});
