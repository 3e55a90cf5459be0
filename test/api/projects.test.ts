import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { projectListSchema, projectResponseSchema } from "../../core/contract/projects";
import { AuditEvent } from "../../db/models/audit-event";
import { Project } from "../../db/models/project";
import { buildTestApp } from "../support/app";
import { projectTeam, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
beforeAll(async () => {
  team = await projectTeam(app);
});

describe("projects: create, read, update, delete per role", () => {
  it("when an editor creates a project with no requirements given, then it checks von Mises and Tresca at 1.5 and the creation is audited", async () => {
    const response = await team.editor.agent
      .post(wsPath(team, "/projects"))
      .send({ name: "CT-7 shell and heads", defaultMaterial: { kind: "published", id: "sa516-70" } });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    const { project } = projectResponseSchema.parse(response.body);
    expect(project).toMatchObject({
      name: "CT-7 shell and heads",
      unitSystem: "SI",
      version: 1,
      requirements: [
        { criterion: "von-mises", requiredFactor: 1.5 },
        { criterion: "tresca", requiredFactor: 1.5 },
      ],
      defaultMaterial: { kind: "published", id: "sa516-70" },
      createdBy: { id: team.editor.user.id, name: "Editor One" },
      counts: { locations: 0, loadCases: 0, combinations: 0 },
    });
    const events = await AuditEvent.findAll({ where: { entityId: project.id } });
    expect(events.map((e) => [e.action, e.actorName])).toEqual([["create", "Editor One"]]);
  });

  it("when every member lists projects, then each sees them; the outsider gets 404", async () => {
    for (const member of [team.owner, team.editor, team.reviewer, team.viewer]) {
      const list = await member.agent.get(wsPath(team, "/projects")).expect(200);
      expect(projectListSchema.parse(list.body).projects.map((p) => p.name)).toContain(
        "CT-7 shell and heads",
      );
    }
    await team.outsider.agent.get(wsPath(team, "/projects")).expect(404);
  });

  it("when a reviewer or viewer creates, changes or deletes a project, then 403 and nothing changes", async () => {
    const list = await team.viewer.agent.get(wsPath(team, "/projects")).expect(200);
    const project = list.body.projects[0];
    for (const reader of [team.reviewer, team.viewer]) {
      await reader.agent.post(wsPath(team, "/projects")).send({ name: "No" }).expect(403);
      await reader.agent
        .patch(wsPath(team, `/projects/${project.id}`))
        .send({ version: project.version, name: "No" })
        .expect(403);
      await reader.agent.delete(wsPath(team, `/projects/${project.id}`)).expect(403);
    }
    const row = await Project.findByPk(project.id);
    expect(row!.name).toBe("CT-7 shell and heads");
    expect(row!.deletedAt).toBeNull();
  });

  it("when an editor changes the required factors, then the version rises, the change is audited field by field, and a stale version gets 409", async () => {
    const created = await team.editor.agent.post(wsPath(team, "/projects")).send({ name: "Lug" }).expect(201);
    const path = wsPath(team, `/projects/${created.body.project.id}`);
    const changed = await team.editor.agent
      .patch(path)
      .send({ version: 1, requirements: [{ criterion: "von-mises", requiredFactor: 2 }], unitSystem: "US" })
      .expect(200);
    expect(changed.body.project).toMatchObject({
      version: 2,
      unitSystem: "US",
      requirements: [{ criterion: "von-mises", requiredFactor: 2 }],
    });
    const update = await AuditEvent.findOne({
      where: { entityId: created.body.project.id, action: "update" },
    });
    expect(Object.keys(update!.changes!).sort()).toEqual(["requirements", "unitSystem"]);
    const stale = await team.editor2.agent.patch(path).send({ version: 1, name: "Overwrite" });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details.currentVersion).toBe(2);
    expect((await team.viewer.agent.get(path).expect(200)).body.project.name).toBe("Lug");
  });

  it("when a project names a material that does not exist or asks for a criterion twice, then 400 names the field", async () => {
    const unknown = await team.editor.agent
      .post(wsPath(team, "/projects"))
      .send({ name: "X", defaultMaterial: { kind: "published", id: "unobtainium" } });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.details[0].path).toBe("defaultMaterial.id");
    const twice = await team.editor.agent.post(wsPath(team, "/projects")).send({
      name: "X",
      requirements: [
        { criterion: "tresca", requiredFactor: 1.5 },
        { criterion: "tresca", requiredFactor: 2 },
      ],
    });
    expect(twice.status).toBe(400);
    expect(twice.body.error.details[0].path).toBe("requirements.1.criterion");
    const zero = await team.editor.agent
      .post(wsPath(team, "/projects"))
      .send({ name: "X", requirements: [{ criterion: "tresca", requiredFactor: 0 }] });
    expect(zero.body.error.details[0].path).toBe("requirements.0.requiredFactor");
  });

  it("when an editor deletes a project, then it leaves the list; when the workspace is deleted, then its projects go with it", async () => {
    const created = await team.editor.agent
      .post(wsPath(team, "/projects"))
      .send({ name: "Gone soon" })
      .expect(201);
    await team.editor.agent.delete(wsPath(team, `/projects/${created.body.project.id}`)).expect(204);
    const list = await team.editor.agent.get(wsPath(team, "/projects")).expect(200);
    expect(list.body.projects.map((p: { name: string }) => p.name)).not.toContain("Gone soon");
    await team.editor.agent.get(wsPath(team, `/projects/${created.body.project.id}`)).expect(404);

    const other = await team.owner.agent.post("/api/workspaces").send({ name: "Short-lived" }).expect(201);
    const doomed = await team.owner.agent
      .post(`/api/workspaces/${other.body.workspace.id}/projects`)
      .send({ name: "Doomed" })
      .expect(201);
    await team.owner.agent.delete(`/api/workspaces/${other.body.workspace.id}`).expect(204);
    expect(await Project.findByPk(doomed.body.project.id)).toBeNull();
  });
});
