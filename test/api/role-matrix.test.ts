import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildRouteTable } from "../../api/openapi/route-table";
import { routeKey, type Access } from "../../api/openapi/registry";
import { roleAtLeast, type Role } from "../../core/contract/workspaces";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import { TEST_PASSWORD, uniqueEmail } from "../support/accounts";
import {
  ACTORS,
  invitationForActor,
  resetTokenForBystander,
  roleFixtureFactory,
  verificationTokenForBystander,
  someMailId,
  type Actor,
  type RoleFixture,
  type RoleFixtureFactory,
} from "../support/role-fixture";
import { projectAreaRows } from "../support/project-area-matrix";
import { recordRows } from "../support/records-matrix";
import { pointTableRows } from "../support/point-table-matrix";

/**
 * The role matrix: every API route × every kind of caller → the expected status.
 *
 * One row per route, keyed as the OpenAPI document names it. `who` says who may call it;
 * the expected status for each caller follows from it (anonymous 401 unless public;
 * non-member 404 on workspace routes; a role below the minimum 403; everyone allowed gets
 * `ok`), with `except` for the deliberate exceptions. To add a route: add its row here,
 * and if it needs something to act on, add it to test/support/role-fixture.ts.
 */
type Row = {
  who: "public" | "signed-in" | Role;
  ok: number;
  except?: Partial<Record<Actor, number>>;
  request: (f: RoleFixture) => Promise<Req> | Req;
};
type Req = { path: string; body?: Record<string, unknown> | string; contentType?: string };

const ws = (f: RoleFixture, rest = "") => `/api/workspaces/${f.workspaceId}${rest}`;

const table: Record<string, Row> = {
  "GET /api/health": { who: "public", ok: 200, request: () => ({ path: "/api/health" }) },
  "GET /api/openapi.json": { who: "public", ok: 200, request: () => ({ path: "/api/openapi.json" }) },

  "POST /api/auth/sign-up": {
    who: "public",
    ok: 202,
    request: () => ({
      path: "/api/auth/sign-up",
      body: { name: "New", email: uniqueEmail("matrix-new"), password: TEST_PASSWORD },
    }),
  },
  "POST /api/auth/sign-in": {
    who: "public",
    ok: 200,
    request: (f) => ({
      path: "/api/auth/sign-in",
      body: { email: f.bystander.email, password: f.bystander.password },
    }),
  },
  "POST /api/auth/sign-out": { who: "public", ok: 204, request: () => ({ path: "/api/auth/sign-out" }) },
  "POST /api/auth/sign-out-everywhere": {
    who: "signed-in",
    ok: 204,
    request: () => ({ path: "/api/auth/sign-out-everywhere" }),
  },
  "GET /api/auth/session": { who: "public", ok: 200, request: () => ({ path: "/api/auth/session" }) },
  "POST /api/auth/forgot-password": {
    who: "public",
    ok: 202,
    request: () => ({ path: "/api/auth/forgot-password", body: { email: uniqueEmail("matrix-forgot") } }),
  },
  "POST /api/auth/verify-email": {
    who: "public",
    ok: 200,
    request: async (f) => ({
      path: "/api/auth/verify-email",
      body: { token: await verificationTokenForBystander(f) },
    }),
  },
  "POST /api/auth/reset-password": {
    who: "public",
    ok: 200,
    request: async (f) => ({
      path: "/api/auth/reset-password",
      body: { token: await resetTokenForBystander(f), password: TEST_PASSWORD },
    }),
  },

  "GET /api/account": { who: "signed-in", ok: 200, request: () => ({ path: "/api/account" }) },
  "PATCH /api/account": {
    who: "signed-in",
    ok: 200,
    request: () => ({ path: "/api/account", body: { name: "Renamed" } }),
  },
  "POST /api/account/password": {
    who: "signed-in",
    ok: 204,
    request: () => ({
      path: "/api/account/password",
      body: { currentPassword: TEST_PASSWORD, newPassword: "another long password" },
    }),
  },

  "GET /api/workspaces": { who: "signed-in", ok: 200, request: () => ({ path: "/api/workspaces" }) },
  "POST /api/workspaces": {
    who: "signed-in",
    ok: 201,
    request: () => ({ path: "/api/workspaces", body: { name: "Made in matrix" } }),
  },
  "GET /api/workspaces/{workspaceId}": { who: "viewer", ok: 200, request: (f) => ({ path: ws(f) }) },
  "PATCH /api/workspaces/{workspaceId}": {
    who: "owner",
    ok: 200,
    request: (f) => ({ path: ws(f), body: { name: "Renamed" } }),
  },
  "DELETE /api/workspaces/{workspaceId}": { who: "owner", ok: 204, request: (f) => ({ path: ws(f) }) },

  "GET /api/workspaces/{workspaceId}/members": {
    who: "viewer",
    ok: 200,
    request: (f) => ({ path: ws(f, "/members") }),
  },
  "PATCH /api/workspaces/{workspaceId}/members/{memberId}": {
    who: "owner",
    ok: 200,
    request: (f) => ({ path: ws(f, `/members/${f.spareMemberId}`), body: { role: "editor" } }),
  },
  "DELETE /api/workspaces/{workspaceId}/members/{memberId}": {
    who: "owner",
    ok: 204,
    request: (f) => ({ path: ws(f, `/members/${f.spareMemberId}`) }),
  },
  "POST /api/workspaces/{workspaceId}/leave": {
    who: "viewer",
    ok: 204,
    // The fixture's owner is its only owner: a workspace always keeps one.
    except: { owner: 409 },
    request: (f) => ({ path: ws(f, "/leave") }),
  },

  "GET /api/workspaces/{workspaceId}/invitations": {
    who: "owner",
    ok: 200,
    request: (f) => ({ path: ws(f, "/invitations") }),
  },
  "POST /api/workspaces/{workspaceId}/invitations": {
    who: "owner",
    ok: 201,
    request: (f) => ({
      path: ws(f, "/invitations"),
      body: { email: uniqueEmail("matrix-invite"), role: "viewer" },
    }),
  },
  "POST /api/workspaces/{workspaceId}/invitations/{invitationId}/resend": {
    who: "owner",
    ok: 200,
    request: (f) => ({ path: ws(f, `/invitations/${f.invitationId}/resend`) }),
  },
  "DELETE /api/workspaces/{workspaceId}/invitations/{invitationId}": {
    who: "owner",
    ok: 204,
    request: (f) => ({ path: ws(f, `/invitations/${f.invitationId}`) }),
  },
  "GET /api/invitations/{token}": {
    who: "public",
    ok: 200,
    request: (f) => ({ path: `/api/invitations/${f.invitationToken}` }),
  },
  "POST /api/invitations/{token}/accept": {
    who: "signed-in",
    ok: 200,
    request: async (f) => ({ path: `/api/invitations/${await invitationForActor(f)}/accept` }),
  },

  "GET /api/workspaces/{workspaceId}/share-links": {
    who: "editor",
    ok: 200,
    request: (f) => ({ path: ws(f, "/share-links") }),
  },
  "POST /api/workspaces/{workspaceId}/share-links": {
    who: "editor",
    ok: 201,
    request: (f) => ({ path: ws(f, "/share-links"), body: { role: "reviewer", expiresInDays: 3 } }),
  },
  "DELETE /api/workspaces/{workspaceId}/share-links/{linkId}": {
    who: "editor",
    ok: 204,
    request: (f) => ({ path: ws(f, `/share-links/${f.shareLinkId}`) }),
  },
  "GET /api/share-links/{token}": {
    who: "public",
    ok: 200,
    request: (f) => ({ path: `/api/share-links/${f.shareLinkToken}` }),
  },
  "POST /api/share-links/{token}/join": {
    who: "signed-in",
    ok: 200,
    request: (f) => ({ path: `/api/share-links/${f.shareLinkToken}/join` }),
  },

  "GET /api/dev/mailbox": { who: "public", ok: 200, request: () => ({ path: "/api/dev/mailbox" }) },
  "GET /api/dev/mailbox/{messageId}": {
    who: "public",
    ok: 200,
    request: async () => ({ path: `/api/dev/mailbox/${await someMailId()}` }),
  },

  ...projectAreaRows,
  ...recordRows,
  ...pointTableRows,
};

