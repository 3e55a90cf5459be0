import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { Page } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { screenshotDir } from "../support/browser";
import { browserTeam, type BrowserTeam } from "../support/browser-team";
import { serverHasReviewRoutes } from "../support/records-probe";
import { signedInBrowser } from "../support/signed-in-browser";

// Issue 14's record scope, in the browser against the real API: an editor submits a record for
// a chosen set of load cases and locations through the submit form on the project page (at
// phone width), the revision table and the record page say what it covers, and the record's
// results hold only the rows of that set. The form is checked with axe on the way.
//
// The scope half of the records API is built on another branch; until it is merged the API
// ignores `scope` and answers records without one, and this walk fails at its first scope check.

const serverHasRecords = await serverHasReviewRoutes();

/** Phone width: the form must work at 390 px without scrolling sideways. */
const PHONE = { width: 390, height: 844 };

describe.skipIf(!serverHasRecords)("a record of chosen load cases and locations", () => {
  const world = signedInBrowser("Ira Pell");
  let team: BrowserTeam;
  /** Ids of the project's load cases, locations and combinations, by name. */
  const ids = { cases: {} as Record<string, string>, places: {} as Record<string, string> };
  const combos = {} as Record<string, string>;

  beforeAll(async () => {
    team = await browserTeam(world.browser, world.server.url);
    const origin = world.server.url;
    const owner = team.contexts.owner;
    const send = async (method: "get" | "post" | "put", url: string, data?: unknown) => {
      const answer = await owner.request[method](`${origin}/api${team.projectPath}${url}`, {
        data,
        headers: { Origin: origin },
      });
      if (answer.status() >= 300) throw new Error(`${url}: ${answer.status()} ${await answer.text()}`);
      return answer.json();
    };
    const uniaxial = (mpa: number) => ({
      unit: "MPa",
      components: { xx: mpa, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
    });

    // The team's project has one location (mid-shell) and two load cases (Operating, design;
    // Hydrostatic test, test). Two more locations and three more load cases make 5 × 3.
    for (const name of ["nozzle N1", "skirt"])
      ids.places[name] = (await send("post", "/locations", { name })).location.id;
    const listed = (await send("get", "/load-cases")) as {
      loadCases: { id: string; name: string; version: number; states: { locationId: string }[] }[];
    };
    for (const c of listed.loadCases) ids.cases[c.name] = c.id;
    ids.places["mid-shell"] = listed.loadCases[0].states[0].locationId;
    // Operating and the hydrostatic test get a state at the two new locations as well.
    for (const c of listed.loadCases) {
      let version = c.version;
      for (const place of ["nozzle N1", "skirt"]) {
        const saved = await send("put", `/load-cases/${c.id}/states/${ids.places[place]}`, {
          version,
          stress: uniaxial(100),
        });
        version = saved.loadCase.version;
      }
    }
    // Wind at 300 MPa uniaxial is beyond SA-516 Grade 70's yield (260 MPa, the team's default
    // material): it fails and governs the whole project, so a record that leaves it out must
    // show a governing case of its own scope.
    const newCases: [string, string, number][] = [
      ["Design", "design", 120],
      ["Wind", "", 300],
      ["Retired case", "occasional", 90],
    ];
    for (const [name, category, mpa] of newCases) {
      const states = Object.values(ids.places).map((locationId) => ({ locationId, stress: uniaxial(mpa) }));
      ids.cases[name] = (await send("post", "/load-cases", { name, category, states })).loadCase.id;
    }
    // One combination of chosen cases only, one that also needs Wind.
    combos["Operating + test"] = (
      await send("post", "/combinations", {
        name: "Operating + test",
        terms: [
          { loadCaseId: ids.cases["Operating"], factor: 1 },
          { loadCaseId: ids.cases["Hydrostatic test"], factor: 1 },
        ],
      })
    ).combination.id;
    combos["Operating + wind"] = (
      await send("post", "/combinations", {
        name: "Operating + wind",
        terms: [
          { loadCaseId: ids.cases["Operating"], factor: 1 },
          { loadCaseId: ids.cases["Wind"], factor: 1 },
        ],
      })
    ).combination.id;
  }, 120_000);

  const shot = (page: Page, name: string) =>
    page.screenshot({ path: path.join(screenshotDir, `record-scope-${name}.png`), fullPage: true });

  /** axe's serious and critical findings inside one element (WCAG 2.0/2.1 A and AA tags). */
  async function seriousViolations(page: Page, selector: string): Promise<string[]> {
    const results = await new AxeBuilder({ page })
      .include(selector)
      .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
      .analyze();
    return results.violations
      .filter((v) => v.impact === "serious" || v.impact === "critical")
      .map((v) => `${v.id} (${v.nodes.map((n) => n.target.join(" ")).join(", ")})`);
  }

  it("when an editor submits a record for 2 of 4 load cases and 2 of 3 locations through the form at phone width, then the revision table and the record page say so with the names, and the record's results hold only the rows of that set", async () => {
    const origin = world.server.url;
    const page = await team.contexts.editor.newPage();
    await page.setViewportSize(PHONE);
    page.setDefaultTimeout(10_000);
    const posts: unknown[] = [];
    page.on("request", (r) => {
      if (r.method() === "POST" && r.url().endsWith(`${team.projectPath}/records`))
        posts.push(r.postDataJSON());
    });
    await page.goto(`${origin}${team.projectPath}`, { waitUntil: "networkidle" });
    const status = page.getByRole("region", { name: "Review status" });
    await status.getByRole("button", { name: "Submit for check" }).click();

    // The whole project is the default; choosing the subset shows the two lists.
    const covers = status.getByRole("group", { name: "What this record covers" });
    expect(await covers.getByLabel("The whole project").isChecked()).toBe(true);
    await covers.getByLabel("Chosen load cases and locations").check();
    const caseList = status.getByRole("group", { name: "Load cases", exact: true });
    const placeList = status.getByRole("group", { name: "Locations", exact: true });
    await caseList.getByLabel("Retired case (occasional)").waitFor();
    expect(await caseList.getByRole("checkbox").count()).toBe(5);
    expect(await placeList.getByRole("checkbox").count()).toBe(3);
    // Each load case is listed with its category; one without a category is listed by name.
    await caseList.getByLabel("Operating (design)", { exact: true }).waitFor();
    await caseList.getByLabel("Wind", { exact: true }).waitFor();

    // axe on the open form, and nothing wider than the phone.
    await status.getByLabel("What changed and why").fill("Shell checked for operation and test only.");
    expect(await seriousViolations(page, '[data-testid="review-status"]')).toEqual([]);
    await status.screenshot({ path: path.join(screenshotDir, "record-scope-form-phone.png") });
    // The form stays within the phone's width and nothing in it scrolls sideways. (The project
    // page's states table around it is wider with three locations; that is its own matter.)
    const box = await status.boundingBox();
    expect(box!.x + box!.width).toBeLessThanOrEqual(PHONE.width);
    expect(await status.evaluate((e) => e.scrollWidth - e.clientWidth)).toBe(0);

    // Load cases chosen, no location: refused here, naming the list, and nothing is sent.
    await caseList.getByLabel("Operating (design)", { exact: true }).check();
    await caseList.getByLabel("Hydrostatic test (test)", { exact: true }).check();
    await caseList.getByLabel("Retired case (occasional)", { exact: true }).check();
    await status.getByRole("button", { name: "Submit for check" }).click();
    await placeList.getByText("Locations: choose at least one location").waitFor();
    expect(await caseList.getByText(/choose at least one/).count()).toBe(0);
    expect(posts).toEqual([]);

    // "Select all" then unticking one; the count line follows.
    await placeList.getByRole("button", { name: "Select all locations" }).click();
    await placeList.getByLabel("skirt", { exact: true }).uncheck();
    await status.getByText("3 of 5 load cases, 2 of 3 locations").waitFor();
    expect(await placeList.getByText(/choose at least one/).count()).toBe(0);

    // A load case deleted while the form is open: the API's 400 names scope.loadCaseIds.2 and the
    // form puts it beside the load cases, naming the case.
    const deleted = await team.contexts.owner.request.delete(
      `${origin}/api${team.projectPath}/load-cases/${ids.cases["Retired case"]}`,
      { headers: { Origin: origin } },
    );
    expect(deleted.status()).toBeLessThan(300);
    await status.getByRole("button", { name: "Submit for check" }).click();
    await caseList.getByText(/Load cases: Retired case \(occasional\): /).waitFor();
    expect(await placeList.getByText(/Locations: /).count()).toBe(0);
    expect(posts).toHaveLength(1);
    await status.screenshot({ path: path.join(screenshotDir, "record-scope-form-server-error.png") });

    // Without it, the record is submitted for the chosen set.
    await caseList.getByLabel("Retired case (occasional)", { exact: true }).uncheck();
    // The API's message spoke of the lists as sent: once a box changes it is gone.
    expect(await caseList.getByText(/Load cases: Retired case/).count()).toBe(0);
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByText("Record 1 (revision A) is submitted for check.").waitFor();
    expect(posts[1]).toEqual({
      reason: "Shell checked for operation and test only.",
      scope: {
        loadCaseIds: [ids.cases["Operating"], ids.cases["Hydrostatic test"]],
        locationIds: [ids.places["mid-shell"], ids.places["nozzle N1"]],
      },
    });
    // The project has 4 live load cases now that one is in the trash.
    await status.getByText("It covers 2 of 4 load cases, 2 of 3 locations.").waitFor();

    // The revision table says what the record covers.
    await page.goto(`${origin}${team.projectPath}/records`, { waitUntil: "networkidle" });
    const table = page.getByTestId("revision-table");
    expect(await table.getByTestId("revision-scope").allTextContents()).toEqual([
      "2 of 4 load cases, 2 of 3 locations",
    ]);

    // The record page names them, in the project's order.
    await table.getByRole("link", { name: "Record 1, revision A" }).click();
    await page.getByRole("heading", { name: /Record 1 · revision A/, level: 1 }).waitFor();
    expect(await page.getByTestId("record-scope").textContent()).toBe(
      "This record covers 2 of 4 load cases (Operating, Hydrostatic test) and 2 of 3 locations " +
        "(mid-shell, nozzle N1); results outside it are not part of this record.",
    );

    // The results as frozen: exactly the chosen cases at the chosen places, and the combination
    // made only of chosen cases (row ids as the comparison writes them: case:<case>:<location>).
    const rowIds = await page
      .getByTestId("record-rows")
      .locator("tbody tr[data-row-id]")
      .evaluateAll((rows) => rows.map((r) => r.getAttribute("data-row-id")));
    const expected: string[] = [];
    for (const place of ["mid-shell", "nozzle N1"]) {
      for (const name of ["Operating", "Hydrostatic test"])
        expected.push(`case:${ids.cases[name]}:${ids.places[place]}`);
      expected.push(`combination:${combos["Operating + test"]}:${ids.places[place]}`);
    }
    expect([...rowIds].sort()).toEqual(expected.sort());
    // Wind fails and governs the whole project; within this record something else governs.
    const governing = await page.getByTestId("record-governing").textContent();
    expect(governing).toMatch(/^governs: /);
    expect(governing).not.toMatch(/Wind|skirt/);
    // The caution stays, once, beside the results.
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    expect(
      await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth),
    ).toBe(0);
    await shot(page, "record-phone");

    // The print page (the report's HTML form) says the same, from the report's own model.
    await page.getByRole("link", { name: "Print page" }).click();
    await page
      .getByText(
        "This record covers 2 of 4 load cases (Operating, Hydrostatic test) and 2 of 3 locations " +
          "(mid-shell, nozzle N1); results outside it are not part of this record.",
      )
      .first()
      .waitFor();
    await page.close();
  });

  // Continues with record 1 of the walk above (tests in a file run in order).
  it("when the checker returns that record and the editor resubmits for the whole project, then the new record says so and its diff lists the change of scope first", async () => {
    const origin = world.server.url;
    const reviewer = team.contexts.reviewer;
    const listed = await reviewer.request.get(`${origin}/api${team.projectPath}/records`);
    const first = ((await listed.json()) as { records: { id: string; number: number }[] }).records.find(
      (r) => r.number === 1,
    )!;
    const returned = await reviewer.request.post(
      `${origin}/api${team.projectPath}/records/${first.id}/return`,
      { data: { comment: "Cover the whole shell, wind included." }, headers: { Origin: origin } },
    );
    expect(returned.status()).toBeLessThan(300);

    const page = await team.contexts.editor.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${origin}${team.projectPath}`, { waitUntil: "networkidle" });
    const status = page.getByRole("region", { name: "Review status" });
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByLabel("What changed and why").fill("Whole shell, wind included, as the checker asked.");
    // Left on the default: the whole project.
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByText("Record 2 (revision A) is submitted for check.").waitFor();
    expect(await status.getByText(/It covers/).count()).toBe(0);
    await status.getByRole("link", { name: "Open record 2" }).click();
    await page.waitForURL(/\/records\/[0-9a-f-]+$/);

    await page.getByRole("heading", { name: /Record 2 · revision A/, level: 1 }).waitFor();
    expect(await page.getByTestId("record-scope").textContent()).toBe(
      "This record covers the whole project: 4 load cases and 3 locations.",
    );
    const diff = page.getByTestId("record-diff");
    await diff.getByText("Record 1 (revision A) → record 2 (revision A)").waitFor();
    expect(await diff.locator("h3").first().textContent()).toBe("What the records cover");
    expect(
      await diff.getByRole("region", { name: "What the records cover" }).locator("li").allTextContents(),
    ).toEqual([
      "Scope — load cases: Operating, Hydrostatic test → whole project",
      "Scope — locations: mid-shell, nozzle N1 → whole project",
    ]);
    await shot(page, "diff");

    await page.goto(`${origin}${team.projectPath}/records`, { waitUntil: "networkidle" });
    expect(await page.getByTestId("revision-scope").allTextContents()).toEqual([
      "whole project",
      "2 of 4 load cases, 2 of 3 locations",
    ]);
    await page.close();
  });
});
