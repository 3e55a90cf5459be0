import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { auditListSchema } from "../../core/contract/projects";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let projectId: string;
let shell: string;
beforeAll(async () => {
  team = await projectTeam(app);
  ({
    projectId,
    locationIds: [shell],
  } = await projectWithLocations(team, { name: "Audited" }, ["mid-shell"]));
});

describe("the audit trail", () => {
  it("when an editor creates and changes a case, then every member reads who did what, newest first, with the values before and after", async () => {
    const base = wsPath(team, `/projects/${projectId}/load-cases`);
    const created = await team.editor.agent
      .post(base)
      .send({ name: "Operating", states: [{ locationId: shell, stress: mpa(56.25, 28.125) }] })
      .expect(201);
    await team.editor2.agent
      .put(`${base}/${created.body.loadCase.id}/states/${shell}`)
      .send({ version: 1, stress: mpa(60, 30), source: "calculator" })
      .expect(200);

    for (const member of [team.viewer, team.reviewer, team.owner]) {
      const page = auditListSchema.parse(
        (await member.agent.get(wsPath(team, `/audit?projectId=${projectId}`)).expect(200)).body,
      );
      expect(page.events.map((e) => [e.actor.name, e.entityType, e.action])).toEqual([
        ["Editor Two", "stress-state", "update"],
        ["Editor One", "stress-state", "create"],
        ["Editor One", "load-case", "create"],
        ["Editor One", "location", "create"],
        ["Editor One", "project", "create"],
      ]);
      expect(page.events[0].changes).toMatchObject({
        fromPa: { xx: 56.25e6 },
        toPa: { xx: 60e6 },
        revision: 2,
      });
      expect(page.events[0].summary).toMatch(/Operating.*mid-shell.*revision 2.*calculator/);
      // In words, in the unit the state was entered in: only the components that changed.
      expect(page.events[0].details).toEqual([
        { field: "σxx", from: "56.25 MPa", to: "60 MPa" },
        { field: "σyy", from: "28.13 MPa", to: "30 MPa" },
      ]);
    }
    await team.outsider.agent.get(wsPath(team, "/audit")).expect(404);
  });

  it("when the project's name, factors and default material change, then the trail shows each old → new value in words", async () => {
    const path = wsPath(team, `/projects/${projectId}`);
    const before = (await team.editor.agent.get(path).expect(200)).body.project;
    await team.editor.agent
      .patch(path)
      .send({
        version: before.version,
        name: "Audited vessel",
        requirements: [
          { criterion: "von-mises", requiredFactor: 1.6 },
          { criterion: "tresca", requiredFactor: 1.5 },
        ],
        defaultMaterial: { kind: "published", id: "sa516-70" },
      })
      .expect(200);
    const page = auditListSchema.parse(
      (await team.viewer.agent.get(wsPath(team, `/audit?projectId=${projectId}&limit=1`)).expect(200)).body,
    );
    const byField = new Map(page.events[0].details.map((d) => [d.field, d]));
    expect(byField.get("Name")).toEqual({ field: "Name", from: "“Audited”", to: "“Audited vessel”" });
    expect(byField.get("Required factors")?.to).toBe("von Mises 1.6 · Tresca 1.5");
    expect(byField.get("Default material")?.to).toMatch(/516/);
  });

  it("when a page is asked with a limit, then nextBefore leads to the older events", async () => {
    const first = (await team.viewer.agent.get(wsPath(team, "/audit?limit=2")).expect(200)).body;
    expect(first.events).toHaveLength(2);
    const second = (
      await team.viewer.agent.get(wsPath(team, `/audit?limit=2&before=${first.nextBefore}`)).expect(200)
    ).body;
    expect(Number(second.events[0].id)).toBeLessThan(Number(first.events[1].id));
  });

  it("when a change is refused (stale version), then no event is written for it", async () => {
    const before = (await team.viewer.agent.get(wsPath(team, "/audit?limit=500")).expect(200)).body.events
      .length;
    await team.editor.agent
      .patch(wsPath(team, `/projects/${projectId}`))
      .send({ version: 99, name: "Nope" })
      .expect(409);
    const after = (await team.viewer.agent.get(wsPath(team, "/audit?limit=500")).expect(200)).body.events
      .length;
    expect(after).toBe(before);
  });

  it("when the query is malformed, then 400 names the field", async () => {
    const bad = await team.viewer.agent.get(wsPath(team, "/audit?limit=0&projectId=nope"));
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual([
      "query.limit",
      "query.projectId",
    ]);
  });
});
