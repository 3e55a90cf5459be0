import { randomBytes } from "node:crypto";
import { hash, type Algorithm } from "@node-rs/argon2";
import type { Transaction } from "sequelize";
import { Membership, type MembershipRole } from "./models/membership";
import { User } from "./models/user";
import { Workspace } from "./models/workspace";

/** The demo team from the scenario (all invented). */
export const DEMO_TEAM: { name: string; email: string; role: MembershipRole }[] = [
  { name: "Mira Castellan", email: "mira.castellan@quillon.example", role: "owner" },
  { name: "Teo Valdric", email: "teo.valdric@quillon.example", role: "editor" },
  { name: "Ines Okafor-Lund", email: "ines.okafor-lund@quillon.example", role: "reviewer" },
  { name: "Sam Pellworth", email: "sam.pellworth@harrowgate.example", role: "viewer" },
];

export const DEMO_WORKSPACE_NAME = "Quillon Engineering";

/**
 * Seed step "accounts": the four demo people, each with a random development-only password
 * (printed once, here, and never stored in plain text), and the workspace they share.
 * Hashing mirrors api/auth/password.ts (argon2id, OWASP parameters); db/ may not import api/,
 * and the PHC string carries the parameters, so sign-in verifies it either way.
 */
export async function seedDemoAccounts(
  transaction: Transaction,
  log: (line: string) => void,
): Promise<{ workspaceId: string }> {
  const existing = await Workspace.findOne({ where: { name: DEMO_WORKSPACE_NAME }, transaction });
  if (existing) return { workspaceId: existing.id };
  const lines: string[] = [];
  const users: User[] = [];
  for (const person of DEMO_TEAM) {
    const password = `demo-${randomBytes(6).toString("base64url")}`;
    const passwordHash = await hash(password, {
      algorithm: 2 as Algorithm,
      memoryCost: 19_456,
      timeCost: 2,
      parallelism: 1,
    });
    // Invented .example addresses no mail can reach: the seed vouches for them.
    users.push(
      await User.create(
        { name: person.name, email: person.email, passwordHash, emailVerifiedAt: new Date() },
        { transaction },
      ),
    );
    lines.push(`  ${person.role.padEnd(8)} ${person.name.padEnd(17)} ${person.email.padEnd(34)} ${password}`);
  }
  const workspace = await Workspace.create(
    { name: DEMO_WORKSPACE_NAME, createdBy: users[0].id },
    { transaction },
  );
  for (const [index, person] of DEMO_TEAM.entries()) {
    await Membership.create(
      {
        workspaceId: workspace.id,
        userId: users[index].id,
        role: person.role,
        joinedVia: "seed",
        addedBy: users[0].id,
      },
      { transaction },
    );
  }
  log(
    `demo accounts in "${DEMO_WORKSPACE_NAME}" (development only; shown this once, change them in Account):`,
  );
  for (const line of lines) log(line);
  return { workspaceId: workspace.id };
}
