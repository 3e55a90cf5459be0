import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { buildTestApp } from "../support/app";
import { browserAgent, signUp, TEST_PASSWORD, uniqueEmail } from "../support/accounts";

const tight = (prefix: string) => ({
  prefix,
  signIn: { limit: 3, windowMs: 60_000 },
  signInPerAccount: { limit: 100, windowMs: 60_000 },
  signUp: { limit: 2, windowMs: 60_000 },
  forgotPassword: { limit: 2, windowMs: 120_000 },
});

describe("rate limits on sign-in, sign-up and forgot-password", () => {
  // Two apps over one database with one key prefix stand for two API processes behind one balancer.
  const prefix = `rl-${randomUUID()}:`;
  const first = buildTestApp({ rateLimits: tight(prefix) });
  const second = buildTestApp({ rateLimits: tight(prefix) });
  afterAll(async () => {
    await first.close();
    await second.close();
  });

  it("when sign-in is tried more often than allowed, then the next answer is 429 with Retry-After in seconds", async () => {
    const body = { email: uniqueEmail("guess"), password: "guessing wrong" };
    for (let i = 0; i < 3; i++)
      await browserAgent(first.app).post("/api/auth/sign-in").send(body).expect(401);
    const limited = await browserAgent(first.app).post("/api/auth/sign-in").send(body).expect(429);
    const retryAfter = Number(limited.headers["retry-after"]);
    expect(Number.isInteger(retryAfter)).toBe(true);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(60);
    expect(limited.body.error).toMatchObject({
      id: "rate_limited",
      details: { retryAfterSeconds: retryAfter },
    });
  });

  it("when the second process is asked, then it counts the same hits (the store is PostgreSQL)", async () => {
    const limited = await browserAgent(second.app)
      .post("/api/auth/sign-in")
      .send({ email: uniqueEmail(), password: TEST_PASSWORD })
      .expect(429);
    expect(limited.headers["retry-after"]).toBeDefined();
  });

  it("when sign-up and forgot-password are repeated, then they are limited too, each on its own counter", async () => {
    for (let i = 0; i < 2; i++) {
      await browserAgent(first.app)
        .post("/api/auth/sign-up")
        .send({ name: "Flood", email: uniqueEmail("flood"), password: TEST_PASSWORD })
        .expect(202);
    }
    await browserAgent(second.app)
      .post("/api/auth/sign-up")
      .send({ name: "Flood", email: uniqueEmail("flood"), password: TEST_PASSWORD })
      .expect(429);
    for (let i = 0; i < 2; i++)
      await browserAgent(first.app)
        .post("/api/auth/forgot-password")
        .send({ email: uniqueEmail() })
        .expect(202);
    const limited = await browserAgent(first.app)
      .post("/api/auth/forgot-password")
      .send({ email: uniqueEmail() })
      .expect(429);
    expect(Number(limited.headers["retry-after"])).toBeGreaterThan(60);
  });

  it("when another key prefix is used (another test app), then its counters start from zero", async () => {
    const fresh = buildTestApp({ rateLimits: tight(`rl-${randomUUID()}:`) });
    afterAll(fresh.close);
    await browserAgent(fresh.app)
      .post("/api/auth/sign-in")
      .send({ email: uniqueEmail(), password: TEST_PASSWORD })
      .expect(401);
  });
});

describe("what sign-in counts, and under which address", () => {
  // Documentation addresses (RFC 5737), only ever written into a header: no traffic goes to them.
  const forwardedFor = (i: number) => `198.51.100.${i + 1}`;
  const signInFrom = (app: Parameters<typeof browserAgent>[0], address: string | null, body: object) => {
    const call = browserAgent(app).post("/api/auth/sign-in");
    return (address ? call.set("X-Forwarded-For", address) : call).send(body);
  };

  it("when an office signs in correctly more often than the limit, then no correct sign-in is refused and failures still count", async () => {
    const office = buildTestApp({ rateLimits: tight(`rl-${randomUUID()}:`) });
    afterAll(office.close);
    const account = await signUp(office.app);
    const right = { email: account.email, password: TEST_PASSWORD };
    for (let i = 0; i < 6; i++) await signInFrom(office.app, null, right).expect(200);
    const wrong = { email: account.email, password: "not the password" };
    for (let i = 0; i < 3; i++) await signInFrom(office.app, null, wrong).expect(401);
    await signInFrom(office.app, null, wrong).expect(429);
  });

  it("when one account's password is guessed from many addresses, then the per-account limit stops it while other accounts are unaffected", async () => {
    // TRUST_PROXY names this machine, so each forwarded address counts as its own client.
    const behindProxy = buildTestApp({
      env: { TRUST_PROXY: "127.0.0.1,::1" },
      rateLimits: {
        prefix: `rl-${randomUUID()}:`,
        signIn: { limit: 3, windowMs: 60_000 },
        signInPerAccount: { limit: 4, windowMs: 60_000 },
      },
    });
    afterAll(behindProxy.close);
    const victim = await signUp(behindProxy.app);
    for (let i = 0; i < 4; i++) {
      // Letter case and spaces do not make another account.
      const email = i % 2 ? victim.email.toUpperCase() : ` ${victim.email} `;
      await signInFrom(behindProxy.app, forwardedFor(i), { email, password: `guess ${i} wrong` }).expect(401);
    }
    const stopped = await signInFrom(behindProxy.app, forwardedFor(9), {
      email: victim.email,
      password: "guess nine wrong",
    }).expect(429);
    expect(stopped.headers["retry-after"]).toBeDefined();
    // The address is under its own limit, and another account from it is still answered.
    await signInFrom(behindProxy.app, forwardedFor(9), {
      email: uniqueEmail("other"),
      password: "guess wrong",
    }).expect(401);
  });

  it("when no proxy is configured, then X-Forwarded-For is ignored and a client cannot dodge the limit by changing it", async () => {
    const direct = buildTestApp({ rateLimits: tight(`rl-${randomUUID()}:`) });
    afterAll(direct.close);
    for (let i = 0; i < 3; i++) {
      await signInFrom(direct.app, forwardedFor(i), {
        email: uniqueEmail("dodge"),
        password: "guessing wrong",
      }).expect(401);
    }
    await signInFrom(direct.app, forwardedFor(7), {
      email: uniqueEmail("dodge"),
      password: "guessing wrong",
    }).expect(429);
  });
});
