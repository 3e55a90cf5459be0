import type { Browser, BrowserContext } from "playwright-core";
import type { Role } from "../../core/contract/workspaces";
import { signUpInContext } from "./browser";

/** One browser context per role in one workspace, and a project with one typed state to look at. */
export type BrowserTeam = {
  contexts: Record<Role, BrowserContext>;
  workspaceId: string;
  projectId: string;
  /** `/workspaces/{id}` */
  workspacePath: string;
  /** `/workspaces/{id}/projects/{id}` */
  projectPath: string;
};

/**
 * Signs an owner up, who makes a workspace and a project (one location, one load case whose
 * state is typed in ksi), then brings an editor, a reviewer and a viewer in through share
 * links, as people join in the product. Every context holds its person's session.
 */
export async function browserTeam(
  browser: Browser,
  origin: string,
  viewport = { width: 1280, height: 800 },
): Promise<BrowserTeam> {
  const headers = { Origin: origin };
  const owner = await browser.newContext({ viewport });
  await signUpInContext(owner, origin, "Ona Ferreby");
  const post = async (context: BrowserContext, url: string, data?: unknown) => {
    const response = await context.request.post(`${origin}/api${url}`, { data, headers });
    if (response.status() >= 300) throw new Error(`${url}: ${response.status()} ${await response.text()}`);
    return response.json();
  };
  const workspaceId = (await post(owner, "/workspaces", { name: "Quillon Engineering" })).workspace.id;
  const ws = `/workspaces/${workspaceId}`;
  const projectId = (await post(owner, `${ws}/projects`, { name: "CT-7 shell" })).project.id;
  const locationId = (await post(owner, `${ws}/projects/${projectId}/locations`, { name: "mid-shell" }))
    .location.id;
  await post(owner, `${ws}/projects/${projectId}/load-cases`, {
    name: "Operating",
    category: "design",
    // A state typed in ksi: the project page shows it in ksi.
    states: [
      { locationId, stress: { unit: "ksi", components: { xx: 10.9, yy: 5.4, zz: 0, xy: 0, yz: 0, zx: 0 } } },
    ],
  });
  const contexts = { owner } as Record<Role, BrowserContext>;
  const names: Record<Exclude<Role, "owner">, string> = {
    editor: "Eda Marlow",
    reviewer: "Rui Tanager",
    viewer: "Vesna Holt",
  };
  for (const role of ["editor", "reviewer", "viewer"] as const) {
    const link = (await post(owner, `${ws}/share-links`, { role, expiresInDays: 1 })).url as string;
    const context = await browser.newContext({ viewport });
    await signUpInContext(context, origin, names[role]);
    await post(context, `/share-links/${link.split("/").pop()}/join`);
    contexts[role] = context;
  }
  return {
    contexts,
    workspaceId,
    projectId,
    workspacePath: ws,
    projectPath: `${ws}/projects/${projectId}`,
  };
}
