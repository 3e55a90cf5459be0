import pg from "pg";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { createWorkspace, signUp, type TestAccount } from "../support/accounts";
import { buildTestApp } from "../support/app";

// Item 7 of issue 10: a write whose database connection dies under it answered 500. It is a
// 503 database_unavailable (the client may try again), and the app goes on with new connections.
// The loss is real: an admin connection holds a row lock so the app's write waits in PostgreSQL,
// then ends that backend with pg_terminate_backend (the server answers SQLSTATE 57P01 and closes it).
const { app, close } = buildTestApp({ webDist: null });
const admin = new pg.Client({ connectionString: inject("databaseUrl") });
let owner: TestAccount;

beforeAll(async () => {
  await admin.connect();
  owner = await signUp(app, { name: "Fault owner" });
});
afterAll(async () => {
  await admin.end();
  await close();
});

/** Waits until some backend of this database is blocked on a lock, then terminates it. */
async function terminateBlockedWrite(): Promise<number> {
  for (let attempt = 0; attempt < 200; attempt++) {
    const { rows } = await admin.query<{ pid: number }>(
      `SELECT pid FROM pg_stat_activity
        WHERE datname = current_database() AND wait_event_type = 'Lock' AND pid <> pg_backend_pid()`,
    );
    if (rows.length) {
      for (const { pid } of rows) await admin.query("SELECT pg_terminate_backend($1)", [pid]);
      return rows.length;
    }
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  throw new Error("no write ever waited on the lock");
}

/** Runs `write` while `lockSql` holds a row lock, kills the write's connection, and returns its answer. */
async function writeWhileConnectionDies<T>(lockSql: string, lockParams: unknown[], write: () => Promise<T>) {
  await admin.query("BEGIN");
  try {
    await admin.query(lockSql, lockParams);
    const answer = write();
    const terminated = await terminateBlockedWrite();
    expect(terminated).toBeGreaterThan(0);
    await admin.query("ROLLBACK");
    return await answer;
  } catch (error) {
    await admin.query("ROLLBACK").catch(() => {});
    throw error;
  }
}

describe("a write whose database connection dies", () => {
  it("when the connection of a single-statement write (workspace rename) is killed, then 503 database_unavailable and the name is unchanged", async () => {
    const workspaceId = await createWorkspace(owner, "Before the fault");
    const response = await writeWhileConnectionDies(
      "SELECT id FROM workspaces WHERE id = $1 FOR UPDATE",
      [workspaceId],
      async () => owner.agent.patch(`/api/workspaces/${workspaceId}`).send({ name: "During the fault" }),
    );
    expect(response.status, JSON.stringify(response.body)).toBe(503);
    expect(response.body.error.id).toBe("database_unavailable");
    const read = await owner.agent.get(`/api/workspaces/${workspaceId}`).expect(200);
    expect(read.body.workspace.name).toBe("Before the fault");
  });

  it("when the connection of a transaction (workspace create) is killed, then 503 database_unavailable, nothing half-made, and the next create works", async () => {
    const name = `Fault ${Date.now()}`;
    // The membership row's foreign key to the user waits for the admin's lock on that user.
    const response = await writeWhileConnectionDies(
      "SELECT id FROM users WHERE id = $1 FOR UPDATE",
      [owner.user.id],
      async () => owner.agent.post("/api/workspaces").send({ name }),
    );
    expect(response.status, JSON.stringify(response.body)).toBe(503);
    expect(response.body.error.id).toBe("database_unavailable");
    const { rows } = await admin.query("SELECT count(*)::int AS n FROM workspaces WHERE name = $1", [name]);
    expect(rows[0].n).toBe(0);
    const again = await owner.agent.post("/api/workspaces").send({ name });
    expect(again.status, JSON.stringify(again.body)).toBe(201);
  });
});
