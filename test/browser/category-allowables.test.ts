import path from "node:path";
import { describe, expect, it } from "vitest";
import { screenshotDir } from "../support/browser";
import { signedInBrowser } from "../support/signed-in-browser";

describe("allowables per load-case category in Chromium", () => {
  const world = signedInBrowser("Teo Valdric");

  it("when an editor gives the test category its own Tresca factor on the project page, then the comparison checks the test case against it and says so, and the bench opened from that row shows the same factor and verdict", async () => {
    const { server, editor } = world;
    const api = (p: string) => `${server.url}/api${p}`;
    const post = async (p: string, data: unknown) => {
      const r = await editor.request.post(api(p), { data, headers: { Origin: server.url } });
      expect(r.status(), await r.text()).toBe(201);
      return r.json();
    };
    const ws = (await post("/workspaces", { name: "Category allowables" })).workspace.id as string;
    const project = (
      await post(`/workspaces/${ws}/projects`, {
        name: "Receiver R-2",
        requirements: [{ criterion: "tresca", requiredFactor: 1.5 }],
        defaultMaterial: { kind: "published", id: "s355" },
      })
    ).project.id as string;
    const base = `/workspaces/${ws}/projects/${project}`;
    const location = (await post(`${base}/locations`, { name: "shell" })).location.id as string;
    // Uniaxial 250 MPa on S355: Tresca n = Sy/(σ1 − σ3) = 355/250 = 1.42 (common practice, no source):
    // it fails 1.5 but passes 1.25 (1.42 ≥ 1.1 × 1.25 = 1.375).
    await post(`${base}/load-cases`, {
      name: "Hydrotest",
      category: "test",
      states: [
        {
          locationId: location,
          stress: { unit: "MPa", components: { xx: 250, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 } },
        },
      ],
    });

    const page = await editor.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}${base}`, { waitUntil: "networkidle" });
    await page.getByText("checked with the project default factors").waitFor();
    await page.getByRole("button", { name: "Change checks" }).click();
    await page.getByLabel("Required factor for test, Tresca").fill("1.25");
    await page.getByRole("button", { name: "Save checks" }).click();
    await page.getByTestId("category-requirements").waitFor();
    expect(await page.getByTestId("category-requirements").innerText()).toMatch(/test\s+n ≥ 1\.25/);
    await page.getByText("checked with the “test” factors").waitFor();

    await page.goto(`${server.url}${base}/comparison`, { waitUntil: "networkidle" });
    await expect
      .poll(() => page.getByTestId("governing-summary").innerText())
      .toBe("governs: Hydrotest at shell, Tresca, SF 1.42 against 1.25 required (the “test” factors)");
    expect(await page.getByTestId("allowable").first().innerText()).toMatch(/factors: the “test” factors/);
    await page.screenshot({
      path: path.join(screenshotDir, "category-allowables-comparison.png"),
      fullPage: true,
    });

    await page.getByRole("link", { name: /^Open in bench\W*Hydrotest at shell$/ }).click();
    await expect
      .poll(() => page.getByTestId("requirements-source").innerText())
      .toMatch(/Receiver R-2, load case category “test”: the “test” factors/);
    const tresca = page.getByTestId("criterion-tresca");
    await expect.poll(() => tresca.getByTestId("required").innerText()).toBe("1.25");
    expect(await tresca.getByTestId("n").innerText()).toBe("1.42");
    expect(await tresca.innerText()).toMatch(/✓\s*passes/);
    await page.screenshot({ path: path.join(screenshotDir, "category-allowables-bench.png") });
  });
});
