import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { PASSWORD_MIN_LENGTH } from "../../core/contract/auth";
import { PasswordResetToken } from "../../db/models/password-reset-token";
import { Session } from "../../db/models/session";
import { User } from "../../db/models/user";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import {
  browserAgent,
  confirmationToken,
  sessionCookieOf,
  signUp,
  TEST_PASSWORD,
  uniqueEmail,
} from "../support/accounts";
import { linkIn, mailCount, waitForMail } from "../support/mailbox";

const { app, close } = buildTestApp();
afterAll(close);

/**
 * Signs up through `target` and opens the confirmation link in the same agent; returns the
 * link's answer. The mail is read through the test app's mailbox (a production app has
 * none; both fake mail servers store in the same table).
 */
async function signUpAndConfirm(target: typeof app, name: string, email: string) {
  const agent = browserAgent(target);
  const answer = await agent
    .post("/api/auth/sign-up")
    .send({ name, email, password: TEST_PASSWORD })
    .expect(202);
  // Sign-up itself signs nobody in: the same answer goes to an address that has an account.
  expect(sessionCookieOf(answer)).toBeNull();
  const token = await confirmationToken(app, email);
  return agent.post("/api/auth/verify-email").send({ token }).expect(200);
}

describe("sign-up and the session cookie", () => {
  it("when someone confirms their sign-up, then the cookie is HttpOnly, SameSite=Lax, path / and not Secure over plain-http tests", async () => {
    const response = await signUpAndConfirm(app, "Mira Castellan", uniqueEmail("mira"));
    const cookie = ([] as string[])
      .concat(response.headers["set-cookie"] ?? [])
      .find((c) => c.startsWith("sigmacube_session="))!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Path=\//);
    expect(cookie).not.toMatch(/Secure/i);
    expect(response.body.user).toMatchObject({ name: "Mira Castellan" });
  });

  it("when the app runs in production, then the session cookie is Secure", async () => {
    // Sequelize models are module-wide: this second app's pool stays open until the file ends.
    const production = buildTestApp({ nodeEnv: "production" });
    afterAll(production.close);
    const response = await signUpAndConfirm(production.app, "Teo Valdric", uniqueEmail("teo"));
    expect(([] as string[]).concat(response.headers["set-cookie"] ?? []).join("\n")).toMatch(
      /sigmacube_session=\w+.*; Secure/i,
    );
  });

  it("when the session table is read, then it holds a hash of the cookie's id, not the id", async () => {
    const account = await signUp(app);
    const response = await account.agent
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(200);
    const id = sessionCookieOf(response)!.split("=")[1];
    const rows = await Session.findAll({ where: { userId: account.user.id } });
    expect(rows).toHaveLength(1);
    expect(rows[0].id).toMatch(/^[0-9a-f]{64}$/);
    expect(rows[0].id).not.toBe(id);
  });

  it("when the answer is read, then it carries no password hash, session id or token", async () => {
    const account = await signUp(app);
    const me = await account.agent.get("/api/account").expect(200);
    expect(Object.keys(me.body.user).sort()).toEqual(["createdAt", "email", "id", "name"]);
    expect(JSON.stringify(me.body)).not.toMatch(/argon2|passwordHash|session/i);
  });

  it("when the password is too short, then it is a 400 naming the field with the minimum", async () => {
    const response = await browserAgent(app)
      .post("/api/auth/sign-up")
      .send({ name: "Sam", email: "not-an-address", password: "short" })
      .expect(400);
    expect(response.body.error.id).toBe("invalid_input");
    expect(response.body.error.details).toEqual(
      expect.arrayContaining([
        { path: "password", message: `Use at least ${PASSWORD_MIN_LENGTH} characters.` },
        { path: "email", message: "Enter an e-mail address like name@example.com." },
      ]),
    );
  });

  it("when an address is used again in other letter case, then sign-up answers as for a new address, mails a reminder, and the account is unchanged", async () => {
    const email = uniqueEmail("Ines");
    const first = await signUp(app, { email, name: "Ines Okafor-Lund" });
    const again = await browserAgent(app)
      .post("/api/auth/sign-up")
      .send({ name: "Ines again", email: email.toUpperCase(), password: "another passphrase" })
      .expect(202);
    expect(sessionCookieOf(again)).toBeNull();
    const reminder = await waitForMail(app, email, { subject: /already have an account/ });
    expect(reminder.text).toContain("Hello Ines Okafor-Lund");
    expect(await User.count({ where: { email: [email, email.toUpperCase()] } })).toBe(1);
    expect((await User.findByPk(first.user.id))!.name).toBe("Ines Okafor-Lund");
    await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email: email.toUpperCase(), password: TEST_PASSWORD })
      .expect(200);
    await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email, password: "another passphrase" })
      .expect(401);
  });

  it("when a confirmation link is opened twice or was never issued, then it is a 400 on the token field", async () => {
    const email = uniqueEmail("twice");
    await browserAgent(app)
      .post("/api/auth/sign-up")
      .send({ name: "Twice", email, password: TEST_PASSWORD })
      .expect(202);
    const token = await confirmationToken(app, email);
    await browserAgent(app).post("/api/auth/verify-email").send({ token }).expect(200);
    const reuse = await browserAgent(app).post("/api/auth/verify-email").send({ token }).expect(400);
    expect(reuse.body.error.details).toEqual([
      { path: "token", message: expect.stringMatching(/used already/) },
    ]);
    const unknown = await browserAgent(app)
      .post("/api/auth/verify-email")
      .send({ token: "B".repeat(43) })
      .expect(400);
    expect(unknown.body.error.details[0].path).toBe("token");
  });
});

