import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { BrowserContext, Page, Route } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { screenshotDir } from "../support/browser";
import { browserTeam, type BrowserTeam } from "../support/browser-team";
import { signedInBrowser } from "../support/signed-in-browser";

// The review screens (issue 14) against a stand-in for the records API: the app, the team and
// the project are real; only the review and record routes are answered here, by the agreed
// contract, so the screens are exercised before the records API is merged. The record's frozen
// content is taken from the real project (its export and its comparison). The walk against
// the real API is test/browser/review.test.ts.

type Person = { id: string; name: string };
type Summary = {
  id: string;
  number: number;
  revision: string;
  status: "submitted" | "returned" | "approved" | "superseded";
  hash: string;
  engineVersion: string;
  reason: string;
  requiredApprovals: 1 | 2;
  submittedBy: Person;
  submittedAt: string;
  approvals: { by: Person; at: string; comment: string }[];
  returned: { by: Person; at: string; comment: string } | null;
  approvedAt: string | null;
  /** null: the record covers the whole project. */
  scope: null;
};

const RECORD_1 = "0d5f3c1e-0000-4000-8000-0000000000a1";
const RECORD_2 = "0d5f3c1e-0000-4000-8000-0000000000a2";
const EDA: Person = { id: "0d5f3c1e-0000-4000-8000-0000000000e1", name: "Eda Marlow" };
/** The stand-in's comment ids: UUIDs, as the server's schema reads them. */
const commentId = (n: number) => `0d5f3c1e-0000-4000-8000-${String(n).padStart(12, "0")}`;
const RUI: Person = { id: "0d5f3c1e-0000-4000-8000-0000000000e2", name: "Rui Tanager" };

