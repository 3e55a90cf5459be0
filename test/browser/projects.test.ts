import { mkdir } from "node:fs/promises";
import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { uniqueEmail } from "../support/accounts";
import { confirmInContext, launchChromium, screenshotDir } from "../support/browser";
import { startTestServer } from "../support/server";

const shot = (page: Page, name: string) =>
  page.screenshot({ path: path.join(screenshotDir, `projects-${name}.png`), fullPage: true });

/** Thin-wall membrane stresses (σx = pr/2t axial, σθ = pr/t hoop), r = 600 mm, t = 8 mm, plus an invented junction bending 133·p on σx. */
const states = (p: number) => {
  const hoop = (p * 600) / 8;
  return { shell: { xx: hoop / 2, yy: hoop }, junction: { xx: hoop / 2 + 133 * p, yy: hoop } };
};

describe("projects in Chromium: from an empty project to the governing case, and back from the bench", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let editor: BrowserContext;
  let viewer: BrowserContext;
  let workspaceId = "";
  let projectUrl = "";

  /** Signs up through the API inside a browser context, so the context holds the session cookie. */
  async function signedIn(name: string): Promise<BrowserContext> {
    const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
    const email = uniqueEmail(name.split(" ")[0].toLowerCase());
    const response = await context.request.post(`${server.url}/api/auth/sign-up`, {
      data: { name, email, password: "carbonation tank seven" },
      headers: { Origin: server.url },
    });
    expect(response.status()).toBe(202);
    await confirmInContext(context, server.url, email);
    return context;
  }

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    await mkdir(screenshotDir, { recursive: true });
    editor = await signedIn("Teo Valdric");
    viewer = await signedIn("Sam Pellworth");
    const created = await editor.request.post(`${server.url}/api/workspaces`, {
      data: { name: "Quillon Engineering" },
      headers: { Origin: server.url },
    });
    workspaceId = (await created.json()).workspace.id;
    const link = await editor.request.post(`${server.url}/api/workspaces/${workspaceId}/share-links`, {
      data: { role: "viewer", expiresInDays: 1 },
      headers: { Origin: server.url },
    });
    const url = (await link.json()).url as string;
    const joined = await viewer.request.post(`${server.url}/api/share-links/${url.split("/").pop()}/join`, {
      headers: { Origin: server.url },
    });
    expect(joined.status()).toBe(200);
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when an editor creates a project with two locations and three load cases, then the comparison names the governing case", async () => {
    const page = await editor.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects`, { waitUntil: "networkidle" });
    await page.getByLabel("New project name").fill("CT-7 shell and heads");
    await page.getByRole("button", { name: "New project" }).click();
    await page.getByRole("link", { name: "CT-7 shell and heads" }).click();
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
    projectUrl = page.url();

    await page.getByRole("button", { name: "Change checks" }).click();
    await page.getByLabel("Default material").selectOption("published:sa516-70");
    await page.getByRole("button", { name: "Save checks" }).click();
    await page.getByText("Default material: SA-516 Grade 70 (ASME SA-516)").waitFor();

    for (const name of ["mid-shell", "head-to-shell junction"]) {
      await page.getByLabel("New location name").fill(name);
      await page.getByRole("button", { name: "Add location" }).click();
      await page.getByRole("columnheader", { name }).waitFor();
    }
    const cases: [string, string, number][] = [
      ["Operating", "operating", 0.75],
      ["Design", "design", 0.9],
      ["Hydrostatic test", "test", 1.17],
    ];
    for (const [name, category, p] of cases) {
      await page.getByLabel("New load case name").fill(name);
      await page.getByLabel("Category").fill(category);
      await page.getByRole("button", { name: "Add load case" }).click();
      await page.getByRole("rowheader", { name: new RegExp(`^${name}`) }).waitFor();
      const s = states(p);
      for (const [location, values] of [
        ["mid-shell", s.shell],
        ["head-to-shell junction", s.junction],
      ] as const) {
        await page.getByRole("button", { name: `Enter ${name} at ${location}` }).click();
        await page.getByLabel("σxx (MPa)").fill(String(values.xx));
        await page.getByLabel("σyy (MPa)").fill(String(values.yy));
        await page.getByLabel("Source").selectOption("calculator");
        await page.getByRole("button", { name: "Save state" }).click();
        await page.getByRole("button", { name: `Edit ${name} at ${location}` }).waitFor();
      }
    }
    await page.getByRole("button", { name: "Rename load case Operating" }).click();
    const rename = page.getByRole("form", { name: "Rename load case Operating" });
    await rename.getByLabel("name").fill("Normal operating");
    await rename.getByRole("button", { name: "Save" }).click();
    await page.getByRole("rowheader", { name: /^Normal operating/ }).waitFor();
    await shot(page, "project-page");

    await page.getByRole("link", { name: "Comparison" }).click();
    await page.waitForURL(/\/comparison$/);
    // Tresca at the junction in the test: n = 260 / (43.875 + 155.61) = 1.30 (hand arithmetic).
    await expect
      .poll(() => page.getByTestId("governing-summary").innerText())
      .toBe(
        "governs: Hydrostatic test at head-to-shell junction, Tresca, SF 1.30 against 1.5 required (the project default)",
      );
    expect(await page.locator('tr[data-governs="overall"]').count()).toBeGreaterThan(0);
    await page.getByText("fails", { exact: true }).first().waitFor();
    // Like every page inside a workspace, the comparison offers a link back to exactly itself.
    expect(await page.getByRole("button", { name: "Copy link to this page" }).getAttribute("data-link")).toBe(
      page.url(),
    );
    await shot(page, "comparison");

    await page.getByLabel("Verdict").selectOption("fail");
    // The filter goes through the address (so a copied link keeps it): the table follows a moment later.
    await expect.poll(() => page.locator("tbody tr").count()).toBe(1);
    await page.getByLabel("Verdict").selectOption("");
    // Numbers sort largest first on the first click.
    await page.getByRole("button", { name: /σvm/ }).click();
    await page.locator('th[aria-sort="descending"]').waitFor();
    expect(await page.locator("tbody tr").first().innerText()).toMatch(/Hydrostatic test/);
  });

  it("when the governing row is opened in the bench, changed and saved, then the comparison updates; a concurrent save shows the conflict", async () => {
    const page = await editor.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${projectUrl}/comparison`, { waitUntil: "networkidle" });
    await page
      .getByRole("link", { name: /^Open in bench\W*Hydrostatic test at head-to-shell junction$/ })
      .click();
    await page.waitForURL(/\/bench\?source=/);
    await page.getByText("Saved state: Hydrostatic test at head-to-shell junction").waitFor();
    expect(await page.getByLabel("σxx", { exact: true }).inputValue()).toBe("199.485");
    expect(await page.getByRole("button", { name: "Save to project" }).isDisabled()).toBe(true);

    const field = page.getByLabel("σxx", { exact: true });
    await field.click();
    await field.fill("150");
    await field.press("Enter");
    await page.getByText("edited here — not saved").waitFor();
    // The address keeps where the state came from while the bench rewrites its own parameters.
    await expect
      .poll(() => new URL(page.url()).searchParams.get("source"))
      .toMatch(/^[0-9a-f-]{36}(\/[0-9a-f-]{36}){3}$/);
    await shot(page, "bench-edited");
    await page.getByRole("button", { name: "Save to project" }).click();
    await page.getByText(/Saved as revision 2/).waitFor();

    await page.getByRole("link", { name: "Comparison", exact: true }).click();
    await page.waitForURL(/\/comparison$/);
    // With 150 MPa at the junction in the test, the design case governs: Tresca n = 260 / (33.75 + 119.7) = 1.69.
    await expect
      .poll(() => page.getByTestId("governing-summary").innerText())
      .toBe(
        "governs: Design at head-to-shell junction, Tresca, SF 1.69 against 1.5 required (the project default)",
      );
    // The results caution is said once on the page (beside the results, not again in the footer).
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    await shot(page, "comparison-after-bench");

    // Meanwhile another editor saves the same case: this copy's save is refused with 409 and the choice is offered.
    await page.goBack();
    await page.getByText("Saved state: Hydrostatic test at head-to-shell junction").waitFor();
    await expect.poll(() => page.getByLabel("σxx", { exact: true }).inputValue()).toBe("150");
    const ids = new URL(page.url()).searchParams.get("source")!.split("/");
    const casePath = `${server.url}/api/workspaces/${ids[0]}/projects/${ids[1]}/load-cases/${ids[2]}`;
    const current = await (await editor.request.get(casePath)).json();
    const other = await editor.request.put(`${casePath}/states/${ids[3]}`, {
      data: {
        version: current.loadCase.version,
        stress: { unit: "MPa", components: { xx: 140, yy: 87.75, zz: 0, xy: 0, yz: 0, zx: 0 } },
      },
      headers: { Origin: server.url },
    });
    expect(other.status()).toBe(200);
    await field.click();
    await field.fill("160");
    await field.press("Enter");
    await page.getByRole("button", { name: "Save to project" }).click();
    await page.getByText(/Someone saved this load case while you were editing/).waitFor();
    await shot(page, "bench-conflict");
    await page.getByRole("button", { name: "Reload their values" }).click();
    expect(await field.inputValue()).toBe("140");
    await field.fill("160");
    await field.press("Enter");
    await page.getByRole("button", { name: "Save to project" }).click();
    await page.getByText(/Saved as revision 4/).waitFor();
    const stored = await (await editor.request.get(casePath)).json();
    const state = stored.loadCase.states.find((x: { locationId: string }) => x.locationId === ids[3]);
    expect(state.componentsPa.xx).toBe(160e6);
  });

  it("when a viewer opens the project, then there are no edit controls and the API refuses their writes", async () => {
    const page = await viewer.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(projectUrl, { waitUntil: "networkidle" });
    await page.getByRole("heading", { name: "CT-7 shell and heads" }).waitFor();
    await page.getByText("you can read everything but not change inputs").waitFor();
    for (const name of ["Add location", "Add load case", "Change checks", "Add to library", "New project"]) {
      expect(await page.getByRole("button", { name }).count(), name).toBe(0);
    }
    expect(await page.getByRole("button", { name: /^Edit / }).count()).toBe(0);
    expect(await page.getByRole("link", { name: "Open in bench" }).count()).toBe(6);
    // The checker's record: every revision of the state the bench saved, newest first.
    await page
      .getByRole("button", { name: "Revisions of Hydrostatic test at head-to-shell junction" })
      .click();
    const revisions = page.getByRole("table", {
      name: "Revisions of Hydrostatic test at head-to-shell junction",
    });
    await expect.poll(() => revisions.locator("tbody tr").count()).toBe(4);
    expect(await revisions.locator("tbody tr").first().innerText()).toMatch(/Teo Valdric\s+typed/);
    await shot(page, "viewer");
    await page.getByRole("link", { name: "Open in bench" }).first().click();
    await page.getByText("View only: as viewer you can explore this state but not save it.").waitFor();
    expect(await page.getByRole("button", { name: "Save to project" }).count()).toBe(0);
    // The bench checks the state against the project's factors and says where they come from.
    await expect
      .poll(() => page.getByTestId("requirements-source").innerText())
      .toMatch(/^Required factors from CT-7 shell and heads, load case category “\w+”: the project default/);
    expect(await page.getByTestId("criterion-tresca").getByTestId("required").innerText()).toBe("1.5");
    // Opened from a saved state, the heading says so; a viewer's local edit is marked as an editor's is.
    expect(await page.locator("h1").innerText()).toMatch(/a saved stress state from a project/);
    expect(await page.locator("h1").innerText()).not.toMatch(/unsaved/);
    expect(await page.getByTestId("saved-state-status").innerText()).toBe("unchanged");
    const viewerCell = page.getByLabel("σxx", { exact: true });
    await viewerCell.click();
    await viewerCell.fill("123");
    await viewerCell.press("Enter");
    await expect
      .poll(() => page.getByTestId("saved-state-status").innerText())
      .toBe("edited here — not saved");
    await shot(page, "viewer-bench-edited");

    const projectId = projectUrl.split("/").pop();
    const refused = await viewer.request.post(
      `${server.url}/api/workspaces/${workspaceId}/projects/${projectId}/locations`,
      {
        data: { name: "sneaky" },
        headers: { Origin: server.url },
      },
    );
    expect(refused.status()).toBe(403);
  });
});
