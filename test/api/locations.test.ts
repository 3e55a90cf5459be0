import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { locationListSchema } from "../../core/contract/projects";
import { buildTestApp } from "../support/app";
import { projectTeam, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let base: string;
beforeAll(async () => {
  team = await projectTeam(app);
  const project = await team.editor.agent
    .post(wsPath(team, "/projects"))
    .send({ name: "Locations" })
    .expect(201);
  base = wsPath(team, `/projects/${project.body.project.id}/locations`);
});

describe("locations", () => {
  it("when an editor adds locations, then they come back in the order added, with the material override", async () => {
    await team.editor.agent.post(base).send({ name: "mid-shell" }).expect(201);
    const junction = await team.editor.agent
      .post(base)
      .send({ name: "head junction", note: "knuckle side", material: { kind: "published", id: "s355" } })
      .expect(201);
    expect(junction.body.location).toMatchObject({
      position: 1,
      material: { kind: "published", id: "s355" },
    });
    const list = locationListSchema.parse((await team.viewer.agent.get(base).expect(200)).body);
    expect(list.locations.map((l) => l.name)).toEqual(["mid-shell", "head junction"]);
  });

  it("when a reviewer adds, renames or deletes a location, then 403", async () => {
    const list = (await team.reviewer.agent.get(base).expect(200)).body.locations;
    await team.reviewer.agent.post(base).send({ name: "no" }).expect(403);
    await team.reviewer.agent
      .patch(`${base}/${list[0].id}`)
      .send({ version: list[0].version, name: "no" })
      .expect(403);
    await team.reviewer.agent.delete(`${base}/${list[0].id}`).expect(403);
  });

  it("when an editor renames with the right version, then 200; with a stale one, then 409", async () => {
    const list = (await team.editor.agent.get(base).expect(200)).body.locations;
    const path = `${base}/${list[0].id}`;
    const renamed = await team.editor.agent
      .patch(path)
      .send({ version: list[0].version, name: "shell ring 2" })
      .expect(200);
    expect(renamed.body.location.version).toBe(list[0].version + 1);
    const stale = await team.editor2.agent.patch(path).send({ version: list[0].version, name: "shell" });
    expect(stale.status).toBe(409);
    expect((await team.editor.agent.get(path).expect(200)).body.location.name).toBe("shell ring 2");
  });

  it("when a location names a library material of another workspace, then 400 names the field", async () => {
    const other = await team.owner.agent.post("/api/workspaces").send({ name: "Other" }).expect(201);
    const foreign = await team.owner.agent
      .post(`/api/workspaces/${other.body.workspace.id}/materials`)
      .send({ name: "Foreign steel", yield: 300 })
      .expect(201);
    const refused = await team.editor.agent
      .post(base)
      .send({ name: "x", material: { kind: "workspace", id: foreign.body.material.id } });
    expect(refused.status).toBe(400);
    expect(refused.body.error.details[0].path).toBe("material.id");
  });

  it("when an editor deletes a location, then it leaves the list", async () => {
    const created = await team.editor.agent.post(base).send({ name: "temporary" }).expect(201);
    await team.editor.agent.delete(`${base}/${created.body.location.id}`).expect(204);
    const names = (await team.editor.agent.get(base).expect(200)).body.locations.map(
      (l: { name: string }) => l.name,
    );
    expect(names).not.toContain("temporary");
  });
});
