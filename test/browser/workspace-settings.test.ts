import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { uniqueEmail } from "../support/accounts";
import { confirmationLink, launchChromium, screenshotDir } from "../support/browser";
import { startTestServer } from "../support/server";

/** Signs a new user up in `page` and creates a workspace; leaves the page on its projects tab. */
async function signUpWithWorkspace(page: Page, origin: string, name: string, workspaceName: string) {
  await page.goto(`${origin}/sign-up`, { waitUntil: "networkidle" });
  await page.getByLabel("Your name").fill(name);
  const email = uniqueEmail(name.split(" ")[0].toLowerCase());
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password").fill("agitator shaft 45");
  await page.getByRole("button", { name: "Create account" }).click();
  await page.getByRole("heading", { name: "Check your mail" }).waitFor();
  await page.goto(await confirmationLink(page.request, origin, email));
  await page.waitForURL(`${origin}/workspaces`);
  await page.getByRole("link", { name: "New workspace" }).click();
  await page.getByLabel("Workspace name").fill(workspaceName);
  await page.getByRole("button", { name: "Create workspace" }).click();
  await page.waitForURL(/\/projects$/);
}

describe("workspace settings in Chromium", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when the owner renames the workspace and then deletes it by typing its name, then both take effect", async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    page.setDefaultTimeout(10_000);
    await signUpWithWorkspace(page, server.url, "Teo Valdric", "Quillon scratch");

    await page.getByRole("navigation", { name: "Workspace" }).getByRole("link", { name: "Settings" }).click();
    const rename = page.getByLabel("Workspace name");
    await rename.fill("");
    await page.getByRole("button", { name: "Rename" }).click();
    // The shared zod schema answers beside the field before anything is sent.
    expect(await page.locator("#workspace-rename-error").innerText()).not.toBe("");
    await rename.fill("Quillon trials");
    await page.getByRole("button", { name: "Rename" }).click();
    await page.getByRole("status").getByText("Renamed").waitFor();
    await page.getByRole("heading", { name: "Quillon trials", level: 1 }).waitFor();

    const remove = page.getByRole("button", { name: "Delete Quillon trials for everyone" });
    expect(await remove.isDisabled()).toBe(true);
    await page.getByLabel(/Type the workspace's name/).fill("Quillon trial");
    expect(await remove.isDisabled()).toBe(true);
    await page.getByLabel(/Type the workspace's name/).fill("Quillon trials");
    const results = await new AxeBuilder({ page }).analyze();
    expect(results.violations.filter((v) => v.impact === "serious" || v.impact === "critical")).toEqual([]);
    await page.screenshot({ path: path.join(screenshotDir, "workspace-settings.png"), fullPage: true });
    await remove.click();
    await page.waitForURL(`${server.url}/workspaces`);
    await page.getByText("You are not in any workspace yet").waitFor();
  });

  it("when a share link asks for zero uses, then the shared schema's message stands beside the field and nothing is sent", async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    page.setDefaultTimeout(10_000);
    await signUpWithWorkspace(page, server.url, "Mira Castellan", "Quillon links");
    await page
      .getByRole("navigation", { name: "Workspace" })
      .getByRole("link", { name: "Share links" })
      .click();
    const posts: string[] = [];
    page.on("request", (r) => r.method() === "POST" && posts.push(r.url()));
    await page.getByLabel("Use limit (empty: none)").fill("0");
    await page.getByRole("button", { name: /Create (share )?link/i }).click();
    await page.locator("#link-maxUses-error").getByText("Allow at least 1 use").waitFor();
    expect(posts).toEqual([]);
  });
});
