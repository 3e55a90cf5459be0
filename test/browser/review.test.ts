import { readFile } from "node:fs/promises";
import path from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { extractText } from "unpdf";
import { beforeAll, describe, expect, it } from "vitest";
import { screenshotDir, signUpInContext } from "../support/browser";
import { browserTeam, type BrowserTeam } from "../support/browser-team";
import { serverHasReviewRoutes } from "../support/records-probe";
import { signedInBrowser } from "../support/signed-in-browser";

// Issue 14's walk through review and sign-off, in the browser: the originator submits, a checker
// comments on the record and on a row, the originator answers, the checker returns it, the
// originator changes a state and resubmits, the diff shows the change, two independent checkers
// approve, and the approved record shows the signatures.
//
// The records API is built on another branch. Until it is merged, GET …/review is not a route
// (the API answers 404 route_not_found before asking who is signed in) and this walk is skipped.

const serverHasRecords = await serverHasReviewRoutes();

describe.skipIf(!serverHasRecords)("review and sign-off in the browser", () => {
  const world = signedInBrowser("Ira Pell");
  let team: BrowserTeam;
  let secondChecker: BrowserContext;

  beforeAll(async () => {
    team = await browserTeam(world.browser, world.server.url);
    // A second reviewer, joined through a share link as people join in the product.
    const origin = world.server.url;
    const link = await team.contexts.owner.request.post(`${origin}/api${team.workspacePath}/share-links`, {
      data: { role: "reviewer", expiresInDays: 1 },
      headers: { Origin: origin },
    });
    const url = ((await link.json()) as { url: string }).url;
    secondChecker = await world.browser.newContext({ viewport: { width: 1280, height: 800 } });
    await signUpInContext(secondChecker, origin, "Sol Brannigan");
    const joined = await secondChecker.request.post(
      `${origin}/api/share-links/${url.split("/").pop()}/join`,
      {
        headers: { Origin: origin },
      },
    );
    expect(joined.status()).toBeLessThan(300);
  }, 90_000);

  async function open(context: BrowserContext, rest: string): Promise<Page> {
    const page = await context.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${world.server.url}${rest}`, { waitUntil: "networkidle" });
    return page;
  }

  /** Presses the record page's "PDF report" link and reads the file the browser saves. */
  async function downloadRecordPdf(page: Page): Promise<Buffer> {
    const [download] = await Promise.all([
      page.waitForEvent("download", { timeout: 60_000 }),
      page.getByRole("link", { name: "PDF report" }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/-report\.pdf$/);
    const file = await download.path();
    return readFile(file);
  }

  /** The PDF's text with every run of white space as one space (lines wrap anywhere). */
  async function pdfTextOf(pdf: Buffer): Promise<string> {
    const { text } = await extractText(new Uint8Array(pdf), { mergePages: true });
    return text.replace(/\s+/g, " ");
  }

  /** The originator (the editor) saves the hydrostatic test state again with σx in MPa. */
  async function saveHydroState(sx: number) {
    const origin = world.server.url;
    const editor = team.contexts.editor;
    const list = await editor.request.get(`${origin}/api${team.projectPath}/load-cases`);
    const { loadCases } = (await list.json()) as {
      loadCases: { id: string; name: string; version: number; states: { locationId: string }[] }[];
    };
    const hydro = loadCases.find((c) => c.name === "Hydrostatic test")!;
    const saved = await editor.request.put(
      `${origin}/api${team.projectPath}/load-cases/${hydro.id}/states/${hydro.states[0].locationId}`,
      {
        data: {
          version: hydro.version,
          stress: { unit: "MPa", components: { xx: sx, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 } },
        },
        headers: { Origin: origin },
      },
    );
    expect(saved.status()).toBeLessThan(300);
  }

  it("when the originator submits, a checker comments and returns, the originator answers, changes a state and resubmits, and two checkers approve, then the approved record shows the diff and the signatures, and its PDF, downloaded through the page, names the record, carries the signatures and stays the same after a later edit", async () => {
    const shot = (page: Page, name: string) =>
      page.screenshot({ path: path.join(screenshotDir, `review-${name}.png`), fullPage: true });
    const records = `${team.projectPath}/records`;

    // The owner asks for two approvals.
    const owner = await open(team.contexts.owner, records);
    await owner.getByRole("heading", { name: "Records and sign-off", level: 1 }).waitFor();
    await owner.getByLabel("Two approvals by two independent checkers").check();
    await owner.getByText("Revision A · no record submitted yet").waitFor();
    expect(await owner.getByLabel("Two approvals by two independent checkers").isChecked()).toBe(true);

    // The originator submits from the project page; an empty reason is refused with the field named.
    const eda = await open(team.contexts.editor, team.projectPath);
    const status = eda.getByRole("region", { name: "Review status" });
    await status.getByText("Work in progress").waitFor();
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByText("What changed and why: say what changed since the last record and why.").waitFor();
    await status.getByLabel("What changed and why").fill("First issue of the shell check for review.");
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByText("Record 1 (revision A) is submitted for check.").waitFor();
    await status.getByText("Submitted for check").first().waitFor();
    await shot(eda, "submitted-project");

    // The checker reads the revision table and opens record 1.
    const rui = await open(team.contexts.reviewer, records);
    const table = rui.getByTestId("revision-table");
    await table.getByText("First issue of the shell check for review.").waitFor();
    expect(await table.locator("tbody tr").count()).toBe(1);
    await table.getByRole("link", { name: "Record 1, revision A" }).click();
    await rui.getByRole("heading", { name: /Record 1 · revision A/, level: 1 }).waitFor();
    await rui
      .getByText("This is the project's first record: there is no earlier record to compare it with.")
      .waitFor();

    // A comment on the record as a whole and one on the hydrostatic test row.
    await rui.getByLabel("Comment on the record as a whole").fill("Please state the test pressure's source.");
    await rui
      .getByRole("region", { name: "Comments on the record" })
      .getByRole("button", { name: "Add comment" })
      .click();
    await rui.getByText("Please state the test pressure's source.").waitFor();
    await rui.getByRole("button", { name: "Comment on Hydrostatic test at mid-shell" }).click();
    await rui
      .getByLabel("Comment on Hydrostatic test at mid-shell", { exact: true })
      .fill("SF 1.58 is close: check the gauge reading.");
    await rui.getByRole("button", { name: "Add comment" }).first().click();
    await rui.getByRole("button", { name: "1 comment on Hydrostatic test at mid-shell" }).waitFor();
    await shot(rui, "commented");
    const recordOne = new URL(rui.url()).pathname;

    // The originator answers the row comment, then may neither approve nor return their own record.
    await eda.goto(`${world.server.url}${recordOne}`, { waitUntil: "networkidle" });
    await eda.getByRole("button", { name: "1 comment on Hydrostatic test at mid-shell" }).click();
    await eda.getByRole("button", { name: "Answer Rui Tanager" }).first().click();
    await eda
      .getByLabel("Answer Rui Tanager")
      .fill("Gauge G-2 re-read: 175 MPa. State corrected in the next record.");
    await eda.getByRole("button", { name: "Send answer" }).click();
    await eda
      .getByRole("list", { name: "Answers" })
      .getByText(/Gauge G-2 re-read/)
      .waitFor();
    await eda.getByText("Only reviewers and owners return a record with comments or approve it.").waitFor();

    // The checker returns it with a comment.
    await rui.reload({ waitUntil: "networkidle" });
    await rui.getByRole("button", { name: "Return with comments" }).click();
    await rui
      .getByLabel("Comment for the originator")
      .fill("Correct the hydrostatic test state and resubmit.");
    await rui.getByRole("button", { name: "Return with comments" }).last().click();
    await rui.getByTestId("record-status").getByText("Returned with comments").waitFor();

    // The project page says it came back; the originator changes the state and resubmits from the comparison page.
    await eda.goto(`${world.server.url}${team.projectPath}`, { waitUntil: "networkidle" });
    await eda.getByRole("region", { name: "Review status" }).getByText("Returned with comments").waitFor();
    await saveHydroState(175);
    await eda.goto(`${world.server.url}${team.projectPath}/comparison`, { waitUntil: "networkidle" });
    const again = eda.getByRole("region", { name: "Review status" });
    await again.getByRole("button", { name: "Submit for check" }).click();
    await again
      .getByLabel("What changed and why")
      .fill("Hydrostatic test state corrected to the gauge reading (175 MPa).");
    await again.getByRole("button", { name: "Submit for check" }).click();
    await again.getByText("Record 2 (revision A) is submitted for check.").waitFor();
    await again.getByRole("link", { name: "Open record 2" }).click();
    // The record page is a lazily loaded route: wait for the address to change before reading it.
    await eda.waitForURL(/\/records\/[0-9a-f-]+$/);
    const recordTwo = new URL(eda.url()).pathname;

    // The diff shows the change, verdicts first.
    await rui.goto(`${world.server.url}${recordTwo}`, { waitUntil: "networkidle" });
    const diff = rui.getByTestId("record-diff");
    await diff.getByText("Record 1 (revision A) → record 2 (revision A)").waitFor();
    await diff
      .getByText(/Hydrostatic test/)
      .first()
      .waitFor();
    expect(await diff.textContent()).toMatch(/→/);
    await shot(rui, "diff");

    // Two independent approvals; the second makes it approved.
    await rui.getByRole("button", { name: "Approve" }).click();
    await rui.getByRole("button", { name: "Approve this record" }).click();
    await rui.getByText("1 of 2 approvals given.").waitFor();
    const sol = await open(secondChecker, recordTwo);
    await sol.getByRole("button", { name: "Approve" }).click();
    await sol.getByLabel("Approval remark (optional)").fill("Checked against the gauge log.");
    await sol.getByRole("button", { name: "Approve this record" }).click();
    await sol.getByTestId("record-status").getByText("Approved").waitFor();

    // The approved record shows its signatures.
    const signatures = sol.getByTestId("record-signatures");
    await signatures.getByText("Eda Marlow").waitFor();
    await signatures.getByText("Rui Tanager").waitFor();
    await signatures.getByText("Sol Brannigan").waitFor();
    expect(await signatures.textContent()).toMatch(/Originator.*Eda Marlow/);
    expect(await sol.getByTestId("results-caution").count()).toBe(1);
    await shot(sol, "approved");

    // The approved record's PDF, through the page's own link: it names the record and carries the signatures.
    const approvedPdf = await downloadRecordPdf(sol);
    const recordId = recordTwo.split("/").pop()!;
    const pdfText = await pdfTextOf(approvedPdf);
    expect(pdfText).toContain(recordId);
    expect(pdfText).not.toContain("DRAFT");
    expect(pdfText).toMatch(/Originator Eda Marlow/);
    expect(pdfText).toContain("Rui Tanager");
    expect(pdfText).toContain("Sol Brannigan");

    // The revision table lists both records; the first was returned, the second approved.
    await owner.reload({ waitUntil: "networkidle" });
    const rows = owner.getByTestId("revision-table").locator("tbody tr");
    await rows.first().getByText("Approved", { exact: true }).waitFor();
    expect(await rows.count()).toBe(2);
    expect(await rows.nth(1).textContent()).toMatch(/returned .* by Rui Tanager/);

    // A later edit: the project says its results differ from the approved record.
    await saveHydroState(170);
    await eda.goto(`${world.server.url}${team.projectPath}`, { waitUntil: "networkidle" });
    await eda.getByText("The results shown differ from the last approved record.").waitFor();
    // ... and the approved record's PDF is byte for byte what it was before the edit.
    await sol.reload({ waitUntil: "networkidle" });
    expect((await downloadRecordPdf(sol)).equals(approvedPdf)).toBe(true);
  });

  it("when a viewer opens a record, then it reads only, and says who may comment", async () => {
    const list = await team.contexts.viewer.request.get(`${world.server.url}/api${team.projectPath}/records`);
    const { records } = (await list.json()) as { records: { id: string }[] };
    expect(records.length).toBeGreaterThan(0);
    const page = await open(team.contexts.viewer, `${team.projectPath}/records/${records[0].id}`);
    expect(
      await page.getByRole("button", { name: /^(Approve|Return with comments|Add comment)$/ }).count(),
    ).toBe(0);
    await page
      .getByText(/^Viewers read records/)
      .first()
      .waitFor();
  });
});
