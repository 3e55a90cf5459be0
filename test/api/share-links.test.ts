import { afterAll, describe, expect, it } from "vitest";
import { ShareLink } from "../../db/models/share-link";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import { browserAgent, createWorkspace, signUp, type TestAccount } from "../support/accounts";

const { app, close } = buildTestApp();
afterAll(close);

async function workspaceWithLink(body: Record<string, unknown> = {}) {
  const owner = await signUp(app, { name: "Mira Castellan" });
  const workspaceId = await createWorkspace(owner, "Quillon Engineering");
  const created = await owner.agent.post(`/api/workspaces/${workspaceId}/share-links`).send(body).expect(201);
  const url = new URL(created.body.url);
  return { owner, workspaceId, link: created.body.shareLink, url, token: url.pathname.split("/").pop()! };
}

const join = (account: TestAccount, token: string) => account.agent.post(`/api/share-links/${token}/join`);

describe("share links", () => {
  it("when a link is created without options, then it grants viewer for 7 days, its URL is shown once and only a hash is stored", async () => {
    const { owner, workspaceId, link, url, token } = await workspaceWithLink();
    expect(url.origin).toBe(TEST_ORIGIN);
    expect(url.pathname).toMatch(/^\/join\/[A-Za-z0-9_-]{43}$/);
    expect(link).toMatchObject({
      role: "viewer",
      state: "active",
      maxUses: null,
      useCount: 0,
      createdByName: "Mira Castellan",
    });
    const days = (new Date(link.expiresAt).getTime() - new Date(link.createdAt).getTime()) / 86_400_000;
    expect(days).toBeCloseTo(7, 3);
    const stored = await ShareLink.findByPk(link.id);
    expect(stored!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored!.tokenHash).not.toContain(token);
    const listed = await owner.agent.get(`/api/workspaces/${workspaceId}/share-links`).expect(200);
    expect(JSON.stringify(listed.body)).not.toContain(token);
  });

  it("when a signed-in person opens the link and joins, then they are a member with its role", async () => {
    const { workspaceId, token } = await workspaceWithLink({ role: "reviewer" });
    expect((await browserAgent(app).get(`/api/share-links/${token}`).expect(200)).body).toMatchObject({
      workspaceName: "Quillon Engineering",
      role: "reviewer",
      state: "active",
    });
    const ines = await signUp(app);
    expect((await join(ines, token).expect(200)).body).toEqual({
      workspaceId,
      role: "reviewer",
      alreadyMember: false,
    });
    expect((await ines.agent.get(`/api/workspaces/${workspaceId}`).expect(200)).body.workspace.role).toBe(
      "reviewer",
    );
  });

  it("when the link allows one use, then a second person is refused but a member opening it again uses nothing", async () => {
    const { owner, workspaceId, token, link } = await workspaceWithLink({ maxUses: 1 });
    const first = await signUp(app);
    await join(first, token).expect(200);
    expect((await join(first, token).expect(200)).body.alreadyMember).toBe(true);
    const second = await signUp(app);
    expect((await join(second, token).expect(409)).body.error.id).toBe("share_link_used_up");
    const listed = await owner.agent.get(`/api/workspaces/${workspaceId}/share-links`).expect(200);
    expect(listed.body.shareLinks.find((l: { id: string }) => l.id === link.id)).toMatchObject({
      useCount: 1,
      state: "used_up",
    });
  });

  it("when the link is revoked, then joining is refused and revoking again is a conflict", async () => {
    const { owner, workspaceId, token, link } = await workspaceWithLink();
    await owner.agent.delete(`/api/workspaces/${workspaceId}/share-links/${link.id}`).expect(204);
    const late = await signUp(app);
    expect((await join(late, token).expect(409)).body.error.id).toBe("share_link_revoked");
    await owner.agent.delete(`/api/workspaces/${workspaceId}/share-links/${link.id}`).expect(409);
    await late.agent.get(`/api/workspaces/${workspaceId}`).expect(404);
  });

  it("when the link has expired, then joining is refused as expired", async () => {
    const { token, link } = await workspaceWithLink({ expiresInDays: 1 });
    await ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: link.id } });
    expect((await join(await signUp(app), token).expect(409)).body.error.id).toBe("share_link_expired");
  });

  it("when nobody is signed in, then joining is a 401 (the preview still works)", async () => {
    const { token } = await workspaceWithLink();
    await browserAgent(app).post(`/api/share-links/${token}/join`).expect(401);
    await browserAgent(app).get(`/api/share-links/${token}`).expect(200);
  });

  it("when a link would grant owner or has silly limits, then the 400 names each field", async () => {
    const owner = await signUp(app);
    const workspaceId = await createWorkspace(owner);
    const response = await owner.agent
      .post(`/api/workspaces/${workspaceId}/share-links`)
      .send({ role: "owner", expiresInDays: 0, maxUses: 1.5 })
      .expect(400);
    expect(response.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual([
      "expiresInDays",
      "maxUses",
      "role",
    ]);
    expect(response.body.error.details.find((d: { path: string }) => d.path === "role").message).toMatch(
      /never owner/,
    );
  });
});
