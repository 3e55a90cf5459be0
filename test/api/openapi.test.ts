import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { buildRouteTable } from "../../api/openapi/route-table";
import { routeKey } from "../../api/openapi/registry";
import { PASSWORD_MIN_LENGTH } from "../../core/contract/auth";
import { buildTestApp, TEST_ORIGIN } from "../support/app";

const { app, context, close } = buildTestApp();
afterAll(close);

type Operation = {
  operationId: string;
  "x-required-role": string;
  parameters: { name: string; in: string; required: boolean }[];
  requestBody?: {
    content: {
      "application/json": {
        schema: { properties: Record<string, Record<string, unknown>>; required?: string[] };
      };
    };
  };
  responses: Record<string, { description: string }>;
  security?: unknown[];
};

async function documentPaths() {
  const response = await request(app).get("/api/openapi.json").expect(200);
  expect(response.body.openapi).toBe("3.1.0");
  expect(response.body.servers).toEqual([{ url: TEST_ORIGIN }]);
  return response.body.paths as Record<string, Record<string, Operation>>;
}

describe("GET /api/openapi.json", () => {
  it("when the document is built, then it lists exactly the registered routes, each with a unique operationId", async () => {
    const paths = await documentPaths();
    const documented = Object.entries(paths).flatMap(([path, ops]) =>
      Object.keys(ops).map((m) => `${m.toUpperCase()} ${path}`),
    );
    expect(documented.sort()).toEqual(buildRouteTable(context).map(routeKey).sort());
    const ids = Object.values(paths).flatMap((ops) => Object.values(ops).map((op) => op.operationId));
    expect(new Set(ids).size).toBe(ids.length);
  });

  it("when a route has a body, then its schema comes from the same zod schema (rules included)", async () => {
    const signUp = (await documentPaths())["/api/auth/sign-up"].post;
    const schema = signUp.requestBody!.content["application/json"].schema;
    expect(schema.required?.sort()).toEqual(["email", "name", "password"]);
    expect(schema.properties.password.minLength).toBe(PASSWORD_MIN_LENGTH);
    expect(signUp.responses["201"]).toBeDefined();
    expect(signUp.responses["429"].description).toMatch(/Retry-After/);
    expect(signUp.responses["403"].description).toMatch(/Origin/);
  });

  it("when a route is a workspace route, then path parameters, the required role and 401/403/404 are documented", async () => {
    const op = (await documentPaths())["/api/workspaces/{workspaceId}/members/{memberId}"].patch;
    expect(op["x-required-role"]).toBe("owner");
    expect(op.parameters.map((p) => [p.name, p.in, p.required])).toEqual([
      ["workspaceId", "path", true],
      ["memberId", "path", true],
    ]);
    expect(Object.keys(op.responses).sort()).toEqual(["200", "400", "401", "403", "404", "409"]);
    expect(op.security).toEqual([{ sessionCookie: [] }]);
  });

  it("when a share link is created, then the documented body makes role optional with viewer as its default", async () => {
    const op = (await documentPaths())["/api/workspaces/{workspaceId}/share-links"].post;
    const schema = op.requestBody!.content["application/json"].schema;
    expect(schema.properties.role).toMatchObject({
      default: "viewer",
      enum: ["viewer", "reviewer", "editor"],
    });
    expect(schema.required ?? []).not.toContain("role");
  });
});