describe("sign-in", () => {
  it("when the same browser signs in again, then the session id changes and the old one stops working", async () => {
    const account = await signUp(app);
    const first = await account.agent
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(200);
    const second = await account.agent
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(200);
    const a = sessionCookieOf(first)!;
    const b = sessionCookieOf(second)!;
    expect(a).toBeTruthy();
    expect(b).toBeTruthy();
    expect(a).not.toBe(b);
    await request(app).get("/api/account").set("Cookie", a).expect(401);
    await request(app).get("/api/account").set("Cookie", b).expect(200);
  });

  it("when the address is unknown or the password wrong, then the answers are identical", async () => {
    const account = await signUp(app);
    const unknown = await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email: uniqueEmail("nobody"), password: TEST_PASSWORD });
    const wrong = await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: "wrong password!" });
    expect(unknown.status).toBe(401);
    expect(wrong.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(unknown.body.error.id).toBe("invalid_credentials");
    expect(sessionCookieOf(unknown)).toBeNull();
    expect(sessionCookieOf(wrong)).toBeNull();
  });

  it("when someone signs out, then the cookie is cleared and the session no longer works", async () => {
    const account = await signUp(app);
    const cookie = sessionCookieOf(
      await account.agent.post("/api/auth/sign-in").send({ email: account.email, password: TEST_PASSWORD }),
    )!;
    const out = await account.agent.post("/api/auth/sign-out").expect(204);
    expect(String(out.headers["set-cookie"])).toMatch(/sigmacube_session=;.*Max-Age=0/i);
    await request(app).get("/api/account").set("Cookie", cookie).expect(401);
    expect((await account.agent.get("/api/auth/session").expect(200)).body).toEqual({ user: null });
  });

  it("when someone signs out everywhere, then every device's session ends", async () => {
    const account = await signUp(app);
    const laptop = browserAgent(app);
    await laptop
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(200);
    await laptop.get("/api/account").expect(200);
    await account.agent.post("/api/auth/sign-out-everywhere").expect(204);
    await laptop.get("/api/account").expect(401);
    await account.agent.get("/api/account").expect(401);
    expect(await Session.count({ where: { userId: account.user.id } })).toBe(0);
  });
});

