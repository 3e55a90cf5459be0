import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { browserAgent, uniqueEmail } from "../support/accounts";
import { buildTestApp } from "../support/app";
import { projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

// Item 8 of issue 10: PostgreSQL text cannot hold U+0000; a name with one was stored mangled and
// echoed back. Every text field now refuses it with a 400 that names the field's JSON path.
const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

const NUL = "\u0000";
let team: ProjectTeam;
let projectId: string;
let location: string;

beforeAll(async () => {
  team = await projectTeam(app);
  ({
    projectId,
    locationIds: [location],
  } = await projectWithLocations(team, { name: "NUL checks" }, ["weld toe"]));
});

/** Expects a 400 invalid_input whose details name `path` and the NUL character. */
function expectNulRefused(
  response: { status: number; body: { error?: { id: string; details?: unknown } } },
  path: string,
) {
  expect(response.status, JSON.stringify(response.body)).toBe(400);
  expect(response.body.error?.id).toBe("invalid_input");
  expect(response.body.error?.details).toContainEqual({ path, message: expect.stringMatching(/U\+0000/) });
}

describe("NUL characters in text fields", () => {
  it("when a workspace name holds a NUL, then 400 names `name` and no workspace is created", async () => {
    const name = `Bad${NUL}name ${Date.now()}`;
    expectNulRefused(await team.owner.agent.post("/api/workspaces").send({ name }), "name");
    const list = await team.owner.agent.get("/api/workspaces").expect(200);
    expect(JSON.stringify(list.body)).not.toContain("Bad");
  });

  it("when a project name or description holds a NUL, then 400 names the field", async () => {
    expectNulRefused(
      await team.editor.agent.post(wsPath(team, "/projects")).send({ name: `P${NUL}` }),
      "name",
    );
    expectNulRefused(
      await team.editor.agent
        .patch(wsPath(team, `/projects/${projectId}`))
        .send({ version: 1, description: `line one${NUL}` }),
      "description",
    );
  });

  it("when a location name holds a NUL, then 400 names `name`", async () => {
    expectNulRefused(
      await team.editor.agent.post(wsPath(team, `/projects/${projectId}/locations`)).send({ name: `${NUL}` }),
      "name",
    );
  });

  it("when a state note deep inside a new load case holds a NUL, then 400 names states.0.note", async () => {
    const response = await team.editor.agent.post(wsPath(team, `/projects/${projectId}/load-cases`)).send({
      name: "Operating",
      states: [
        {
          locationId: location,
          stress: { unit: "MPa", components: { xx: 1, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 } },
          note: `gauge 3${NUL}`,
        },
      ],
    });
    expectNulRefused(response, "states.0.note");
  });

  it("when a sign-up name holds a NUL, then 400 names `name` and no account is made", async () => {
    const email = uniqueEmail("nul");
    const agent = browserAgent(app);
    expectNulRefused(
      await agent
        .post("/api/auth/sign-up")
        .send({ name: `Ann${NUL}`, email, password: "correct horse battery" }),
      "name",
    );
    const signIn = await agent.post("/api/auth/sign-in").send({ email, password: "correct horse battery" });
    expect(signIn.status).toBe(401);
  });

  it("when a NUL sits in an object key, then 400 names that key's path", async () => {
    const response = await team.owner.agent.post("/api/workspaces").send({ name: "Fine", [`x${NUL}`]: 1 });
    expectNulRefused(response, "x\\u0000");
  });

  it("when a query parameter holds a NUL, then 400 names query.<parameter>", async () => {
    const response = await team.owner.agent.get(wsPath(team, "/audit")).query({ before: `a${NUL}b` });
    expectNulRefused(response, "query.before");
  });

  it("when the same text has no NUL, then it is stored and read back as sent", async () => {
    const name = `Plain ${Date.now()} — ünïcode ✓`;
    const created = await team.editor.agent.post(wsPath(team, "/projects")).send({ name });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.project.name).toBe(name);
  });
});
