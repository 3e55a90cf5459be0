import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { trashListSchema } from "../../core/contract/projects";
import { LoadCase } from "../../db/models/load-case";
import { Project } from "../../db/models/project";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
beforeAll(async () => {
  team = await projectTeam(app);
});

const DAY = 86_400_000;

describe("the trash", () => {
  it("when an editor deletes a load case by mistake, then it is in the trash with its purge date, and restoring brings it back with its states", async () => {
    const { projectId, locationIds } = await projectWithLocations(team, { name: "Slip" }, ["mid-shell"]);
    const base = wsPath(team, `/projects/${projectId}/load-cases`);
    const created = await team.editor.agent
      .post(base)
      .send({
        name: "Hydrostatic test",
        states: [{ locationId: locationIds[0], stress: mpa(87.75, 43.875) }],
      })
      .expect(201);
    const id = created.body.loadCase.id;
    await team.editor.agent.delete(`${base}/${id}`).expect(204);
    expect((await team.editor.agent.get(base).expect(200)).body.loadCases).toHaveLength(0);

    const trash = trashListSchema.parse(
      (await team.editor.agent.get(wsPath(team, "/trash")).expect(200)).body,
    );
    const item = trash.items.find((i) => i.id === id)!;
    expect(item).toMatchObject({
      kind: "load-case",
      name: "Hydrostatic test",
      project: { id: projectId, inTrash: false },
    });
    expect(item.deletedBy?.name).toBe("Editor One");
    expect(Date.parse(item.purgeAt) - Date.parse(item.deletedAt)).toBe(30 * DAY);

    await team.reviewer.agent.post(wsPath(team, `/trash/load-case/${id}/restore`)).expect(403);
    await team.editor2.agent.post(wsPath(team, `/trash/load-case/${id}/restore`)).expect(204);
    const back = await team.viewer.agent.get(`${base}/${id}`).expect(200);
    expect(back.body.loadCase.states[0].componentsPa.xx).toBe(87.75e6);
  });

  it("when a project is in the trash, then its cases cannot be restored alone (409) until the project is; owners restore too", async () => {
    const { projectId } = await projectWithLocations(team, { name: "Whole" }, []);
    const base = wsPath(team, `/projects/${projectId}`);
    const c = await team.editor.agent.post(`${base}/load-cases`).send({ name: "Design" }).expect(201);
    await team.editor.agent.delete(`${base}/load-cases/${c.body.loadCase.id}`).expect(204);
    await team.editor.agent.delete(base).expect(204);
    const blocked = await team.editor.agent.post(
      wsPath(team, `/trash/load-case/${c.body.loadCase.id}/restore`),
    );
    expect(blocked.status).toBe(409);
    expect(blocked.body.error.id).toBe("project_in_trash");
    await team.owner.agent.post(wsPath(team, `/trash/project/${projectId}/restore`)).expect(204);
    await team.editor.agent.post(wsPath(team, `/trash/load-case/${c.body.loadCase.id}/restore`)).expect(204);
    expect((await team.viewer.agent.get(`${base}/load-cases`).expect(200)).body.loadCases).toHaveLength(1);
  });

  it("when an item has been in the trash for more than 30 days, then it is purged and can no longer be restored", async () => {
    const { projectId } = await projectWithLocations(team, { name: "Old" }, []);
    const c = await team.editor.agent
      .post(wsPath(team, `/projects/${projectId}/load-cases`))
      .send({ name: "Forgotten" })
      .expect(201);
    await LoadCase.update(
      { deletedAt: new Date(Date.now() - 31 * DAY) },
      { where: { id: c.body.loadCase.id } },
    );
    await team.editor.agent.post(wsPath(team, `/trash/load-case/${c.body.loadCase.id}/restore`)).expect(404);
    const trash = (await team.editor.agent.get(wsPath(team, "/trash")).expect(200)).body;
    expect(trash.items.map((i: { id: string }) => i.id)).not.toContain(c.body.loadCase.id);
    expect(await LoadCase.findByPk(c.body.loadCase.id)).toBeNull();
  });

  it("when an editor asks to delete for good, then 403; the owner may, and it is gone", async () => {
    const { projectId } = await projectWithLocations(team, { name: "Scrap" }, []);
    await team.editor.agent.delete(wsPath(team, `/projects/${projectId}`)).expect(204);
    await team.editor.agent.delete(wsPath(team, `/trash/project/${projectId}`)).expect(403);
    await team.owner.agent.delete(wsPath(team, `/trash/project/${projectId}`)).expect(204);
    expect(await Project.findByPk(projectId)).toBeNull();
  });

  it("when a viewer or reviewer asks for the trash, then 403", async () => {
    await team.viewer.agent.get(wsPath(team, "/trash")).expect(403);
    await team.reviewer.agent.get(wsPath(team, "/trash")).expect(403);
  });
});
