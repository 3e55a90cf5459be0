import { afterAll, describe, expect, it } from "vitest";
import { Invitation } from "../../db/models/invitation";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import { browserAgent, createWorkspace, signUp, uniqueEmail } from "../support/accounts";
import { linkIn, waitForMail } from "../support/mailbox";

const { app, close } = buildTestApp();
afterAll(close);

/** An owner, a workspace, and an invitation mailed to a new address; returns the token from the mail. */
async function invite(role = "reviewer") {
  const owner = await signUp(app, { name: "Mira Castellan" });
  const workspaceId = await createWorkspace(owner, "Quillon Engineering");
  const email = uniqueEmail("ines");
  const created = await owner.agent
    .post(`/api/workspaces/${workspaceId}/invitations`)
    .send({ email, role })
    .expect(201);
  const mail = await waitForMail(app, email, { subject: /invited you/ });
  const token = linkIn(mail, "/invitations/").pathname.split("/").pop()!;
  return { owner, workspaceId, email, token, mail, invitationId: created.body.invitation.id as string };
}

describe("invitations end to end through the fake SMTP server", () => {
  it("when an owner invites by e-mail, then the mail has both parts, the product, the workspace and a link to the app", async () => {
    const { mail, token } = await invite();
    expect(mail.subject).toBe("Mira Castellan invited you to Quillon Engineering on Sigmacube");
    expect(mail.text).toContain('join the workspace "Quillon Engineering" on Sigmacube as reviewer');
    expect(mail.text).toContain(`${TEST_ORIGIN}/invitations/${token}`);
    expect(mail.html).toContain(`href="${TEST_ORIGIN}/invitations/${token}"`);
    expect(mail.html).toContain("Sigma");
    expect(await Invitation.count({ where: { tokenHash: token } })).toBe(0);
  });

  it("when the invitee signs up with that address and accepts, then they are a member with the invited role and the list says accepted", async () => {
    const { owner, workspaceId, email, token } = await invite("reviewer");
    const preview = await browserAgent(app).get(`/api/invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({
      workspaceName: "Quillon Engineering",
      role: "reviewer",
      email,
      state: "pending",
      invitedByName: "Mira Castellan",
    });

    const invitee = await signUp(app, { email: email.toUpperCase(), name: "Ines Okafor-Lund" });
    const accepted = await invitee.agent.post(`/api/invitations/${token}/accept`).expect(200);
    expect(accepted.body).toEqual({ workspaceId, role: "reviewer", alreadyMember: false });

    const members = await invitee.agent.get(`/api/workspaces/${workspaceId}/members`).expect(200);
    expect(members.body.members.map((m: { name: string; role: string }) => [m.name, m.role])).toEqual([
      ["Mira Castellan", "owner"],
      ["Ines Okafor-Lund", "reviewer"],
    ]);
    const list = await owner.agent.get(`/api/workspaces/${workspaceId}/invitations`).expect(200);
    expect(list.body.invitations[0]).toMatchObject({ email, state: "accepted", role: "reviewer" });
    expect(JSON.stringify(list.body)).not.toMatch(/token/i);

    const again = await invitee.agent.post(`/api/invitations/${token}/accept`).expect(409);
    expect(again.body.error.id).toBe("invitation_accepted");
  });

  it("when an invitation is older than 7 days, then accepting is refused as expired; resending mails a new link and the old one dies", async () => {
    const { owner, workspaceId, email, token, invitationId } = await invite("viewer");
    const row = await Invitation.findByPk(invitationId);
    const lifetimeDays = (row!.expiresAt.getTime() - row!.createdAt.getTime()) / 86_400_000;
    expect(lifetimeDays).toBeCloseTo(7, 3);
    await row!.update({ expiresAt: new Date(Date.now() - 1000) });

    const invitee = await signUp(app, { email });
    const refused = await invitee.agent.post(`/api/invitations/${token}/accept`).expect(409);
    expect(refused.body.error.id).toBe("invitation_expired");
    const listed = await owner.agent.get(`/api/workspaces/${workspaceId}/invitations`).expect(200);
    expect(listed.body.invitations[0].state).toBe("expired");

    const sentBefore = new Date();
    const resent = await owner.agent
      .post(`/api/workspaces/${workspaceId}/invitations/${invitationId}/resend`)
      .expect(200);
    expect(resent.body.invitation).toMatchObject({ state: "pending", sendCount: 2 });
    const fresh = linkIn(
      await waitForMail(app, email, { subject: /invited you/, after: sentBefore }),
      "/invitations/",
    )
      .pathname.split("/")
      .pop()!;
    expect(fresh).not.toBe(token);
    await invitee.agent.post(`/api/invitations/${token}/accept`).expect(404);
    await invitee.agent.post(`/api/invitations/${fresh}/accept`).expect(200);
  });

  it("when an invitation is revoked, then its link is refused and revoking again is a conflict", async () => {
    const { owner, workspaceId, email, token, invitationId } = await invite();
    await owner.agent.delete(`/api/workspaces/${workspaceId}/invitations/${invitationId}`).expect(204);
    const invitee = await signUp(app, { email });
    const refused = await invitee.agent.post(`/api/invitations/${token}/accept`).expect(409);
    expect(refused.body.error.id).toBe("invitation_revoked");
    expect((await browserAgent(app).get(`/api/invitations/${token}`).expect(200)).body.state).toBe("revoked");
    await owner.agent.delete(`/api/workspaces/${workspaceId}/invitations/${invitationId}`).expect(409);
    await invitee.agent.get(`/api/workspaces/${workspaceId}`).expect(404);
  });

  it("when someone signed in with another address opens the link, then it is refused with the invited address named", async () => {
    const { email, token } = await invite();
    const someoneElse = await signUp(app);
    const response = await someoneElse.agent.post(`/api/invitations/${token}/accept`).expect(403);
    expect(response.body.error).toMatchObject({ id: "invitation_other_address" });
    expect(response.body.error.message).toContain(email);
  });

  it("when the address is invited twice or belongs to a member, then it is a conflict", async () => {
    const { owner, workspaceId, email } = await invite();
    const twice = await owner.agent
      .post(`/api/workspaces/${workspaceId}/invitations`)
      .send({ email, role: "viewer" })
      .expect(409);
    expect(twice.body.error.id).toBe("already_invited");
    const self = await owner.agent
      .post(`/api/workspaces/${workspaceId}/invitations`)
      .send({ email: owner.email, role: "viewer" })
      .expect(409);
    expect(self.body.error.id).toBe("already_member");
  });

  it("when the body is wrong, then the 400 names role and email", async () => {
    const owner = await signUp(app);
    const workspaceId = await createWorkspace(owner);
    const response = await owner.agent
      .post(`/api/workspaces/${workspaceId}/invitations`)
      .send({ email: "nope", role: "boss" })
      .expect(400);
    expect(response.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual([
      "email",
      "role",
    ]);
  });
});
