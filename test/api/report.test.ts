import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import * as fontkit from "fontkit";
import { extractText } from "unpdf";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { RESULTS_CAUTION } from "../../core/contract/cautions";
import { formatFactor, governingSentence } from "../../core/contract/comparison";
import { recordContentSchema, type RecordContent } from "../../core/contract/records";
import {
  buildReportModel,
  DRAFT_WATERMARK,
  RESPONSIBILITY,
  VERIFY_CERTIFICATE_NOTE,
  type ReportMeta,
} from "../../core/report";
import { findProject } from "../../api/domain/projects/scope";
import { buildRecordContent } from "../../api/domain/records/content";
import { STAND_INS } from "../../api/domain/report/fonts";
import { renderReportPdf } from "../../api/domain/report/render-pdf";
import { buildTestApp } from "../support/app";
import { binaryBody } from "../support/binary-body";
import { linearWall } from "../support/linear-wall";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const require = createRequire(import.meta.url);
const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let projectId: string;
const base = () => wsPath(team, `/projects/${projectId}`);

/** The PDF's text page by page, with every run of white space as one space (lines wrap anywhere). */
async function pagesOf(pdf: Buffer | Uint8Array): Promise<string[]> {
  const { text } = await extractText(new Uint8Array(pdf), { mergePages: false });
  return text.map((page) => page.replace(/\s+/g, " "));
}
const flat = (text: string) => text.replace(/\s+/g, " ");

beforeAll(async () => {
  team = await projectTeam(app);
  const made = await projectWithLocations(
    team,
    { name: "Report vessel", defaultMaterial: { kind: "published", id: "sa516-70" } },
    ["Mid-shell", "Head junction"],
  );
  projectId = made.projectId;
  const [shell, head] = made.locationIds;
  const design = await team.editor.agent
    .post(`${base()}/load-cases`)
    .send({
      name: "Design pressure",
      category: "design",
      states: [
        { locationId: shell, stress: mpa(120, 60) },
        { locationId: head, stress: mpa(90, -30, 0, 40) },
      ],
    })
    .expect(201);
  const test = await team.editor.agent
    .post(`${base()}/load-cases`)
    .send({
      name: "Hydrostatic test",
      category: "test",
      states: [
        { locationId: shell, stress: mpa(160, 80) },
        { locationId: head, stress: mpa(150, -60, 0, 50) },
      ],
    })
    .expect(201);
  await team.editor.agent
    .post(`${base()}/combinations`)
    .send({
      name: "Design plus half test",
      terms: [
        { loadCaseId: design.body.loadCase.id, factor: 1 },
        { loadCaseId: test.body.loadCase.id, factor: 0.5 },
      ],
    })
    .expect(201);
});

describe("GET …/projects/{projectId}/report.pdf (the draft report)", () => {
  it("when a viewer asks, then a PDF attachment comes back whose every page carries the draft watermark, the draft's identifier, “page n of m” and the caution", async () => {
    const res = await team.viewer.agent
      .get(`${base()}/report.pdf`)
      .buffer(true)
      .parse(binaryBody as never)
      .expect(200);
    expect(res.headers["content-type"]).toMatch(/^application\/pdf/);
    expect(res.headers["content-disposition"]).toBe('attachment; filename="report-vessel-draft-report.pdf"');
    const body = res.body as Buffer;
    expect(body.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const pages = await pagesOf(body);
    expect(pages.length).toBeGreaterThan(3);
    pages.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toContain(DRAFT_WATERMARK);
      expect(page, `page ${i + 1}`).toContain("DRAFT of Report vessel");
      expect(page, `page ${i + 1}`).toContain(`page ${i + 1} of ${pages.length}`);
      expect(page, `page ${i + 1}`).toContain(flat(RESULTS_CAUTION));
    });
  });
});

const recordMeta: ReportMeta = {
  kind: "record",
  recordId: "5f0c4a52-8d7e-4c1b-9a37-2b6f1e0d9c44",
  number: "CR-0007",
  revision: "B",
  status: "approved",
  hash: "ab".repeat(32),
  revisions: [
    {
      number: "CR-0007",
      revision: "A",
      status: "returned with comments",
      reason: "First issue",
      submittedBy: "Ada Originator",
      submittedAt: "2026-11-30T09:00:00.000Z",
    },
    {
      number: "CR-0007",
      revision: "B",
      status: "approved",
      reason: "Head junction state corrected",
      submittedBy: "Ada Originator",
      submittedAt: "2026-12-01T10:30:00.000Z",
    },
  ],
  signatures: {
    originator: { name: "Ada Originator", at: "2026-12-01T10:30:00.000Z" },
    checkers: [{ name: "Chen Checker", at: "2026-12-02T08:15:00.000Z" }],
    approver: { name: "Priya Approver", at: "2026-12-02T16:45:00.000Z" },
  },
};

