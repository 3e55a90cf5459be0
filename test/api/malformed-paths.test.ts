import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { buildTestApp } from "../support/app";

// Item 4 of issue 10: a path whose percent-encoding does not decode (%FF is not UTF-8 on its
// own) used to reach the error handler as a URIError and come back as a 500.
const { app, close } = buildTestApp();
afterAll(close);

describe("paths with malformed percent-encoding", () => {
  for (const path of ["/api/share-links/%FF", "/%FF", "/assets/%FF", "/api/workspaces/%E0%A4%A"]) {
    it(`when ${path} is requested, then 400 bad_request says the path does not decode`, async () => {
      const response = await request(app).get(path);
      expect(response.status, JSON.stringify(response.body)).toBe(400);
      expect(response.body.error.id).toBe("bad_request");
      expect(response.body.error.message).toMatch(/percent-encod/i);
    });
  }

  it("when a well-formed encoded path is requested, then it is served as before (the app's page)", async () => {
    const response = await request(app).get("/projects/%C3%A9");
    expect(response.status).toBe(200);
    expect(response.headers["content-type"]).toMatch(/text\/html/);
  });
});
