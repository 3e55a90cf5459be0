import { mkdir, readFile } from "node:fs/promises";
import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { SUPERPOSITION_CAUTION } from "../../core/contract/combinations";
import { uniqueEmail } from "../support/accounts";
import { confirmInContext, launchChromium, screenshotDir } from "../support/browser";
import { startTestServer } from "../support/server";

const shot = (page: Page, name: string) =>
  page.screenshot({ path: path.join(screenshotDir, `projects-editing-${name}.png`), fullPage: true });

/** Thin-wall membrane stresses in MPa (σx = pr/2t axial, σθ = pr/t hoop), r = 600 mm, t = 8 mm, plus an invented junction bending 133·p on σx. */
const states = (p: number) => {
  const hoop = (p * 600) / 8;
  return { shell: { xx: hoop / 2, yy: hoop }, junction: { xx: hoop / 2 + 133 * p, yy: hoop } };
};
const PRESSURES: [string, string, number][] = [
  ["Operating", "operating", 0.75],
  ["Design", "design", 0.9],
  ["Hydrostatic test", "test", 1.17],
];

describe("editing a project in Chromium: combinations, materials, the trash, export and import", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let owner: BrowserContext;
  let editor: BrowserContext;
  let workspaceId = "";
  let projectId = "";
  const caseIds: Record<string, string> = {};
  let combinationId = "";
  let materialId = "";
  const api = () => `${server.url}/api/workspaces/${workspaceId}`;
  const headers = () => ({ Origin: server.url });

  async function signedIn(name: string): Promise<BrowserContext> {
    const context = await browser.newContext({
      viewport: { width: 1360, height: 900 },
      acceptDownloads: true,
    });
    const email = uniqueEmail(name.split(" ")[0].toLowerCase());
    const response = await context.request.post(`${server.url}/api/auth/sign-up`, {
      data: { name, email, password: "carbonation tank seven" },
      headers: headers(),
    });
    expect(response.status()).toBe(202);
    await confirmInContext(context, server.url, email);
    return context;
  }

  /** POSTs through the owner's session and returns the JSON answer (expecting 201). */
  async function post(url: string, data: unknown) {
    const response = await owner.request.post(url, { data, headers: headers() });
    expect(response.status(), `${url}: ${await response.text()}`).toBe(201);
    return response.json();
  }

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    await mkdir(screenshotDir, { recursive: true });
    owner = await signedIn("Ines Harrowby");
    editor = await signedIn("Pim Osterlund");
    workspaceId = (await post(`${server.url}/api/workspaces`, { name: "Harrowby Vessels" })).workspace.id;
    const link = await post(`${api()}/share-links`, { role: "editor", expiresInDays: 1 });
    const joined = await editor.request.post(
      `${server.url}/api/share-links/${(link.url as string).split("/").pop()}/join`,
      { headers: headers() },
    );
    expect(joined.status()).toBe(200);

    projectId = (
      await post(`${api()}/projects`, {
        name: "CT-7 shell and heads",
        defaultMaterial: { kind: "published", id: "sa516-70" },
      })
    ).project.id;
    const project = `${api()}/projects/${projectId}`;
    const shell = (await post(`${project}/locations`, { name: "mid-shell" })).location.id;
    const junction = (await post(`${project}/locations`, { name: "head-to-shell junction" })).location.id;
    const stress = (v: { xx: number; yy: number }) => ({
      unit: "MPa",
      components: { xx: v.xx, yy: v.yy, zz: 0, xy: 0, yz: 0, zx: 0 },
    });
    for (const [name, category, p] of PRESSURES) {
      const s = states(p);
      caseIds[name] = (
        await post(`${project}/load-cases`, {
          name,
          category,
          states: [
            { locationId: shell, stress: stress(s.shell), source: "calculator" },
            { locationId: junction, stress: stress(s.junction), source: "calculator" },
          ],
        })
      ).loadCase.id;
    }
    combinationId = (
      await post(`${project}/combinations`, {
        name: "Design with half test",
        terms: [
          { loadCaseId: caseIds.Design, factor: 1 },
          { loadCaseId: caseIds["Hydrostatic test"], factor: 0.5 },
        ],
      })
    ).combination.id;
    materialId = (
      await post(`${api()}/materials`, {
        name: "Plate heat 4471",
        unit: "MPa",
        yield: 250,
        reference: "cert A-1",
      })
    ).material.id;
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when an editor edits a combination, then its terms change and the bench shows the superposed state with the caution; a stale save shows the conflict and reloads", async () => {
    const page = await editor.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects/${projectId}`, {
      waitUntil: "networkidle",
    });
    await page.getByRole("button", { name: "Edit combination Design with half test" }).click();
    const form = page.getByRole("form", { name: "Edit combination Design with half test" });
    await form.getByText(SUPERPOSITION_CAUTION).waitFor();
    await form.getByLabel("Combination name").fill("Design with 0.6 test");
    await form.getByLabel("Description").fill("test pressure held during design upset");
    await form.getByLabel("Edited factor 2").fill("0.6");
    await shot(page, "combination-editing");
    await form.getByRole("button", { name: "Save combination" }).click();
    await expect.poll(() => form.count()).toBe(0);
    // The combination list shows the new description (the activity list shows it too, as the change in words).
    await page.getByText("test pressure held during design upset").first().waitFor();
    const saved = await (
      await editor.request.get(`${api()}/projects/${projectId}/combinations/${combinationId}`)
    ).json();
    expect(saved.combination.terms.map((t: { factor: number }) => t.factor)).toEqual([1, 0.6]);
    expect(saved.combination.version).toBe(2);

    // A zero factor is refused beside its term (the shared schema), and nothing is stored.
    await page.getByRole("button", { name: "Edit combination Design with 0.6 test" }).click();
    const again = page.getByRole("form", { name: "Edit combination Design with 0.6 test" });
    await again.getByLabel("Edited factor 1").fill("0");
    await again.getByRole("button", { name: "Save combination" }).click();
    await again.getByText("✗ must not be zero (leave the case out instead)").waitFor();

    // Someone else saves first: this copy's save is refused, nothing is overwritten, and reloading shows theirs.
    const other = await owner.request.patch(`${api()}/projects/${projectId}/combinations/${combinationId}`, {
      data: { version: 2, name: "Design plus test (owner)" },
      headers: headers(),
    });
    expect(other.status()).toBe(200);
    await again.getByLabel("Edited factor 1").fill("1.2");
    await again.getByRole("button", { name: "Save combination" }).click();
    await again
      .getByText(/Someone changed this combination while you were editing \(it is now version 3\)/)
      .waitFor();
    await shot(page, "combination-conflict");
    const afterConflict = await (
      await editor.request.get(`${api()}/projects/${projectId}/combinations/${combinationId}`)
    ).json();
    expect(afterConflict.combination.name).toBe("Design plus test (owner)");
    expect(afterConflict.combination.terms[0].factor).toBe(1);
    await again.getByRole("button", { name: "Reload their version" }).click();
    const reloaded = page.getByRole("form", { name: "Edit combination Design with 0.6 test" });
    expect(await reloaded.getByLabel("Combination name").inputValue()).toBe("Design plus test (owner)");
    expect(await reloaded.getByLabel("Edited factor 1").inputValue()).toBe("1");
    await reloaded.getByRole("button", { name: "Cancel" }).click();

    // The comparison's row opens in the bench view-only, with the caution. Superposition at mid-shell
    // (hand arithmetic): σxx = 1.0 × 33.75 + 0.6 × 43.875 = 60.075 MPa; σyy = 67.5 + 0.6 × 87.75 = 120.15 MPa.
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects/${projectId}/comparison`, {
      waitUntil: "networkidle",
    });
    await page.getByText(SUPERPOSITION_CAUTION).first().waitFor();
    await page
      .getByRole("link", { name: /^Open in bench\W*Design plus test \(owner\) at mid-shell$/ })
      .click();
    await page.waitForURL(/\/bench\?/);
    const note = page.getByRole("region", { name: "Combination state" });
    await note.getByText("Design plus test (owner)").waitFor();
    await note.getByText(SUPERPOSITION_CAUTION).waitFor();
    expect(Number(await page.getByLabel("σxx", { exact: true }).inputValue())).toBeCloseTo(60.075, 9);
    expect(Number(await page.getByLabel("σyy", { exact: true }).inputValue())).toBeCloseTo(120.15, 9);
    expect(await page.getByRole("button", { name: "Save to project" }).count()).toBe(0);
    await shot(page, "bench-combination");
  });

  it("when an editor edits a library material, then field errors stand beside the fields and the saved values come back in their unit; a stale save shows the conflict", async () => {
    const page = await editor.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects/${projectId}`, {
      waitUntil: "networkidle",
    });
    await page.getByRole("button", { name: "Edit material Plate heat 4471" }).click();
    const form = page.getByRole("form", { name: "Edit material Plate heat 4471" });
    expect(await form.getByLabel("Yield strength").inputValue()).toBe("250");
    await form.getByLabel("Yield strength").fill("-5");
    await form.getByLabel("Poisson's ratio ν").fill("0.6");
    await form.getByRole("button", { name: "Save material" }).click();
    await form.getByText("must be positive (a compressive strength is given as a magnitude)").waitFor();
    await form.getByText("must be at least 0 and below 0.5").waitFor();
    await shot(page, "material-errors");
    await form.getByLabel("Yield strength").fill("262");
    await form.getByLabel("Ultimate tensile strength").fill("485");
    await form.getByLabel("Elastic modulus E").fill("200000");
    await form.getByLabel("Poisson's ratio ν").fill("0.3");
    await form.getByLabel("Reference (standard, certificate)").fill("mill cert 4471-B");
    await form.getByLabel("Note").fill("verify against your certificate");
    await form.getByRole("button", { name: "Save material" }).click();
    await expect.poll(() => form.count()).toBe(0);
    await page.getByText("mill cert 4471-B").waitFor();
    const stored = (await (await editor.request.get(`${api()}/materials`)).json()).materials.find(
      (m: { id: string }) => m.id === materialId,
    );
    // MPa to Pa is exact: 1 MPa = 1e6 Pa (SI definition).
    expect(stored).toMatchObject({
      yieldPa: 262e6,
      ultimateTensionPa: 485e6,
      elasticModulusPa: 200000e6,
      poissonRatio: 0.3,
      version: 2,
    });

    await page.getByRole("button", { name: "Edit material Plate heat 4471" }).click();
    const again = page.getByRole("form", { name: "Edit material Plate heat 4471" });
    const other = await owner.request.patch(`${api()}/materials/${materialId}`, {
      data: { version: 2, yield: 270 },
      headers: headers(),
    });
    expect(other.status()).toBe(200);
    await again.getByLabel("Yield strength").fill("255");
    await again.getByRole("button", { name: "Save material" }).click();
    await again
      .getByText(/Someone changed this material while you were editing \(it is now version 3\)/)
      .waitFor();
    await shot(page, "material-conflict");
    await again.getByRole("button", { name: "Reload their values" }).click();
    expect(await again.getByLabel("Yield strength").inputValue()).toBe("270");
    const kept = (await (await editor.request.get(`${api()}/materials`)).json()).materials.find(
      (m: { id: string }) => m.id === materialId,
    );
    expect(kept.yieldPa).toBe(270e6);
  });

  it("when an owner deletes a trashed project for good, then only after typing its name; an editor has no such control and the API refuses them", async () => {
    const scratch = (await post(`${api()}/projects`, { name: "Scratch pad" })).project.id;
    expect(
      (await owner.request.delete(`${api()}/projects/${scratch}`, { headers: headers() })).status(),
    ).toBe(204);

    const editorPage = await editor.newPage();
    await editorPage.goto(`${server.url}/workspaces/${workspaceId}/projects`, { waitUntil: "networkidle" });
    await editorPage.getByRole("region", { name: /Trash/ }).getByText("Scratch pad").waitFor();
    expect(await editorPage.getByRole("button", { name: /for good/ }).count()).toBe(0);
    const refused = await editor.request.delete(`${api()}/trash/project/${scratch}`, { headers: headers() });
    expect(refused.status()).toBe(403);

    const page = await owner.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects`, { waitUntil: "networkidle" });
    await page.getByRole("button", { name: "Delete project Scratch pad for good" }).click();
    const confirm = page.getByRole("form", { name: "Delete project Scratch pad for good" });
    const go = confirm.getByRole("button", { name: "Delete for good" });
    expect(await go.isDisabled()).toBe(true);
    await confirm.getByLabel(/to confirm/).fill("Scratch");
    expect(await go.isDisabled()).toBe(true);
    await confirm.getByLabel(/to confirm/).fill("Scratch pad");
    await shot(page, "purge-confirm");
    await go.click();
    await expect
      .poll(() => page.getByRole("region", { name: /Trash/ }).getByText("Scratch pad").count())
      .toBe(0);
    const trash = await (await owner.request.get(`${api()}/trash`)).json();
    expect(trash.items.map((i: { id: string }) => i.id)).not.toContain(scratch);
  });

  it("when a project is exported and imported into the same workspace, then the copy's comparison names the same governing case; a malformed file is refused with its reasons and creates nothing", async () => {
    const page = await owner.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects/${projectId}/comparison`, {
      waitUntil: "networkidle",
    });
    // The edited combination governs at the junction (hand arithmetic, SA-516 70 yield 260 MPa):
    // σx = 153.45 + 0.6 × 199.485 = 273.141 MPa, σy = 120.15 MPa, σz = 0, so Tresca = 273.141 MPa and n = 260 / 273.141 = 0.95.
    const expected =
      "governs: Design plus test (owner) at head-to-shell junction, Tresca, SF 0.95 against 1.5 required (the project default)";
    await expect.poll(() => page.getByTestId("governing-summary").innerText()).toBe(expected);

    await page.goto(`${server.url}/workspaces/${workspaceId}/projects/${projectId}`, {
      waitUntil: "networkidle",
    });
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("link", { name: "Export JSON" }).click(),
    ]);
    const file = JSON.parse(await readFile((await download.path())!, "utf8"));
    expect(file.format).toBe("sigmacube.project");

    const before = (await (await owner.request.get(`${api()}/projects`)).json()).projects.length;
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects`, { waitUntil: "networkidle" });
    const broken = { ...file, schemaVersion: 99, project: { ...file.project, requirements: [] } };
    await page.getByLabel("Import JSON").setInputFiles({
      name: "broken.json",
      mimeType: "application/json",
      buffer: Buffer.from(JSON.stringify(broken)),
    });
    const refusal = page.getByText(/The file was not imported \(nothing was written\)/);
    await refusal.waitFor();
    expect(await refusal.innerText()).toMatch(
      /schemaVersion: .*project\.requirements: Check at least one criterion\./s,
    );
    await shot(page, "import-refused");
    expect((await (await owner.request.get(`${api()}/projects`)).json()).projects.length).toBe(before);

    await page.getByLabel("Import JSON").setInputFiles({
      name: "ct7.json",
      mimeType: "application/json",
      buffer: Buffer.from(JSON.stringify(file)),
    });
    await page.getByText(/✓ Imported “/).waitFor();
    await shot(page, "imported");
    const projects = (await (await owner.request.get(`${api()}/projects`)).json()).projects as {
      id: string;
    }[];
    expect(projects.length).toBe(before + 1);
    const copy = projects.find((p) => p.id !== projectId)!;
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects/${copy.id}/comparison`, {
      waitUntil: "networkidle",
    });
    await expect.poll(() => page.getByTestId("governing-summary").innerText()).toBe(expected);
    await shot(page, "imported-comparison");
  });
});