describe("the report's text (extracted from the PDF with unpdf)", () => {
  let content: RecordContent;
  let text: string;
  beforeAll(async () => {
    content = await buildRecordContent(context.sequelize, await findProject(team.workspaceId, projectId));
    text = (await pagesOf(await renderReportPdf(buildReportModel(content, { kind: "draft" })))).join(" ");
  });

  it("when the report is drawn, then it states the governing sentence of the comparison (governingSentence, the screens' words)", () => {
    expect(content.results.governingOverall).not.toBeNull();
    expect(text).toContain(`Governs: ${governingSentence(content.results.governingOverall!)}`);
  });

  it("when the report is drawn, then the comparison table has a line per row with the row's factor for every criterion", () => {
    expect(content.results.rows).toHaveLength(6);
    for (const row of content.results.rows) {
      const factors = row.checks.map((c) => {
        expect(c.status).toBe("evaluated");
        return c.status === "evaluated" ? `${formatFactor(c.factor).replace(".", "\\.")} \\S` : "";
      });
      expect(text).toMatch(new RegExp(`${row.caseName} ${row.locationName} ${factors.join(" ")}`));
    }
  });

  it("when the report is drawn, then it carries the caution and the engineer's responsibility, and names the published material's certificate check", () => {
    expect(text).toContain(flat(RESULTS_CAUTION));
    expect(text).toContain(flat(RESPONSIBILITY));
    expect(text).toContain(flat(VERIFY_CERTIFICATE_NOTE));
  });

  it("when the report is drawn, then both of the app's faces are embedded (Source Sans 3 for prose, JetBrains Mono for numbers), σ and τ come out as glyphs, and ≥ ✓ print as words only because no shipped file of either face has them", async () => {
    const pdf = await renderReportPdf(buildReportModel(content, { kind: "draft" }));
    // pdfkit writes each embedded subset as /BaseFont /XXXXXX+PostScriptName (ISO 32000-1 §9.6.4, subset tags).
    const baseFonts = new Set(pdf.toString("latin1").match(/\/BaseFont \/[A-Z]{6}\+[\w-]+/g));
    // Each weight under its own name: prose in regular and semibold (headings), numbers in regular.
    const postscriptNames = new Set([...baseFonts].map((f) => f.split("+")[1]));
    expect(postscriptNames).toContain("SourceSans3-Regular");
    expect(postscriptNames).toContain("SourceSans3-SemiBold");
    expect(postscriptNames).toContain("JetBrainsMono-Regular");
    expect(text).toContain("Shear components are tensor components (σxy = σyx)");
    expect(text).toContain("Maximum shear τmax");
    for (const ch of ["≥", "✓"]) {
      const shipped = [
        "@fontsource-variable/source-sans-3/files/source-sans-3-latin-wght-normal.woff2",
        "@fontsource-variable/source-sans-3/files/source-sans-3-greek-wght-normal.woff2",
        "@fontsource/jetbrains-mono/files/jetbrains-mono-latin-400-normal.woff",
        "@fontsource/jetbrains-mono/files/jetbrains-mono-greek-400-normal.woff",
      ].some((file) =>
        fontkit.create(readFileSync(require.resolve(file))).hasGlyphForCodePoint(ch.codePointAt(0)!),
      );
      expect(shipped, `a shipped file has ${ch}`).toBe(false);
    }
    expect(text).toContain("ordered σ1 >= σ2 >= σ3");
  });

  it("when the same content is drawn twice, then the text and the bytes are the same (dates from the content, nothing random)", async () => {
    const model = buildReportModel(content, { kind: "draft" });
    const [a, b] = [
      await renderReportPdf(model),
      await renderReportPdf(buildReportModel(content, { kind: "draft" })),
    ];
    expect(await pagesOf(a)).toEqual(await pagesOf(b));
    expect(a.equals(b)).toBe(true);
    const later = await renderReportPdf(
      buildReportModel({ ...content, takenAt: "2030-01-01T00:00:00.000Z" }, { kind: "draft" }),
    );
    expect(later.equals(a)).toBe(false);
  });

  it("when drawn for a frozen record, then every page names the record and its page, the cover carries the revision table and the signatures, and no page says draft", async () => {
    const pages = await pagesOf(await renderReportPdf(buildReportModel(content, recordMeta)));
    pages.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toContain(
        `Record CR-0007 rev. B · ${recordMeta.kind === "record" ? recordMeta.recordId : ""}`,
      );
      expect(page, `page ${i + 1}`).toContain(`page ${i + 1} of ${pages.length}`);
      expect(page, `page ${i + 1}`).not.toContain(DRAFT_WATERMARK);
    });
    const cover = pages[0];
    for (const expected of [
      "Originator Ada Originator 2026-12-01 10:30 UTC",
      "Checker Chen Checker 2026-12-02 08:15 UTC",
      "Approver Priya Approver 2026-12-02 16:45 UTC",
      "Head junction state corrected",
      "ab".repeat(32),
    ])
      expect(cover).toContain(expected);
  });
});

