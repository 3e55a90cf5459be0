import { randomUUID } from "node:crypto";
import type { Express } from "express";
import request from "supertest";
import { expect } from "vitest";
import { TEST_ORIGIN } from "./app";
import { linkIn, waitForMail } from "./mailbox";

/** A fresh address for each test: test files share one database and never truncate it. */
export function uniqueEmail(label = "person"): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.test`;
}

/** The default password test accounts get (long enough for the length rule). */
export const TEST_PASSWORD = "correct horse battery";

/** A supertest agent that keeps cookies and sends the app's own Origin, as a browser would. */
export function browserAgent(app: Express) {
  return request.agent(app).set("Origin", TEST_ORIGIN);
}

export type TestAccount = {
  agent: ReturnType<typeof browserAgent>;
  user: { id: string; name: string; email: string };
  email: string;
  password: string;
};

/**
 * Signs a new account up through the API as a person would: sign-up answers "check your
 * mail", and the confirmation link from the fake mailbox confirms the address and signs
 * in. The returned agent holds the session cookie.
 */
export async function signUp(
  app: Express,
  options: { name?: string; email?: string } = {},
): Promise<TestAccount> {
  const agent = browserAgent(app);
  const email = options.email ?? uniqueEmail();
  const name = options.name ?? `Tester ${email.slice(0, 12)}`;
  const response = await agent.post("/api/auth/sign-up").send({ name, email, password: TEST_PASSWORD });
  expect(response.status, JSON.stringify(response.body)).toBe(202);
  const token = await confirmationToken(app, email);
  const confirmed = await agent.post("/api/auth/verify-email").send({ token });
  expect(confirmed.status, JSON.stringify(confirmed.body)).toBe(200);
  return { agent, user: confirmed.body.user, email, password: TEST_PASSWORD };
}

/** The token of the newest confirmation link mailed to `email`. */
export async function confirmationToken(app: Express, email: string): Promise<string> {
  const mail = await waitForMail(app, email, { subject: /confirm your e-mail address/ });
  return linkIn(mail, "/verify-email/").pathname.split("/").pop()!;
}

/** Creates a workspace owned by `owner` and returns its id. */
export async function createWorkspace(owner: TestAccount, name = "Test workspace"): Promise<string> {
  const response = await owner.agent.post("/api/workspaces").send({ name });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body.workspace.id as string;
}

/** The session cookie's `name=value` from a response, or null. */
export function sessionCookieOf(response: { headers: Record<string, unknown> }): string | null {
  const cookies = ([] as string[]).concat((response.headers["set-cookie"] as string[] | undefined) ?? []);
  const cookie = cookies.find((c) => c.startsWith("sigmacube_session="));
  const pair = cookie?.split(";")[0] ?? null;
  return pair && pair !== "sigmacube_session=" ? pair : null;
}
