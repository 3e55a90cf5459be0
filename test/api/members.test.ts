import { afterAll, describe, expect, it } from "vitest";
import { buildTestApp } from "../support/app";
import { createWorkspace, signUp, type TestAccount } from "../support/accounts";

const { app, close } = buildTestApp();
afterAll(close);

/** Joins `account` to the workspace through a share link with `role` (editor at most). */
async function addThroughLink(owner: TestAccount, workspaceId: string, account: TestAccount, role: string) {
  const created = await owner.agent
    .post(`/api/workspaces/${workspaceId}/share-links`)
    .send({ role })
    .expect(201);
  await account.agent
    .post(`/api/share-links/${new URL(created.body.url).pathname.split("/").pop()}/join`)
    .expect(200);
}

async function memberIdOf(account: TestAccount, workspaceId: string, userId: string): Promise<string> {
  const list = await account.agent.get(`/api/workspaces/${workspaceId}/members`).expect(200);
  return list.body.members.find((m: { userId: string }) => m.userId === userId).id;
}

describe("members and the last-owner rule", () => {
  it("when the only owner tries to step down, leave or remove themself, then each is a 409 last_owner", async () => {
    const owner = await signUp(app);
    const workspaceId = await createWorkspace(owner);
    const myId = await memberIdOf(owner, workspaceId, owner.user.id);
    const demote = await owner.agent
      .patch(`/api/workspaces/${workspaceId}/members/${myId}`)
      .send({ role: "editor" })
      .expect(409);
    expect(demote.body.error.id).toBe("last_owner");
    expect((await owner.agent.post(`/api/workspaces/${workspaceId}/leave`).expect(409)).body.error.id).toBe(
      "last_owner",
    );
    await owner.agent.delete(`/api/workspaces/${workspaceId}/members/${myId}`).expect(409);
    expect((await owner.agent.get(`/api/workspaces/${workspaceId}`).expect(200)).body.workspace.role).toBe(
      "owner",
    );
  });

  it("when another member is made owner first, then the first owner may step down and leave", async () => {
    const mira = await signUp(app, { name: "Mira Castellan" });
    const teo = await signUp(app, { name: "Teo Valdric" });
    const workspaceId = await createWorkspace(mira);
    await addThroughLink(mira, workspaceId, teo, "editor");
    const teoId = await memberIdOf(mira, workspaceId, teo.user.id);
    const promoted = await mira.agent
      .patch(`/api/workspaces/${workspaceId}/members/${teoId}`)
      .send({ role: "owner" })
      .expect(200);
    expect(promoted.body.member).toMatchObject({ name: "Teo Valdric", role: "owner", isYou: false });
    await mira.agent.post(`/api/workspaces/${workspaceId}/leave`).expect(204);
    await mira.agent.get(`/api/workspaces/${workspaceId}`).expect(404);
    const left = await teo.agent.get(`/api/workspaces/${workspaceId}/members`).expect(200);
    expect(left.body.members).toHaveLength(1);
  });

  it("when the members table is read, then each row has role, joined date, last activity and marks the caller", async () => {
    const mira = await signUp(app, { name: "Mira Castellan" });
    const sam = await signUp(app, { name: "Sam Pellworth" });
    const workspaceId = await createWorkspace(mira);
    await addThroughLink(mira, workspaceId, sam, "viewer");
    const { members } = (await sam.agent.get(`/api/workspaces/${workspaceId}/members`).expect(200)).body;
    expect(
      members.map((m: { name: string; role: string; isYou: boolean }) => [m.name, m.role, m.isYou]),
    ).toEqual([
      ["Mira Castellan", "owner", false],
      ["Sam Pellworth", "viewer", true],
    ]);
    for (const member of members) {
      expect(Date.parse(member.joinedAt)).toBeGreaterThan(Date.now() - 60_000);
      expect(Date.parse(member.lastActiveAt)).toBeGreaterThan(Date.now() - 60_000);
    }
  });

  it("when an owner removes a member, then that member loses access; a viewer cannot change roles", async () => {
    const mira = await signUp(app);
    const sam = await signUp(app);
    const workspaceId = await createWorkspace(mira);
    await addThroughLink(mira, workspaceId, sam, "viewer");
    const miraId = await memberIdOf(sam, workspaceId, mira.user.id);
    const refused = await sam.agent
      .patch(`/api/workspaces/${workspaceId}/members/${miraId}`)
      .send({ role: "viewer" })
      .expect(403);
    expect(refused.body.error.message).toMatch(/owner role/);
    const samId = await memberIdOf(mira, workspaceId, sam.user.id);
    await mira.agent.delete(`/api/workspaces/${workspaceId}/members/${samId}`).expect(204);
    await sam.agent.get(`/api/workspaces/${workspaceId}`).expect(404);
  });

  it("when an owner deletes the workspace, then it is gone for every member", async () => {
    const mira = await signUp(app);
    const teo = await signUp(app);
    const workspaceId = await createWorkspace(mira, "To be deleted");
    await addThroughLink(mira, workspaceId, teo, "editor");
    await teo.agent.delete(`/api/workspaces/${workspaceId}`).expect(403);
    await mira.agent.delete(`/api/workspaces/${workspaceId}`).expect(204);
    await teo.agent.get(`/api/workspaces/${workspaceId}`).expect(404);
    expect((await teo.agent.get("/api/workspaces").expect(200)).body.workspaces).toEqual([]);
  });

  it("when a workspace id is not a UUID, then the 400 names params.workspaceId", async () => {
    const mira = await signUp(app);
    const response = await mira.agent.get("/api/workspaces/not-a-uuid/members").expect(400);
    expect(response.body.error.details[0].path).toBe("params.workspaceId");
  });
});