describe("GET …/projects/{projectId}/report-content", () => {
  it("when a viewer asks, then the draft's content comes back and validates against the record schema", async () => {
    const res = await team.viewer.agent.get(`${base()}/report-content`).expect(200);
    const content = recordContentSchema.parse(res.body);
    expect(content.project.id).toBe(projectId);
    expect(content.results.rows).toHaveLength(6);
  });

  it("when the project id is not a UUID, then the answer is a 400 naming projectId", async () => {
    for (const path of ["report-content", "report.pdf"]) {
      const res = await team.viewer.agent.get(wsPath(team, `/projects/not-an-id/${path}`)).expect(400);
      expect(JSON.stringify(res.body.error)).toContain("projectId");
    }
  });

  it("when someone outside the workspace asks, then the project is not revealed (404)", async () => {
    await team.outsider.agent.get(`${base()}/report.pdf`).expect(404);
  });
});

describe("GET …/records/{recordId}/report.pdf (a frozen record's report)", () => {
  it("when an approved record's report is read, then it carries the record id, the signatures and no draft mark, and stays byte for byte the same after the project is edited", async () => {
    const submitted = await team.editor.agent
      .post(`${base()}/records`)
      .send({ reason: "First issue for check" })
      .expect(201);
    const recordId: string = submitted.body.id;
    await team.reviewer.agent.post(`${base()}/records/${recordId}/approve`).send({}).expect(200);
    const path = `${base()}/records/${recordId}/report.pdf`;
    const before = await team.viewer.agent
      .get(path)
      .buffer(true)
      .parse(binaryBody as never)
      .expect(200);
    expect(before.headers["content-type"]).toMatch(/application\/pdf/);
    const pages = await pagesOf(before.body as Buffer);
    for (const page of pages) {
      expect(page).toContain(recordId);
      expect(page).not.toContain(DRAFT_WATERMARK);
    }
    expect(pages[0]).toContain("Editor One");
    expect(pages[0]).toContain("Reviewer");

    // Edit an input of the project after the approval: the frozen record's report must not move.
    const cases = (await team.editor2.agent.get(`${base()}/load-cases`).expect(200)).body.loadCases as {
      id: string;
      name: string;
      version: number;
    }[];
    const design = cases.find((c) => c.name === "Design pressure")!;
    const locations = (await team.editor2.agent.get(`${base()}/locations`).expect(200)).body.locations as {
      id: string;
    }[];
    await team.editor2.agent
      .put(`${base()}/load-cases/${design.id}/states/${locations[0].id}`)
      .send({ version: design.version, stress: mpa(240, 60) })
      .expect(200);
    const after = await team.viewer.agent
      .get(path)
      .buffer(true)
      .parse(binaryBody as never)
      .expect(200);
    expect(Buffer.compare(after.body as Buffer, before.body as Buffer)).toBe(0);
    // …while the draft does change with the edit (the record is not just a copy of the draft).
    const draft = flat(
      (
        await pagesOf(
          (
            await team.viewer.agent
              .get(`${base()}/report.pdf`)
              .buffer(true)
              .parse(binaryBody as never)
          ).body as Buffer,
        )
      ).join(" "),
    );
    expect(draft).toContain("240");
  });
});

