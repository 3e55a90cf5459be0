import { afterAll, describe, expect, inject, it } from "vitest";
import { ensureDatabase } from "../../db/ensure-database";
import { migrate } from "../../db/migrate";
import { User } from "../../db/models/user";
import { DEMO_TEAM } from "../../db/seed-accounts";
import { seedDemo } from "../../db/seed";
import { buildTestApp } from "../support/app";
import { browserAgent } from "../support/accounts";

describe("the demo seed's accounts step", () => {
  const adminUrl = inject("adminUrl");
  const databaseUrl = adminUrl.replace(/\/postgres$/, "/sigmacube_seed_accounts");
  let closeApp: () => Promise<void> = async () => {};
  afterAll(() => closeApp());

  it("when a fresh database is seeded, then the team's passwords are printed once and sign in to the shared workspace with their roles", async () => {
    await ensureDatabase(adminUrl, "sigmacube_seed_accounts");
    const { app, context, close } = buildTestApp({ databaseUrl });
    closeApp = close;
    await migrate(context.sequelize);
    const lines: string[] = [];
    expect((await seedDemo(context.sequelize, (l) => lines.push(l))).seeded).toBe(true);

    for (const person of DEMO_TEAM) {
      const line = lines.find((l) => l.includes(person.email));
      expect(line, `a printed line for ${person.name}`).toBeDefined();
      const password = line!.trim().split(/\s+/).pop()!;
      const agent = browserAgent(app);
      await agent.post("/api/auth/sign-in").send({ email: person.email, password }).expect(200);
      const { workspaces } = (await agent.get("/api/workspaces").expect(200)).body;
      expect(workspaces).toEqual([
        expect.objectContaining({ name: "Quillon Engineering", role: person.role, memberCount: 4 }),
      ]);
      // Their invented addresses cannot receive mail: the seed marks them confirmed, so invitations work.
      const row = await User.findOne({ where: { email: person.email } });
      expect(row!.emailVerifiedAt, person.email).toBeInstanceOf(Date);
    }

    const again: string[] = [];
    expect((await seedDemo(context.sequelize, (l) => again.push(l))).seeded).toBe(false);
    expect(again.join("\n")).not.toMatch(/demo-/);
  });
});
