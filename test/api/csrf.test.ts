import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import { signUp, TEST_PASSWORD, uniqueEmail } from "../support/accounts";

const { app, close } = buildTestApp();
afterAll(close);

describe("the Origin check on state-changing requests", () => {
  it("when a request comes from a foreign origin, then it is a 403 and nothing changes", async () => {
    const email = uniqueEmail("csrf");
    const response = await request(app)
      .post("/api/auth/sign-up")
      .set("Origin", "https://evil.example")
      .send({ name: "Eve", email, password: TEST_PASSWORD })
      .expect(403);
    expect(response.body.error.id).toBe("forbidden");
    expect(response.body.error.message).toContain("https://evil.example");
    await request(app)
      .post("/api/auth/sign-in")
      .set("Origin", TEST_ORIGIN)
      .send({ email, password: TEST_PASSWORD })
      .expect(401);
  });

  it("when a signed-in member's cookie rides on a foreign-origin request, then the workspace is not created", async () => {
    const mira = await signUp(app);
    await mira.agent
      .post("/api/workspaces")
      .set("Origin", "http://sigmacube.test.evil.example")
      .send({ name: "Forged" })
      .expect(403);
    expect((await mira.agent.get("/api/workspaces").expect(200)).body.workspaces).toEqual([]);
  });

  it("when a state-changing request has no Origin at all, then it is a 403", async () => {
    const response = await request(app)
      .post("/api/auth/forgot-password")
      .send({ email: uniqueEmail() })
      .expect(403);
    expect(response.body.error.message).toMatch(/no Origin header/);
  });

  it("when a read comes without Origin, then it is served", async () => {
    await request(app).get("/api/auth/session").expect(200);
  });

  it("when the origin is the app's own, then the request goes through", async () => {
    await request(app)
      .post("/api/auth/forgot-password")
      .set("Origin", TEST_ORIGIN)
      .send({ email: uniqueEmail() })
      .expect(202);
  });
});