describe("the report's sections beside the comparison: stress classification lines and point tables", () => {
  /** Three points in MPa (id; x y z; six components), the one with pure shear 100 MPa at (5, 6, 7). */
  const CSV =
    "id;x;y;z;xx;yy;zz;xy;yz;zx\n10;0;0;0;100;0;0;0;0;0\n20;5;6;7;0;0;0;100;0;0\n30;1;1;1;50;0;0;0;0;0\n";
  const sha256 = createHash("sha256").update(CSV).digest("hex");

  it("when the project has a saved line and a rated point table, then the PDF prints the line's classification and its checks with verdicts and sources, and the table's file, SHA-256, point count and governing point per criterion", async () => {
    const made = await projectWithLocations(
      team,
      {
        name: "Report nozzle FE",
        defaultMaterial: { kind: "published", id: "sa516-70" },
        requirements: [{ criterion: "tresca", requiredFactor: 1.5 }],
      },
      ["Nozzle"],
    );
    const path = wsPath(team, `/projects/${made.projectId}`);
    const hydro = await team.editor.agent
      .post(`${path}/load-cases`)
      .send({ name: "Hydrotest", category: "test" })
      .expect(201);
    const caseId = hydro.body.loadCase.id as string;
    const tables = `${path}/load-cases/${caseId}/point-tables`;
    const declared = await team.editor.agent
      .post(tables)
      .send({
        fileName: "n2.csv",
        sizeBytes: Buffer.byteLength(CSV),
        sha256,
        layout: { separator: ";", header: true },
        columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
        unit: "MPa",
      })
      .expect(201);
    await team.editor.agent
      .put(`${tables}/${declared.body.id}/content`)
      .set("Content-Type", "application/octet-stream")
      .send(Buffer.from(CSV))
      .expect(200);
    // A linear through-wall distribution σyy = 200 − 20·d MPa over a 10 mm wall (test/support/linear-wall.ts).
    await team.editor.agent
      .post(`${path}/load-cases/${caseId}/linearizations`)
      .send(linearWall(made.locationIds[0], "Nozzle wall, inside to outside"))
      .expect(201);

    const content = await buildRecordContent(
      context.sequelize,
      await findProject(team.workspaceId, made.projectId),
    );
    const [line] = content.results.linearizations!;
    const [table] = content.results.pointTables!;
    expect(content.pointTableFiles).toEqual([{ tableId: table.tableId, sha256 }]);

    const res = await team.viewer.agent
      .get(`${path}/report.pdf`)
      .buffer(true)
      .parse(binaryBody as never)
      .expect(200);
    const text = (await pagesOf(res.body as Buffer)).join(" ");
    expect(text).toContain("Stress classification lines");
    expect(text).toContain("Nozzle wall, inside to outside — Hydrotest");
    expect(text).toContain("Classification local membrane, primary");
    expect(line.checks.length).toBeGreaterThan(0);
    // ≤ and ≥ print as their stand-ins: no shipped file of either face has them (fonts.test.ts).
    const printed = (t: string) => flat(t).replace(/[≤≥∞✓]/g, (ch) => STAND_INS[ch]);
    for (const check of line.checks) {
      expect(text).toContain(printed(check.rule));
      expect(text).toContain(printed(check.source));
    }
    // The linear wall: membrane = the mean (σxx −1, σyy 100, σzz 50 MPa), M + B = the surface values
    // (σyy 200 at the start, 0 at the end), peak 0 (common practice, no source); von Mises of normal
    // stresses √(½[(σx−σy)² + (σy−σz)² + (σz−σx)²]) (recalled from memory).
    const vm = (x: number, y: number, z: number) =>
      Math.sqrt(0.5 * ((x - y) ** 2 + (y - z) ** 2 + (z - x) ** 2));
    const [ends] = content.linearizationEnds!;
    expect(ends).toMatchObject({ id: line.id, lengthUnit: "mm", pointCount: 11, start: [0], end: [10] });
    expect(ends.thickness).toBeCloseTo(10, 9);
    expect(ends.equivalent.membrane).toBeCloseTo(vm(-1, 100, 50), 6);
    expect(ends.equivalent.membranePlusBending.start).toBeCloseTo(vm(-1, 200, 50), 6);
    expect(ends.equivalent.membranePlusBending.end).toBeCloseTo(vm(-1, 0, 50), 6);
    expect(ends.equivalent.peak.start).toBeCloseTo(0, 6);
    expect(ends.equivalent.peak.end).toBeCloseTo(0, 6);
    expect(text).toContain("Line from d = 0 to d = 10 mm; thickness 10 mm; 11 points");
    expect(text).toContain(`Membrane (M) ${vm(-1, 100, 50).toFixed(1)} ${vm(-1, 100, 50).toFixed(1)}`);
    expect(text).toContain(
      `Membrane + bending (M + B) ${vm(-1, 200, 50).toFixed(1)} ${vm(-1, 0, 50).toFixed(1)}`,
    );
    expect(text).toContain("Peak 0.0 0.0");

    expect(text).toContain("Finite-element point tables");
    expect(text).toContain("File n2.csv");
    expect(text).toContain(`SHA-256 ${sha256}`);
    expect(text).toContain("Points 3");
    // Pure shear τ = 100 MPa: σ1 − σ3 = 2τ = 200 MPa governs Tresca (Mohr's circle, recalled from memory).
    expect(text).toMatch(/Tresca 20 \(5, 6, 7\)/);
  });
});
