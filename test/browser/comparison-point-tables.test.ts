import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { signedInBrowser } from "../support/signed-in-browser";

/**
 * Three points in MPa against the published SA-516 Grade 70 yield of 260 MPa (ASME SA-516, recalled
 * from memory — the product's library value), required von Mises factor 1.5:
 * - id 11, uniaxial 100: σvm = |σ| = 100 (uniaxial, common practice, no source) → n = 2.6;
 * - id 12, uniaxial 200 → n = 1.30, below 1.5: fails, and governs;
 * - id 13, uniaxial 180 → n = 1.444, below 1.5: fails too.
 */
const CSV = [
  "id,x,y,z,sxx,syy,szz,sxy,syz,szx",
  "11,0,0,0,100,0,0,0,0,0",
  "12,5,0,0,200,0,0,0,0,0",
  "13,9,1,0,180,0,0,0,0,0",
  "",
].join("\n");

describe("the comparison's point-table section in Chromium", () => {
  const world = signedInBrowser("Teo Valdric");

  it("when a load case holds a point table, then the comparison lists it with its governing point, the same factor the API reports, and the count of failing points", async () => {
    const { server, editor } = world;
    const api = (p: string) => `${server.url}/api${p}`;
    const headers = { Origin: server.url };
    const post = async (p: string, data: unknown) => {
      const response = await editor.request.post(api(p), { data, headers });
      expect(response.ok(), await response.text()).toBe(true);
      return response.json();
    };
    const workspaceId = (await post("/workspaces", { name: "Point checks" })).workspace.id;
    const projects = `/workspaces/${workspaceId}/projects`;
    const projectId = (
      await post(projects, {
        name: "Nozzle N4",
        requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
        defaultMaterial: { kind: "published", id: "sa516-70" },
      })
    ).project.id;
    const caseId = (
      await post(`${projects}/${projectId}/load-cases`, { name: "Hydrotest", category: "test" })
    ).loadCase.id;
    const tables = `${projects}/${projectId}/load-cases/${caseId}/point-tables`;
    const declared = await post(tables, {
      fileName: "n4-points.csv",
      sizeBytes: Buffer.byteLength(CSV),
      sha256: createHash("sha256").update(CSV).digest("hex"),
      layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
      columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
      unit: "MPa",
      idKind: "number",
    });
    const put = await editor.request.put(api(`${tables}/${declared.id}/content`), {
      data: CSV,
      headers: { ...headers, "Content-Type": "text/csv" },
    });
    expect(put.status(), await put.text()).toBe(200);
    const answer = await (await editor.request.get(api(`${projects}/${projectId}/comparison`))).json();
    const vonMises = answer.pointTables[0].perCriterion.find(
      (k: { criterion: string }) => k.criterion === "von-mises",
    );
    expect(vonMises.governing.id).toBe(12);
    expect(vonMises.factor).toBeCloseTo(260 / 200, 12);

    const page = await editor.newPage();
    await page.goto(`${server.url}${projects}/${projectId}/comparison`);
    const section = page.getByTestId("point-table-checks");
    await section.waitFor();
    const row = section.locator("tbody[data-table='n4-points.csv'] tr").first();
    await expect.poll(() => row.innerText()).toMatch(/von Mises/);
    const text = (await row.innerText()).replace(/\s+/g, " ");
    expect(text).toContain("point 12 (5, 0, 0)");
    expect(text).toContain(`${vonMises.factor.toFixed(2)} / 1.5`);
    expect(text).toMatch(/2 · 0/); // ids 12 and 13 fail, none within the close band
    expect(text).toMatch(/fails/);
    // No state at a location: the rows section says where the ratings are instead of an empty table and chart.
    await expect
      .poll(() => page.getByTestId("no-case-rows").innerText())
      .toMatch(/no case × location row.*finite-element point tables/s);
    expect(await page.getByRole("table", { name: "Comparison of load cases and locations" }).count()).toBe(0);
    expect(await page.locator("#utilisation-title").count()).toBe(0);
    await page.getByRole("link", { name: "n4-points.csv" }).click();
    await page.waitForURL(new RegExp(`/load-cases/${caseId}/point-tables\\?table=${declared.id}$`));
    // The link opens that table's stored results, whose governing point is the same one.
    const governing = page.getByTestId("governing-points");
    await governing.waitFor({ timeout: 15_000 });
    expect((await governing.locator("tbody tr").first().innerText()).replace(/\s+/g, " ")).toMatch(/\b12\b/);
  });
});
