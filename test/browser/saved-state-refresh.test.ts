import path from "node:path";
import { describe, expect, it } from "vitest";
import { screenshotDir } from "../support/browser";
import { signedInBrowser } from "../support/signed-in-browser";

// The pages share one query cache whose data counts as fresh for 10 s; a save must invalidate what
// it changed, or the project page shows the old state for up to that long.
describe("a state saved in the bench, back on the project page in Chromium", () => {
  const world = signedInBrowser("Teo Valdric");

  it("when a state is saved in the bench and the project is opened from the bench's link, then its load-case table shows the saved value within 2 s", async () => {
    const { server, editor } = world;
    const api = (p: string) => `${server.url}/api${p}`;
    const send = async (method: "post" | "put", p: string, data: unknown) => {
      const response = await editor.request[method](api(p), { data, headers: { Origin: server.url } });
      expect(response.ok(), await response.text()).toBe(true);
      return response.json();
    };
    const workspaceId = (await send("post", "/workspaces", { name: "Refresh checks" })).workspace.id;
    const project = `/workspaces/${workspaceId}/projects`;
    const projectId = (await send("post", project, { name: "Vessel V-7" })).project.id;
    const locationId = (await send("post", `${project}/${projectId}/locations`, { name: "shell" })).location
      .id;
    const created = await send("post", `${project}/${projectId}/load-cases`, {
      name: "Design",
      category: "",
    });
    await send("put", `${project}/${projectId}/load-cases/${created.loadCase.id}/states/${locationId}`, {
      version: created.loadCase.version,
      stress: { unit: "MPa", components: { xx: 100, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 } },
    });

    const page = await editor.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}${project}/${projectId}`, { waitUntil: "networkidle" });
    const table = page.locator(`section[aria-labelledby="load-cases-title"]`);
    expect(await table.innerText()).toMatch(/σxx\s*100\.0/);

    // Client-side navigation from here on: the same page, the same query cache.
    await page.getByRole("link", { name: "Open in bench" }).click();
    await page.getByText("Saved state: Design at shell").waitFor();
    const field = page.getByLabel("σxx", { exact: true });
    await field.fill("150");
    await field.press("Enter");
    await page.getByRole("button", { name: "Save to project" }).click();
    await page.getByText(/Saved as revision 2/).waitFor();
    await page.getByRole("region", { name: "Saved state" }).getByRole("link", { name: "Vessel V-7" }).click();
    await page.waitForURL(new RegExp(`/projects/${projectId}$`));
    await expect.poll(() => table.innerText(), { timeout: 2_000 }).toMatch(/σxx\s*150\.0/);
    expect(await table.innerText()).toMatch(/saved 2 times \(revision 2\)/);
    await page.screenshot({ path: path.join(screenshotDir, "saved-state-refresh.png"), fullPage: true });
  });
});