describe("password reset through the fake SMTP server", () => {
  it("when forgot-password is asked for a known and an unknown address, then the answers are identical and only the known one gets mail", async () => {
    const account = await signUp(app);
    const stranger = uniqueEmail("stranger");
    const known = await browserAgent(app).post("/api/auth/forgot-password").send({ email: account.email });
    const unknown = await browserAgent(app).post("/api/auth/forgot-password").send({ email: stranger });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    await waitForMail(app, account.email, { subject: /reset your password/ });
    expect(await mailCount(app, stranger)).toBe(0);
  });

  it("when the link is followed, then the password changes, other sessions end, and the link cannot be used twice", async () => {
    const account = await signUp(app);
    const otherDevice = browserAgent(app);
    await otherDevice
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(200);

    await browserAgent(app).post("/api/auth/forgot-password").send({ email: account.email }).expect(202);
    const mail = await waitForMail(app, account.email, { subject: /reset your password/ });
    expect(mail.subject).toContain("Sigmacube");
    expect(mail.text).toMatch(/expires in one hour/);
    const link = linkIn(mail, "/reset-password/");
    expect(link.origin).toBe(TEST_ORIGIN);
    expect(mail.html).toContain(link.href);
    const token = link.pathname.split("/").pop()!;
    // Only a hash is stored.
    expect(await PasswordResetToken.count({ where: { tokenHash: token } })).toBe(0);

    const browser = browserAgent(app);
    const reset = await browser
      .post("/api/auth/reset-password")
      .send({ token, password: "a brand new passphrase" })
      .expect(200);
    expect(reset.body.user.email).toBe(account.email);
    await browser.get("/api/account").expect(200);
    await otherDevice.get("/api/account").expect(401);
    await account.agent.get("/api/account").expect(401);

    await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(401);
    await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: "a brand new passphrase" })
      .expect(200);

    const reuse = await browserAgent(app)
      .post("/api/auth/reset-password")
      .send({ token, password: "yet another passphrase" })
      .expect(400);
    expect(reuse.body.error.details).toEqual([
      { path: "token", message: expect.stringMatching(/used already/) },
    ]);
  });

  it("when the link is older than one hour, then it is refused as expired and the password stays", async () => {
    const account = await signUp(app);
    await browserAgent(app).post("/api/auth/forgot-password").send({ email: account.email }).expect(202);
    const token = linkIn(await waitForMail(app, account.email, { subject: /reset/ }), "/reset-password/")
      .pathname.split("/")
      .pop()!;
    const row = await PasswordResetToken.findOne({ where: { userId: account.user.id } });
    const created = row!.createdAt.getTime();
    expect(row!.expiresAt.getTime() - created).toBeGreaterThan(59 * 60_000);
    expect(row!.expiresAt.getTime() - created).toBeLessThanOrEqual(60 * 60_000 + 1000);
    await row!.update({ expiresAt: new Date(Date.now() - 1000) });
    const response = await browserAgent(app)
      .post("/api/auth/reset-password")
      .send({ token, password: "too late passphrase" })
      .expect(400);
    expect(response.body.error.details[0]).toEqual({
      path: "token",
      message: expect.stringMatching(/expired/),
    });
    await browserAgent(app)
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(200);
  });

  it("when a token nobody issued is sent, then it is a 400 on the token field", async () => {
    const response = await browserAgent(app)
      .post("/api/auth/reset-password")
      .send({ token: "A".repeat(43), password: "whatever passphrase" })
      .expect(400);
    expect(response.body.error.details[0].path).toBe("token");
  });
});

describe("account settings", () => {
  it("when the password is changed, then the current password is checked, this session stays and the others end", async () => {
    const account = await signUp(app);
    const tablet = browserAgent(app);
    await tablet
      .post("/api/auth/sign-in")
      .send({ email: account.email, password: TEST_PASSWORD })
      .expect(200);
    const wrong = await account.agent
      .post("/api/account/password")
      .send({ currentPassword: "not my password", newPassword: "something much longer" })
      .expect(400);
    expect(wrong.body.error.details).toEqual([
      { path: "currentPassword", message: "That is not your current password." },
    ]);
    await account.agent
      .post("/api/account/password")
      .send({ currentPassword: TEST_PASSWORD, newPassword: "something much longer" })
      .expect(204);
    await account.agent.get("/api/account").expect(200);
    await tablet.get("/api/account").expect(401);
    const stored = await User.findByPk(account.user.id);
    expect(stored!.passwordHash).toMatch(/^\$argon2id\$/);
  });

  it("when the name is changed, then the session shows the new name", async () => {
    const account = await signUp(app);
    await account.agent.patch("/api/account").send({ name: "  Sam Pellworth " }).expect(200);
    expect((await account.agent.get("/api/auth/session").expect(200)).body.user.name).toBe("Sam Pellworth");
  });
});
