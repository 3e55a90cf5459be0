import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { buildTestApp } from "../support/app";
import { browserAgent, TEST_PASSWORD, uniqueEmail } from "../support/accounts";

const tight = (prefix: string) => ({
  prefix,
  signIn: { limit: 3, windowMs: 60_000 },
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
        .expect(201);
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