/** What `who` means for one caller. */
function expectedStatus(row: Row, actor: Actor): number {
  if (row.except?.[actor] !== undefined) return row.except[actor]!;
  if (row.who === "public") return row.ok;
  if (actor === "anonymous") return 401;
  if (row.who === "signed-in") return row.ok;
  if (actor === "nonMember") return 404;
  return roleAtLeast(actor, row.who) ? row.ok : 403;
}

function accessAsWho(access: Access): Row["who"] {
  return access.kind === "member" ? access.role : access.kind;
}

const { app, context, close } = buildTestApp();
afterAll(close);
let fixture: RoleFixtureFactory;
beforeAll(async () => {
  fixture = await roleFixtureFactory(context);
});

describe("the role matrix covers every route", () => {
  it("when the OpenAPI document is read, then every route it lists has a row in the table, and every row a route", async () => {
    const document = (await request(app).get("/api/openapi.json").expect(200)).body as {
      paths: Record<string, Record<string, unknown>>;
    };
    const documented = Object.entries(document.paths).flatMap(([path, operations]) =>
      Object.keys(operations).map((method) => `${method.toUpperCase()} ${path}`),
    );
    expect(documented.filter((key) => !(key in table))).toEqual([]);
    expect(Object.keys(table).filter((key) => !documented.includes(key))).toEqual([]);
  });

  it("when the registry's access rules are compared with the table, then they agree", () => {
    const registered = Object.fromEntries(
      buildRouteTable(context).map((r) => [routeKey(r), accessAsWho(r.access)]),
    );
    expect(registered).toEqual(Object.fromEntries(Object.entries(table).map(([key, row]) => [key, row.who])));
  });
});

describe.each(Object.entries(table))("%s", (key, row) => {
  const method = key.split(" ")[0].toLowerCase() as "get" | "post" | "patch" | "put" | "delete";
  it.each(ACTORS.map((actor) => [actor, expectedStatus(row, actor)] as const))(
    "when %s calls it, then the status is %i",
    async (actor, expected) => {
      const f = await fixture(actor);
      const { path, body, contentType } = await row.request(f);
      let call = request(app)[method](path).set("Origin", TEST_ORIGIN);
      if (contentType) call = call.set("Content-Type", contentType);
      if (f.cookie) call = call.set("Cookie", f.cookie);
      const response = body ? await call.send(body) : await call;
      expect(response.status, `${key} as ${actor}: ${JSON.stringify(response.body)}`).toBe(expected);
    },
  );
});
