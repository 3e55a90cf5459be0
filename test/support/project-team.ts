import type { Express } from "express";
import { expect } from "vitest";
import type { Role } from "../../core/contract/workspaces";
import { Membership } from "../../db/models/membership";
import { createWorkspace, signUp, type TestAccount } from "./accounts";

/** A workspace with one account per role (two editors, for concurrency), and an outsider. */
export type ProjectTeam = {
  workspaceId: string;
  owner: TestAccount;
  editor: TestAccount;
  editor2: TestAccount;
  reviewer: TestAccount;
  viewer: TestAccount;
  outsider: TestAccount;
};

/** Signs up a fresh team through the API and gives each member their role (test files share one database). */
export async function projectTeam(app: Express): Promise<ProjectTeam> {
  const owner = await signUp(app, { name: "Owner" });
  const workspaceId = await createWorkspace(owner, "Project tests");
  const member = async (role: Role, name: string) => {
    const account = await signUp(app, { name });
    await Membership.create({ workspaceId, userId: account.user.id, role, joinedVia: "seed" });
    return account;
  };
  return {
    workspaceId,
    owner,
    editor: await member("editor", "Editor One"),
    editor2: await member("editor", "Editor Two"),
    reviewer: await member("reviewer", "Reviewer"),
    viewer: await member("viewer", "Viewer"),
    outsider: await signUp(app, { name: "Outsider" }),
  };
}

/** `/api/workspaces/{id}` + rest. */
export const wsPath = (team: Pick<ProjectTeam, "workspaceId">, rest = "") =>
  `/api/workspaces/${team.workspaceId}${rest}`;

/** Creates a project, its locations and returns their ids (as an editor would). */
export async function projectWithLocations(
  team: ProjectTeam,
  body: Record<string, unknown>,
  locationNames: string[],
): Promise<{ projectId: string; locationIds: string[] }> {
  const created = await team.editor.agent.post(wsPath(team, "/projects")).send(body);
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  const projectId = created.body.project.id as string;
  const locationIds: string[] = [];
  for (const name of locationNames) {
    const response = await team.editor.agent
      .post(wsPath(team, `/projects/${projectId}/locations`))
      .send({ name });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    locationIds.push(response.body.location.id);
  }
  return { projectId, locationIds };
}

/** A state body in MPa from six components. */
export const mpa = (xx: number, yy: number, zz = 0, xy = 0, yz = 0, zx = 0) => ({
  unit: "MPa",
  components: { xx, yy, zz, xy, yz, zx },
});
