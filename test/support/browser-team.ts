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
  const send = async (method: "post" | "put", context: BrowserContext, url: string, data?: unknown) => {
    const response = await context.request[method](`${origin}/api${url}`, { data, headers });
    if (response.status() >= 300) throw new Error(`${url}: ${response.status()} ${await response.text()}`);
    return response.json();
  };
  const post = (context: BrowserContext, url: string, data?: unknown) => send("post", context, url, data);
  const workspaceId = (await post(owner, "/workspaces", { name: "Quillon Engineering" })).workspace.id;
  const ws = `/workspaces/${workspaceId}`;
  const projectId = (
    await post(owner, `${ws}/projects`, {
      name: "CT-7 shell",
      requirements: [
        { criterion: "von-mises", requiredFactor: 1.5 },
        { criterion: "tresca", requiredFactor: 1.5 },
      ],
      defaultMaterial: { kind: "published", id: "sa516-70" },
    })
  ).project.id;
  const locationId = (await post(owner, `${ws}/projects/${projectId}/locations`, { name: "mid-shell" }))
    .location.id;
  const cases = `${ws}/projects/${projectId}/load-cases`;
  const stress = (unit: string, xx: number, yy: number) => ({
    unit,
    components: { xx, yy, zz: 0, xy: 0, yz: 0, zx: 0 },
  });
  // A state typed in ksi: the project page shows it in ksi.
  await post(owner, cases, {
    name: "Operating",
    category: "design",
    states: [{ locationId, stress: stress("ksi", 10.9, 5.4) }],
  });
  // Uniaxial 165 MPa against SA-516 Grade 70's Sy = 260 MPa gives n = 1.58, within 10 % above
  // the required 1.5 (the product's "close" band): a close verdict, so its badge is on the pages.
  // Saved six times, so the state has a history and the activity list is longer than a screen.
  let hydro = (
    await post(owner, cases, {
      name: "Hydrostatic test",
      category: "test",
      states: [{ locationId, stress: stress("MPa", 160, 0) }],
    })
  ).loadCase;
  for (const xx of [161, 162, 163, 164, 165]) {
    hydro = (
      await send("put", owner, `${cases}/${hydro.id}/states/${locationId}`, {
        version: hydro.version,
        stress: stress("MPa", xx, 0),
      })
    ).loadCase;
  }
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
