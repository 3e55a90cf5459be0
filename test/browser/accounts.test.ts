import { mkdir } from "node:fs/promises";
import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { uniqueEmail } from "../support/accounts";
import { confirmationLink, launchChromium, screenshotDir } from "../support/browser";
import { startTestServer } from "../support/server";

const shot = (page: Page, name: string) =>
  page.screenshot({ path: path.join(screenshotDir, `accounts-${name}.png`), fullPage: true });

async function seriousViolations(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id}: ${v.help}`);
}

describe("from sign-up to a shared workspace in Chromium", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  const mira = { name: "Mira Castellan", email: uniqueEmail("mira"), password: "tank shell nine bar" };
  const ines = { name: "Ines Okafor-Lund", email: uniqueEmail("ines"), password: "independent checker" };
  let workspaceUrl = "";
  let invitationLink = "";

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    await mkdir(screenshotDir, { recursive: true });
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when a new user signs up and creates a workspace, then they own it and see the members table", async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}/sign-up`, { waitUntil: "networkidle" });
    // The form shows zod's messages beside the fields before anything is sent.
    await page.getByRole("button", { name: "Create account" }).click();
    await page.getByText("Use at least 10 characters.").waitFor();
    await shot(page, "sign-up-errors");
    await page.getByLabel("Your name").fill(mira.name);
    await page.getByLabel("E-mail address").fill(mira.email);
    await page.getByLabel("Password").fill(mira.password);
    await page.getByRole("button", { name: "Create account" }).click();
    // The answer is the same for a known address, so it only says to check the mail; the link signs in.
    await page.getByRole("heading", { name: "Check your mail" }).waitFor();
    await shot(page, "sign-up-check-mail");
    await page.goto(await confirmationLink(page.request, server.url, mira.email));
    await page.waitForURL(`${server.url}/workspaces`);
    await page.getByText("You are not in any workspace yet").waitFor();
    await page.getByRole("link", { name: "New workspace" }).click();
    await page.getByLabel("Workspace name").fill("Quillon Engineering");
    await page.getByRole("button", { name: "Create workspace" }).click();
    // A new workspace opens on its (empty) projects; the members are one tab away.
    await page.waitForURL(/\/workspaces\/[0-9a-f-]{36}\/projects$/);
    workspaceUrl = page.url();
    await page.getByRole("heading", { name: "Quillon Engineering" }).waitFor();
    await page.getByRole("navigation", { name: "Workspace" }).getByRole("link", { name: "Members" }).click();
    await page.getByRole("cell", { name: /Mira Castellan \(you\)/ }).waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await shot(page, "workspace-members");

    await page.getByRole("link", { name: "Invitations" }).click();
    await page.getByLabel("E-mail address").fill(ines.email);
    await page.getByLabel("Role").selectOption("reviewer");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation mailed to ${ines.email}`).waitFor();
    await page.getByRole("cell", { name: "○ pending" }).waitFor();
    await shot(page, "invitations");

    await page.goto(`${server.url}/dev/mailbox`, { waitUntil: "networkidle" });
    await page.getByText("Mail is not really being sent.").waitFor();
    // Checked before a message is open: axe cannot enter the script-less sandboxed frame that shows the HTML part.
    expect(await seriousViolations(page)).toEqual([]);
    // Other test files leave mail in the same dev mailbox: pick this colleague's invitation by address.
    await page
      .getByRole("link", { name: /Mira Castellan invited you to Quillon Engineering on Sigmacube/ })
      .filter({ hasText: ines.email })
      .click();
    await page.getByText("Plain-text part").click();
    const text = await page.locator("pre").innerText();
    invitationLink = text.match(/https?:\/\/\S+\/invitations\/\S+/)![0];
    expect(invitationLink.startsWith(server.url)).toBe(true);
    const html = page.frameLocator('iframe[title="HTML part"]');
    await html.getByRole("link", { name: "Join Quillon Engineering" }).waitFor();
    await shot(page, "mailbox");
  });

  it("when the colleague opens the mail's link in another browser and signs up, then they join as reviewer", async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(invitationLink, { waitUntil: "networkidle" });
    await page.getByText(`Mira Castellan invited ${ines.email}`).waitFor();
    await shot(page, "invitation-signed-out");
    await page.getByRole("link", { name: "Create an account" }).click();
    expect(await page.getByLabel("E-mail address").inputValue()).toBe(ines.email);
    await page.getByLabel("Your name").fill(ines.name);
    await page.getByLabel("Password").fill(ines.password);
    await page.getByRole("button", { name: "Create account" }).click();
    await page.waitForURL(invitationLink);
    await page.getByRole("button", { name: "Accept and open the workspace" }).click();
    await page.waitForURL(workspaceUrl);
    await page.getByText("You are reviewer").waitFor();
    await page.getByRole("navigation", { name: "Workspace" }).getByRole("link", { name: "Members" }).click();
    await page.getByRole("cell", { name: /Ines Okafor-Lund \(you\)/ }).waitFor();
    // A reviewer has no invitation or share-link tabs.
    expect(await page.getByRole("link", { name: "Invitations" }).count()).toBe(0);
    await shot(page, "joined-as-reviewer");
  });

  it("when a signed-out member opens a copied workspace link, then sign-in brings them back to exactly that page", async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(workspaceUrl, { waitUntil: "networkidle" });
    await page.waitForURL(/\/sign-in\?next=/);
    await page.getByLabel("E-mail address").fill(ines.email);
    await page.getByLabel("Password").fill(ines.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(workspaceUrl);
    await page.getByRole("heading", { name: "Quillon Engineering" }).waitFor();
    await page.getByRole("button", { name: "Copy link to this page" }).waitFor();
    expect(await page.getByRole("button", { name: "Copy link to this page" }).getAttribute("data-link")).toBe(
      workspaceUrl,
    );
  });
});
