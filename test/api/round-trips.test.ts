import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

/** Every statement the app sends to PostgreSQL while `run` runs (Sequelize's logging hook). */
async function statementsDuring(run: () => Promise<unknown>): Promise<string[]> {
  const statements: string[] = [];
  // Sequelize reads `options.logging` on every query; its typings do not declare `options`.
  const options = (context.sequelize as unknown as { options: { logging: unknown } }).options;
  const before = options.logging;
  options.logging = (sql: string) => void statements.push(sql);
  try {
    await run();
  } finally {
    options.logging = before;
  }
  return statements;
}

let team: ProjectTeam;
let comparison: string;
let projectPath: string;

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(
    team,
    { name: "Round trips", defaultMaterial: { kind: "published", id: "sa516-70" } },
    ["plate"],
  );
  const base = wsPath(team, `/projects/${made.projectId}`);
  await team.editor.agent
    .post(`${base}/load-cases`)
    .send({ name: "Design", states: [{ locationId: made.locationIds[0], stress: mpa(120, 60) }] })
    .expect(201);
  comparison = `${base}/comparison`;
  projectPath = base;
  // The first request of a member records their activity (a write at most once a minute); warm it.
  await team.viewer.agent.get(comparison).expect(200);
});

describe("database round trips of a signed-in workspace request", () => {
  it("when a member reads a comparison nobody changed since it was last answered, then one statement runs: the session with the membership and the inputs stamp", async () => {
    const statements = await statementsDuring(() => team.viewer.agent.get(comparison).expect(200));
    expect(statements).toHaveLength(1);
    expect(statements[0]).toMatch(/FROM sessions s JOIN users u[\s\S]*LEFT JOIN memberships m/);
    expect(statements[0]).toMatch(/comparison_stamps/);
  });

  it("when an input changed since, then two statements run: the session with the membership and the stamp, and the project's inputs", async () => {
    await team.editor.agent.post(`${projectPath}/locations`).send({ name: "nozzle" }).expect(201);
    const statements = await statementsDuring(() => team.viewer.agent.get(comparison).expect(200));
    expect(statements).toHaveLength(2);
    expect(statements[0]).toMatch(/FROM sessions s JOIN users u[\s\S]*LEFT JOIN memberships m/);
    expect(statements[1]).toMatch(/FROM projects p/);
  });

  it("when someone who is not a member asks, then the same one session statement finds no membership and the answer is 404", async () => {
    const statements = await statementsDuring(() => team.outsider.agent.get(comparison).expect(404));
    expect(statements).toHaveLength(1);
  });

  it("when the path names no workspace, then the session statement still runs once and the request works as before", async () => {
    const statements = await statementsDuring(() => team.viewer.agent.get("/api/account").expect(200));
    expect(statements[0]).toMatch(/FROM sessions s JOIN users u/);
    expect(statements.filter((s) => /FROM sessions s/.test(s))).toHaveLength(1);
  });
});
