import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir } from "../support/browser";
import { browserTeam, type BrowserTeam } from "../support/browser-team";
import { startTestServer } from "../support/server";

// Who may invite and create share links is the API's rule (test/api/role-matrix.test.ts);
// these tests check that each role is shown only the controls it may use.

describe("each role sees only the controls it may use", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let team: BrowserTeam;

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    team = await browserTeam(browser, server.url);
  }, 60_000);
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  async function open(role: keyof BrowserTeam["contexts"], rest: string): Promise<Page> {
    const page = await team.contexts[role].newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}${rest}`, { waitUntil: "networkidle" });
    return page;
  }

  for (const role of ["viewer", "reviewer"] as const) {
    it(`when a ${role} opens invitations and share links by address, then no form shows and the page says who may act`, async () => {
      const refused: string[] = [];
      const page = await open(role, `${team.workspacePath}/invitations`);
      page.on("response", (r) => r.status() === 403 && refused.push(r.url()));
      await page.getByText("Only owners invite people by e-mail.").waitFor();
      expect(await page.getByRole("button", { name: "Send invitation" }).count()).toBe(0);
      expect(await page.getByLabel("E-mail address").count()).toBe(0);
      await page.screenshot({ path: path.join(screenshotDir, `roles-${role}-invitations.png`) });

      await page.goto(`${server.url}${team.workspacePath}/share-links`, { waitUntil: "networkidle" });
      await page.getByText("Only owners and editors create and revoke share links.").waitFor();
      expect(await page.getByRole("button", { name: "Create link" }).count()).toBe(0);

      await page.goto(`${server.url}${team.workspacePath}/settings`, { waitUntil: "networkidle" });
      await page.getByText("Only owners rename or delete the workspace.").waitFor();
      expect(await page.getByRole("button", { name: "Rename" }).count()).toBe(0);
      // Nothing was asked of the server that it refuses.
      expect(refused).toEqual([]);
      const tabs = await page
        .getByRole("navigation", { name: "Workspace" })
        .getByRole("link")
        .allInnerTexts();
      expect(tabs).toEqual(["Projects", "Members"]);
    });
  }

  it("when a reviewer opens the project, then the page says they check submitted records and offers no edit controls, as for a viewer", async () => {
    for (const role of ["reviewer", "viewer"] as const) {
      const page = await open(role, team.projectPath);
      await page.getByRole("heading", { name: "CT-7 shell", level: 1 }).waitFor();
      const note = page.getByText(`You are a ${role} here`);
      expect(await note.count()).toBeGreaterThan(0);
      if (role === "reviewer") await page.getByText(/you check the records submitted for check/).waitFor();
      expect(await page.getByRole("button", { name: /^(Edit|Rename|Enter) / }).count()).toBe(0);
      expect(await page.getByRole("button", { name: /New load case|Add location/ }).count()).toBe(0);
      await page.screenshot({ path: path.join(screenshotDir, `roles-${role}-project.png`), fullPage: true });
    }
  });

  it("when an editor opens invitations, then it is refused in words, while share links offer the form", async () => {
    const page = await open("editor", `${team.workspacePath}/invitations`);
    await page.getByText("Only owners invite people by e-mail.").waitFor();
    expect(await page.getByRole("button", { name: "Send invitation" }).count()).toBe(0);
    await page.goto(`${server.url}${team.workspacePath}/share-links`, { waitUntil: "networkidle" });
    await page.getByRole("button", { name: "Create link" }).waitFor();
    expect(await page.getByText(/Only owners and editors/).count()).toBe(0);
  });

  it("when the owner opens invitations, then the form shows with a neutral example address", async () => {
    const page = await open("owner", `${team.workspacePath}/invitations`);
    const email = page.getByLabel("E-mail address");
    await email.waitFor();
    expect(await email.getAttribute("placeholder")).toBe("name@example.com");
    await page.getByRole("button", { name: "Send invitation" }).waitFor();
  });

  it("when a state was typed in ksi, then the project page shows it in ksi and counts its saves instead of a bare version number", async () => {
    const page = await open("owner", team.projectPath);
    await page.getByText("typed in ksi · saved once").waitFor();
    // σxx = 10.9 ksi as typed, with its unit beside it.
    await page.getByText("10.9", { exact: false }).first().waitFor();
    expect(await page.getByText(/^version \d+$/).count()).toBe(0);
    // Each "Open in bench" is announced with its visible words first, then the cell it opens.
    await page.getByRole("link", { name: /^Open in bench\W*Operating at mid-shell$/ }).waitFor();
  });
});
