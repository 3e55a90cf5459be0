import { afterAll, describe, expect, it } from "vitest";
import { Invitation } from "../../db/models/invitation";
import { User } from "../../db/models/user";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import {
  browserAgent,
  createWorkspace,
  sessionCookieOf,
  signUp,
  TEST_PASSWORD,
  uniqueEmail,
} from "../support/accounts";
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
    // The words match the flow: the invitation page asks for one "Accept" after signing in.
    expect(mail.text).toContain("then choose “Accept” on the page that opens");
    expect(mail.text).not.toMatch(/straight after/);
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

describe("only a confirmed address accepts an invitation", () => {
  it("when an account that never confirmed its address accepts, then it is refused and mailed a link that leads back, after which accepting works", async () => {
    const { workspaceId, email, token } = await invite("editor");
    // Signed up, never opened the confirmation mail, signed in with the password.
    await browserAgent(app)
      .post("/api/auth/sign-up")
      .send({ name: "Pim Osterlund", email, password: TEST_PASSWORD })
      .expect(202);
    await waitForMail(app, email, { subject: /confirm your e-mail address/ });
    const agent = browserAgent(app);
    await agent.post("/api/auth/sign-in").send({ email, password: TEST_PASSWORD }).expect(200);
    const asked = new Date();
    const refused = await agent.post(`/api/invitations/${token}/accept`).expect(403);
    expect(refused.body.error.id).toBe("email_not_verified");
    expect(refused.body.error.message).toContain(email);
    await agent.get(`/api/workspaces/${workspaceId}`).expect(404);

    const mail = await waitForMail(app, email, { subject: /confirm your e-mail address/, after: asked });
    const confirmToken = linkIn(mail, "/verify-email/").pathname.split("/").pop()!;
    const confirmed = await agent.post("/api/auth/verify-email").send({ token: confirmToken }).expect(200);
    expect(confirmed.body.next).toBe(`/invitations/${token}`);
    const accepted = await agent.post(`/api/invitations/${token}/accept`).expect(200);
    expect(accepted.body).toMatchObject({ workspaceId, role: "editor" });
  });

  it("when someone signs up from the invitation link with the invited address, then they are signed in at once with a confirmed address and can accept", async () => {
    const { workspaceId, email, token } = await invite("viewer");
    const agent = browserAgent(app);
    const created = await agent
      .post("/api/auth/sign-up")
      .send({
        name: "Sam Pellworth",
        email: email.toUpperCase(),
        password: TEST_PASSWORD,
        invitationToken: token,
      })
      .expect(201);
    expect(sessionCookieOf(created)).not.toBeNull();
    const row = await User.findByPk(created.body.user.id);
    expect(row!.emailVerifiedAt).toBeInstanceOf(Date);
    await agent.post(`/api/invitations/${token}/accept`).expect(200);
    await agent.get(`/api/workspaces/${workspaceId}`).expect(200);

    // The link proves the address, so saying it has an account now tells its holder nothing new.
    const again = await browserAgent(app)
      .post("/api/auth/sign-up")
      .send({ name: "Sam again", email, password: TEST_PASSWORD, invitationToken: token })
      .expect(202);
    expect(sessionCookieOf(again)).toBeNull();
  });

  it("when an invitation token comes with another address, then sign-up is the plain check-your-mail answer and the address stays unconfirmed", async () => {
    const { token } = await invite();
    const other = uniqueEmail("other");
    const answer = await browserAgent(app)
      .post("/api/auth/sign-up")
      .send({ name: "Eve", email: other, password: TEST_PASSWORD, invitationToken: token })
      .expect(202);
    expect(sessionCookieOf(answer)).toBeNull();
    await waitForMail(app, other, { subject: /confirm your e-mail address/ });
    expect((await User.findOne({ where: { email: other } }))!.emailVerifiedAt).toBeNull();
  });

  it("when the invited address has an account already and signs up from the link, then it is told to sign in (409)", async () => {
    const owner = await signUp(app, { name: "Mira Castellan" });
    const workspaceId = await createWorkspace(owner);
    const existing = await signUp(app);
    // Invite an address whose account is not a member yet.
    await owner.agent
      .post(`/api/workspaces/${workspaceId}/invitations`)
      .send({ email: existing.email, role: "viewer" })
      .expect(201);
    const token = linkIn(await waitForMail(app, existing.email, { subject: /invited you/ }), "/invitations/")
      .pathname.split("/")
      .pop()!;
    const taken = await browserAgent(app)
      .post("/api/auth/sign-up")
      .send({ name: "Again", email: existing.email, password: TEST_PASSWORD, invitationToken: token })
      .expect(409);
    expect(taken.body.error.id).toBe("email_taken");
  });
});
