import type { AddressInfo } from "node:net";
import type { Server } from "node:http";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

// The app's own pool (10 connections) and a short acquire timeout (1.5 s, test/support/app.ts):
// a write that needs a second connection while its transaction holds one would wait it out
// and answer 503 once ten such writes run at once.
const { app, close } = buildTestApp({ webDist: null });
let server: Server;
let origin: string;
let cookie: string;
let team: ProjectTeam;
let base: string;
let locationId: string;

/** What a burst of requests gave: every status, the slowest answer, and every health answer meanwhile. */
type Burst = { statuses: number[]; slowestMs: number; health: number[] };

/** Sends `count` requests at once with `send`, asking for /api/health every 50 ms until they are all answered. */
async function burst(count: number, send: (i: number) => Promise<Response>): Promise<Burst> {
  const health: number[] = [];
  let done = false;
  const polling = (async () => {
    while (!done) {
      health.push((await fetch(`${origin}/api/health`)).status);
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
  })();
  const started = performance.now();
  const timed = await Promise.all(
    Array.from({ length: count }, async (_, i) => {
      const response = await send(i);
      await response.arrayBuffer();
      return { status: response.status, ms: performance.now() - started };
    }),
  );
  done = true;
  await polling;
  return { statuses: timed.map((t) => t.status), slowestMs: Math.max(...timed.map((t) => t.ms)), health };
}

const send = (method: string, path: string, body: unknown) =>
  fetch(`${origin}${path}`, {
    method,
    headers: { "content-type": "application/json", origin: TEST_ORIGIN, cookie },
    body: JSON.stringify(body),
  });

const count = (statuses: number[], status: number) => statuses.filter((s) => s === status).length;

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(team, { name: "Concurrency" }, ["mid-shell"]);
  base = wsPath(team, `/projects/${made.projectId}`);
  locationId = made.locationIds[0];
  server = app.listen(0, "127.0.0.1");
  await new Promise((resolve) => server.once("listening", resolve));
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const signIn = await fetch(`${origin}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: TEST_ORIGIN },
    body: JSON.stringify({ email: team.editor.email, password: team.editor.password }),
  });
  expect(signIn.status).toBe(200);
  cookie = signIn.headers.getSetCookie()[0].split(";")[0];
  // A running server has its connections open; open them here so the first burst does not
  // measure ten PostgreSQL connection set-ups.
  await Promise.all(Array.from({ length: 10 }, () => fetch(`${origin}/api/health`)));
});

afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await close();
});

/** A fresh load case with a state at the location; returns its path and version. */
async function freshCase(name: string) {
  const created = await send("POST", `${base}/load-cases`, {
    name,
    states: [{ locationId, stress: mpa(100, 50) }],
  });
  expect(created.status).toBe(201);
  const { loadCase } = (await created.json()) as { loadCase: { id: string; version: number } };
  return { path: `${base}/load-cases/${loadCase.id}`, version: loadCase.version };
}

describe("concurrent writes and the connection pool", () => {
  it("when 50 saves of one state start from the same version at once, then exactly one is 200 and 49 are 409, none 5xx, all within 2 s, and health answers 200 throughout", async () => {
    const c = await freshCase("Concurrent state saves");
    const result = await burst(50, (i) =>
      send("PUT", `${c.path}/states/${locationId}`, { version: c.version, stress: mpa(100 + i, 50) }),
    );
    expect(count(result.statuses, 200), JSON.stringify(result.statuses)).toBe(1);
    expect(count(result.statuses, 409)).toBe(49);
    expect(result.slowestMs).toBeLessThan(2_000);
    expect(result.health.length).toBeGreaterThan(0);
    expect(result.health.every((s) => s === 200)).toBe(true);
  });

  it("when 50 edits of one load case start from the same version at once, then exactly one is 200 and 49 are 409, none 5xx, and health answers 200 throughout", async () => {
    const c = await freshCase("Concurrent edits");
    const result = await burst(50, (i) =>
      send("PATCH", c.path, { version: c.version, description: `edit ${i}` }),
    );
    expect(count(result.statuses, 200), JSON.stringify(result.statuses)).toBe(1);
    expect(count(result.statuses, 409)).toBe(49);
    expect(result.slowestMs).toBeLessThan(2_000);
    expect(result.health.every((s) => s === 200)).toBe(true);
  });

  it("when 12 load cases are created at once, then all 12 are 201 and health answers 200 throughout", async () => {
    const result = await burst(12, (i) =>
      send("POST", `${base}/load-cases`, {
        name: `Parallel case ${i}`,
        states: [{ locationId, stress: mpa(i, 0) }],
      }),
    );
    expect(result.statuses).toEqual(Array(12).fill(201));
    expect(result.health.every((s) => s === 200)).toBe(true);
  });

  it("when 12 combinations are created at once, then all 12 are 201 and health answers 200 throughout", async () => {
    const a = await freshCase("Combined A");
    const b = await freshCase("Combined B");
    const ids = [a, b].map((c) => c.path.split("/").pop()!);
    const result = await burst(12, (i) =>
      send("POST", `${base}/combinations`, {
        name: `Parallel combination ${i}`,
        terms: [
          { loadCaseId: ids[0], factor: 1 },
          { loadCaseId: ids[1], factor: 0.5 },
        ],
      }),
    );
    expect(result.statuses).toEqual(Array(12).fill(201));
    expect(result.health.every((s) => s === 200)).toBe(true);
  });
});