describe("review screens against a stand-in records API", () => {
  const world = signedInBrowser("Ira Pell");
  let team: BrowserTeam;
  let content: unknown;
  let hydroRow: string;
  /** What the stand-in answers and what it was sent; each test sets its own. */
  const fake = {
    review: {} as Record<string, unknown>,
    records: [] as Summary[],
    comments: [] as unknown[],
    sent: [] as { method: string; path: string; body: unknown }[],
    approveAnswer: null as null | { status: number; body: unknown },
  };

  const summary = (over: Partial<Summary>): Summary => ({
    id: RECORD_1,
    number: 1,
    revision: "A",
    status: "submitted",
    // The server's schemas (core/contract/records.ts) read a SHA-256 in hex: 64 digits.
    hash: "5e1f0c2a9b7d".padEnd(64, "0"),
    engineVersion: "0.1.0",
    reason: "First issue of the shell check for review.",
    requiredApprovals: 1,
    submittedBy: EDA,
    submittedAt: "2026-12-01T10:00:00.000Z",
    approvals: [],
    returned: null,
    approvedAt: null,
    scope: null,
    ...over,
  });

  beforeAll(async () => {
    team = await browserTeam(world.browser, world.server.url);
    const api = (rest: string) =>
      team.contexts.owner.request
        .get(`${world.server.url}/api${team.projectPath}${rest}`)
        .then((r) => r.json());
    const exported = await api("/export");
    const { paging: _paging, ...comparison } = await api("/comparison?page=1&limit=1000");
    hydroRow = (comparison.rows as { rowId: string; caseName: string }[]).find(
      (r) => r.caseName === "Hydrostatic test",
    )!.rowId;
    content = {
      format: "sigmacube.record",
      contentVersion: 1,
      engine: { name: "sigmacube-core", version: "0.1.0" },
      takenAt: "2026-12-01T10:00:00.000Z",
      project: { id: team.projectId, workspaceId: team.workspaceId, version: 1 },
      inputs: exported,
      ids: { materials: {}, locations: {}, loadCases: {} },
      stateRevisions: [],
      results: comparison,
    };
    for (const context of Object.values(team.contexts)) await context.route("**/api/**", answer);
  }, 90_000);

  /** The stand-in: answers the review and record routes, lets everything else through to the real API. */
  async function answer(route: Route) {
    const request = route.request();
    const url = new URL(request.url());
    const base = `/api${team.projectPath}`;
    if (!url.pathname.startsWith(`${base}/review`) && !url.pathname.startsWith(`${base}/records`))
      return route.fallback();
    const rest = url.pathname.slice(base.length);
    const json = (status: number, body: unknown) =>
      route.fulfill({ status, contentType: "application/json", body: JSON.stringify(body) });
    const method = request.method();
    if (method !== "GET") fake.sent.push({ method, path: rest, body: request.postDataJSON() });
    const detail = (id: string) => {
      const record = fake.records.find((r) => r.id === id)!;
      return {
        ...record,
        content,
        comments: fake.comments,
        events: [
          {
            status: "submitted",
            action: "submit",
            by: record.submittedBy,
            at: record.submittedAt,
            note: record.reason,
          },
        ],
      };
    };
    if (rest === "/review") return json(200, fake.review);
    if (rest === "/records" && method === "GET") return json(200, { records: fake.records });
    if (rest === "/records" && method === "POST")
      return json(201, summary({ id: RECORD_2, number: 2, reason: request.postDataJSON().reason }));
    const [, , id, action] = rest.split("/");
    if (!action) return json(200, detail(id));
    if (action === "diff") {
      if (id === RECORD_1)
        return json(404, { error: { id: "not_found", message: "No record before this one." } });
      return json(200, {
        from: fake.records.find((r) => r.id === RECORD_1),
        to: fake.records.find((r) => r.id === RECORD_2),
        inputs: {
          added: [],
          changed: [
            {
              kind: "state",
              label: "Hydrostatic test at mid-shell",
              field: "σx",
              from: "165 MPa",
              to: "175 MPa",
            },
          ],
          removed: [],
        },
        verdictChanges: [
          {
            rowId: hydroRow,
            caseName: "Hydrostatic test",
            locationName: "mid-shell",
            criterion: "tresca",
            from: { verdict: "close", factor: 1.58 },
            to: { verdict: "fail", factor: 1.49 },
          },
        ],
      });
    }
    if (action === "comments") {
      const body = request.postDataJSON();
      const comment = {
        id: commentId(fake.comments.length + 1),
        recordId: id,
        by: RUI,
        at: "2026-12-01T11:00:00.000Z",
        ...body,
      };
      fake.comments.push(comment);
      return json(201, comment);
    }
    if (action === "approve" && fake.approveAnswer)
      return json(fake.approveAnswer.status, fake.approveAnswer.body);
    return json(500, {
      error: { id: "unexpected", message: `the stand-in has no answer for ${method} ${rest}` },
    });
  }

  async function open(context: BrowserContext, rest: string, viewport?: { width: number; height: number }) {
    const page: Page = await context.newPage();
    if (viewport) await page.setViewportSize(viewport);
    page.setDefaultTimeout(10_000);
    await page.goto(`${world.server.url}${rest}`, { waitUntil: "networkidle" });
    return page;
  }

  const shot = (page: Page, name: string) =>
    page.screenshot({ path: path.join(screenshotDir, `review-screens-${name}.png`), fullPage: true });

  it("when an editor submits from the project page, then an empty reason is refused naming the field, and the reason is sent with the whole project as the scope", async () => {
    fake.review = {
      status: "returned",
      requiredApprovals: 1,
      revision: "A",
      latestRecord: summary({ status: "returned" }),
      lastApproved: null,
      currentDiffersFromApproved: null,
    };
    fake.records = [summary({ status: "returned" })];
    fake.sent = [];
    const page = await open(team.contexts.editor, team.projectPath);
    const status = page.getByRole("region", { name: "Review status" });
    await status.getByText("Returned with comments").waitFor();
    await status.getByText("Revision A · latest record 1 (revision A)").waitFor();
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByText("What changed and why: say what changed since the last record and why.").waitFor();
    expect(fake.sent).toEqual([]);
    await status.getByLabel("What changed and why").fill("  Hydrostatic test state corrected.  ");
    await status.getByRole("button", { name: "Submit for check" }).click();
    await status.getByText("Record 2 (revision A) is submitted for check.").waitFor();
    expect(fake.sent).toEqual([
      // Left on "The whole project", the form sends scope null (the contract's whole project).
      {
        method: "POST",
        path: "/records",
        body: { reason: "Hydrostatic test state corrected.", scope: null },
      },
    ]);
    await shot(page, "project-submitted");
  });

  it("when the results differ from the approved record, then the comparison says so, and a viewer is told who submits", async () => {
    const approved = summary({
      status: "approved",
      approvals: [{ by: RUI, at: "2026-12-02T09:00:00.000Z", comment: "" }],
    });
    fake.review = {
      status: "approved",
      requiredApprovals: 1,
      revision: "B",
      latestRecord: approved,
      lastApproved: approved,
      currentDiffersFromApproved: true,
    };
    const page = await open(team.contexts.viewer, `${team.projectPath}/comparison`);
    await page.getByText("The results shown differ from the last approved record.").waitFor();
    await page.getByText("Revision B · latest record 1 (revision A)").waitFor();
    await page.getByText("Only editors and owners submit a calculation for check.").waitFor();
    expect(await page.getByRole("button", { name: "Submit for check" }).count()).toBe(0);
    expect(await page.getByTestId("results-caution").count()).toBe(1);
  });

  it("when a reviewer opens a record, then the frozen rows, the diff with verdicts first, a row comment and an independence refusal in words all show", async () => {
    fake.records = [
      summary({ id: RECORD_2, number: 2, reason: "Hydrostatic test state corrected." }),
      summary({
        status: "superseded",
        returned: { by: RUI, at: "2026-12-01T12:00:00.000Z", comment: "Correct it." },
      }),
    ];
    fake.comments = [];
    fake.sent = [];
    fake.approveAnswer = {
      status: 403,
      body: {
        error: {
          id: "independence",
          message: "You last edited an input in this record; another checker approves it.",
        },
      },
    };
    const list = await open(team.contexts.reviewer, `${team.projectPath}/records`);
    const rows = list.getByTestId("revision-table").locator("tbody tr");
    expect(await rows.count()).toBe(2);
    expect(await rows.nth(1).textContent()).toMatch(/Superseded.*returned .* by Rui Tanager/);
    await list.getByRole("link", { name: "Record 2, revision A" }).click();
    await list.getByRole("heading", { name: /Record 2 · revision A/, level: 1 }).waitFor();
    const page = list;

    await page
      .getByTestId("record-governing")
      .getByText(/^governs: /)
      .waitFor();
    const diff = page.getByTestId("record-diff");
    const lines = await diff.locator("li").allInnerTexts();
    expect(lines).toEqual([
      "Hydrostatic test at mid-shell, Tresca: close (SF 1.58) → fails (SF 1.49)",
      "State · Hydrostatic test at mid-shell — σx: 165 MPa → 175 MPa",
    ]);

    await page.getByRole("button", { name: "Comment on Hydrostatic test at mid-shell" }).click();
    await page.getByRole("button", { name: "Add comment" }).first().click();
    await page.getByText("Comment: write what the originator should look at.").waitFor();
    await page.getByLabel("Comment on Hydrostatic test at mid-shell", { exact: true }).fill("Which gauge?");
    await page.getByRole("button", { name: "Add comment" }).first().click();
    await page.getByRole("button", { name: "1 comment on Hydrostatic test at mid-shell" }).waitFor();
    expect(fake.sent[0]).toEqual({
      method: "POST",
      path: `/records/${RECORD_2}/comments`,
      body: { text: "Which gauge?", rowId: hydroRow, replyTo: null },
    });

    await page.getByRole("button", { name: "Approve" }).click();
    await page.getByRole("button", { name: "Approve this record" }).click();
    await page
      .getByText("Not independent: You last edited an input in this record; another checker approves it.")
      .waitFor();
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    await shot(page, "record-reviewer");
  });

  it("when a viewer opens a record at phone width, then nothing is offered to write, the page does not scroll sideways and axe finds nothing serious", async () => {
    fake.records = [
      summary({
        id: RECORD_2,
        number: 2,
        requiredApprovals: 2,
        approvals: [{ by: RUI, at: "2026-12-02T09:00:00.000Z", comment: "Checked." }],
      }),
      summary({
        status: "superseded",
        returned: { by: RUI, at: "2026-12-01T12:00:00.000Z", comment: "Correct it." },
      }),
    ];
    fake.comments = [
      {
        id: commentId(1),
        recordId: RECORD_2,
        rowId: hydroRow,
        replyTo: null,
        text: "Which gauge?",
        by: RUI,
        at: "2026-12-01T11:00:00.000Z",
      },
      {
        id: commentId(2),
        recordId: RECORD_2,
        rowId: hydroRow,
        replyTo: commentId(1),
        text: "Gauge G-2.",
        by: EDA,
        at: "2026-12-01T11:30:00.000Z",
      },
      {
        id: commentId(3),
        recordId: RECORD_2,
        rowId: null,
        replyTo: null,
        text: "State the test pressure's source.",
        by: RUI,
        at: "2026-12-01T11:10:00.000Z",
      },
    ];
    const page = await open(team.contexts.viewer, `${team.projectPath}/records/${RECORD_2}`, {
      width: 390,
      height: 844,
    });
    await page.getByRole("heading", { name: /Record 2/, level: 1 }).waitFor();
    await page.getByText("Only reviewers and owners return a record with comments or approve it.").waitFor();
    expect(
      await page.getByRole("button", { name: /^(Approve|Return with comments|Add comment)$/ }).count(),
    ).toBe(0);
    expect(
      await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth),
    ).toBe(0);
    await page.getByRole("button", { name: "2 comments on Hydrostatic test at mid-shell" }).click();
    await page.getByRole("list", { name: "Answers" }).getByText("Gauge G-2.").waitFor();
    await shot(page, "record-viewer-phone");
    const found: string[] = [];
    for (const address of [
      `${team.projectPath}/records/${RECORD_2}`,
      `${team.projectPath}/records`,
      team.projectPath,
    ]) {
      await page.goto(`${world.server.url}${address}`, { waitUntil: "networkidle" });
      await page.locator("main h1").first().waitFor();
      const results = await new AxeBuilder({ page })
        .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
        .analyze();
      for (const v of results.violations)
        if (v.impact === "serious" || v.impact === "critical")
          found.push(`${address}: ${v.id} (${v.nodes.map((n) => n.target.join(" ")).join(", ")})`);
    }
    expect(found).toEqual([]);
  });
});
