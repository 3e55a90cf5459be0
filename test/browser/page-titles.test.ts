import { describe, expect, it } from "vitest";
import { signedInBrowser } from "../support/signed-in-browser";

// Tabs and the browser's history list pages by their title: each page's title names it and what it
// belongs to (common practice, no source).
describe("page titles in Chromium", () => {
  const world = signedInBrowser("Teo Valdric");

  it("when a project, its comparison and the bench are opened, then each tab's title names the page and its project", async () => {
    const { server, editor } = world;
    const send = async (p: string, data: unknown) => {
      const response = await editor.request.post(`${server.url}/api${p}`, {
        data,
        headers: { Origin: server.url },
      });
      expect(response.ok(), await response.text()).toBe(true);
      return response.json();
    };
    const workspaceId = (await send("/workspaces", { name: "Title checks" })).workspace.id;
    const projectId = (await send(`/workspaces/${workspaceId}/projects`, { name: "Drum D-2" })).project.id;

    const page = await editor.newPage();
    const project = `${server.url}/workspaces/${workspaceId}/projects/${projectId}`;
    await page.goto(project);
    await expect.poll(() => page.title(), { timeout: 10_000 }).toBe("Drum D-2 · Title checks · Sigmacube");
    await page.getByRole("link", { name: "Comparison", exact: true }).click();
    await expect.poll(() => page.title(), { timeout: 10_000 }).toBe("Comparison · Drum D-2 · Sigmacube");
    await page.goto(`${project}/report`);
    await expect
      .poll(() => page.title(), { timeout: 10_000 })
      .toBe("Draft calculation report · Drum D-2 · Sigmacube");
    // A page under a section of the project (the trail ends in "Comparison") still names the project.
    await page.goto(`${project}/linearization`);
    await expect
      .poll(() => page.title(), { timeout: 10_000 })
      .toBe("Stress linearization · Drum D-2 · Sigmacube");
    await page.goto(`${server.url}/bench`);
    await expect.poll(() => page.title(), { timeout: 10_000 }).toMatch(/ · Sigmacube$/);
    expect(await page.title()).toBe(`${(await page.locator("main h1").innerText()).trim()} · Sigmacube`);
  });
});
