import { afterAll, describe, expect, it } from "vitest";
import { Op } from "sequelize";
import { PasswordResetToken } from "../../db/models/password-reset-token";
import { hashToken, newLinkToken } from "../../api/auth/tokens";
import { buildTestApp } from "../support/app";
import { browserAgent, signUp, TEST_PASSWORD } from "../support/accounts";
import { linkIn, waitForMail } from "../support/mailbox";

const { app, close } = buildTestApp();
afterAll(close);

/** Asks for a reset link for `email` and returns the token from the mail. */
async function mailedResetToken(email: string): Promise<string> {
  const asked = new Date();
  await browserAgent(app).post("/api/auth/forgot-password").send({ email }).expect(202);
  const mail = await waitForMail(app, email, { subject: /reset your password/, after: asked });
  return linkIn(mail, "/reset-password/").pathname.split("/").pop()!;
}

const unusedLinks = (userId: string) =>
  PasswordResetToken.count({ where: { userId, usedAt: { [Op.is]: null } } });

describe("unused password-reset links die when the password changes", () => {
  it("when the password is changed in account settings, then a reset link mailed before no longer works", async () => {
    const account = await signUp(app);
    const token = await mailedResetToken(account.email);
    expect(await unusedLinks(account.user.id)).toBe(1);
    await account.agent
      .post("/api/account/password")
      .send({ currentPassword: TEST_PASSWORD, newPassword: "a changed passphrase" })
      .expect(204);
    expect(await unusedLinks(account.user.id)).toBe(0);
    const late = await browserAgent(app)
      .post("/api/auth/reset-password")
      .send({ token, password: "the attacker's choice" })
      .expect(400);
    expect(late.body.error.details[0].path).toBe("token");
    await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: "a changed passphrase" })
      .expect(200);
  });

  it("when a password is reset with one link, then the account's other unused links are deleted", async () => {
    const account = await signUp(app);
    const used = await mailedResetToken(account.email);
    // A second live link, as when two processes answered two requests at the same moment.
    const other = newLinkToken();
    await PasswordResetToken.create({
      userId: account.user.id,
      tokenHash: hashToken(other),
      expiresAt: new Date(Date.now() + 3_600_000),
    });
    expect(await unusedLinks(account.user.id)).toBe(2);
    await browserAgent(app)
      .post("/api/auth/reset-password")
      .send({ token: used, password: "the new passphrase" })
      .expect(200);
    expect(await unusedLinks(account.user.id)).toBe(0);
    await browserAgent(app)
      .post("/api/auth/reset-password")
      .send({ token: other, password: "another passphrase" })
      .expect(400);
  });
});
