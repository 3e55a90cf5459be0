import { QueryTypes } from "sequelize";
import { extractText } from "unpdf";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  projectReviewSchema,
  recordDetailSchema,
  recordDiffSchema,
  recordListSchema,
  recordSummarySchema,
  type RecordContent,
} from "../../core/contract/records";
import { findProject } from "../../api/domain/projects/scope";
import { buildRecordContent, recordHash } from "../../api/domain/records/content";
import { calculationHash } from "../../api/domain/records/same-calculation";
import * as scopeColumn from "../../db/migrations/20261203-2100-add-scope-to-calculation-records";
import { insertRecord, setRecordStatus } from "../../db/repositories/records";
import { buildTestApp } from "../support/app";
import { binaryBody } from "../support/binary-body";
import { linearWall } from "../support/linear-wall";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

/**
 * A record that covers a chosen set of load cases and locations (issue 14: "a project, or a chosen
 * set of its load cases and locations"): what it freezes, which case governs it, how it is named,
 * refused, compared and checked for independence, and what its report says.
 *
 * Every state is uniaxial (σxx only), so its von Mises stress is |σxx| (formula: von Mises of a
 * uniaxial stress equals the stress; common practice, no source) and a combination's stress is the
 * factored sum of its cases' σxx (linear superposition; common practice, no source). With a yield
 * of 250 MPa (300 MPa at the nozzle) the utilisation for a required factor n = 1.5 is 1.5·σ/Sy.
 *
 *                 shell (250)  nozzle (300)  skirt (250)
 *   Operating         60           50            40
 *   Design           100           80            70
 *   Upset            200          210           150
 *   Sustained = 1·Operating + 0.5·Design: shell 110, skirt 75  ← governs the scope below (110/250)
 *   Upset check = 1·Upset + 1·Operating: shell 260 ← governs the project (outside the scope: it combines Upset)
 *
 * The scope: Operating and Design at shell and skirt.
 */

const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let base: string;
let projectId: string;
let shell: string;
let nozzle: string;
let skirt: string;
const caseIds: Record<"Operating" | "Design" | "Upset", string> = { Operating: "", Design: "", Upset: "" };
let plateId: string;
let forgingId: string;
const records: string[] = [];

const SCOPE = () => ({
  loadCaseIds: [caseIds.Operating, caseIds.Design],
  locationIds: [shell, skirt],
});

async function setState(who: ProjectTeam["editor"], caseName: keyof typeof caseIds, at: string, xx: number) {
  const current = (await who.agent.get(`${base}/load-cases/${caseIds[caseName]}`).expect(200)).body.loadCase;
  await who.agent
    .put(`${base}/load-cases/${caseIds[caseName]}/states/${at}`)
    .send({ version: current.version, stress: mpa(xx, 0) })
    .expect(200);
}

const review = async () =>
  projectReviewSchema.parse((await team.viewer.agent.get(`${base}/review`).expect(200)).body);

const detail = async (recordId: string) =>
  recordDetailSchema.parse((await team.viewer.agent.get(`${base}/records/${recordId}`).expect(200)).body);

const errorPaths = (body: { error: { details?: { path: string }[] } }) =>
  (body.error.details ?? []).map((d) => d.path);

beforeAll(async () => {
  team = await projectTeam(app);
  const material = async (name: string, yieldMpa: number) =>
    (
      await team.editor.agent
        .post(wsPath(team, "/materials"))
        .send({ name, yield: yieldMpa, reference: `certificate of ${name}` })
        .expect(201)
    ).body.material.id as string;
  plateId = await material("Plate 250", 250);
  forgingId = await material("Forging 300", 300);
  const made = await projectWithLocations(
    team,
    {
      name: "Scoped vessel",
      requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
      defaultMaterial: { kind: "workspace", id: plateId },
    },
    ["shell"],
  );
  projectId = made.projectId;
  shell = made.locationIds[0];
  base = wsPath(team, `/projects/${projectId}`);
  const location = async (name: string, materialRef: unknown) =>
    (await team.editor.agent.post(`${base}/locations`).send({ name, material: materialRef }).expect(201)).body
      .location.id as string;
  nozzle = await location("nozzle", { kind: "workspace", id: forgingId });
  skirt = await location("skirt", null);
  const stresses: Record<keyof typeof caseIds, [number, number, number]> = {
    Operating: [60, 50, 40],
    Design: [100, 80, 70],
    Upset: [200, 210, 150],
  };
  for (const name of ["Operating", "Design", "Upset"] as const) {
    const [s, n, k] = stresses[name];
    const created = await team.editor.agent
      .post(`${base}/load-cases`)
      .send({
        name,
        category: name.toLowerCase(),
        states: [
          { locationId: shell, stress: mpa(s, 0) },
          { locationId: nozzle, stress: mpa(n, 0) },
          { locationId: skirt, stress: mpa(k, 0) },
        ],
      })
      .expect(201);
    caseIds[name] = created.body.loadCase.id;
  }
  const combination = async (name: string, terms: [keyof typeof caseIds, number][]) =>
    team.editor.agent
      .post(`${base}/combinations`)
      .send({ name, terms: terms.map(([c, factor]) => ({ loadCaseId: caseIds[c], factor })) })
      .expect(201);
  await combination("Sustained", [
    ["Operating", 1],
    ["Design", 0.5],
  ]);
  await combination("Upset check", [
    ["Upset", 1],
    ["Operating", 1],
  ]);
});

describe("what a whole-project record holds", () => {
  it("when every load case and location is chosen, then the content is the whole project's, without a scope and with the same calculation hash", async () => {
    const project = await findProject(team.workspaceId, projectId);
    const whole = await buildRecordContent(context.sequelize, project);
    const everything = await buildRecordContent(context.sequelize, project, undefined, {
      scope: {
        loadCaseIds: [caseIds.Upset, caseIds.Design, caseIds.Operating],
        locationIds: [skirt, nozzle, shell, shell],
      },
      unknownIds: "refuse",
    });
    expect("scope" in whole).toBe(false);
    expect("scope" in everything).toBe(false);
    // takenAt and exportedAt are the only fields that may differ between two takes (same-calculation.ts).
    expect(calculationHash(everything)).toBe(calculationHash(whole));
    expect(
      recordHash({
        ...everything,
        takenAt: whole.takenAt,
        inputs: { ...everything.inputs, exportedAt: whole.inputs.exportedAt },
      }),
    ).toBe(recordHash(whole));
    // The construction this file relies on: the whole project is governed OUTSIDE the scope.
    expect(whole.results.governingOverall).toMatchObject({ caseName: "Upset check", locationName: "shell" });
    expect(whole.results.rows).toHaveLength(3 * 3 + 2 * 3);
  });
});

describe("refusing a scope", () => {
  it("when a chosen id is not a live load case or location of this project, then submitting answers 400 naming scope.loadCaseIds.<i> / scope.locationIds.<i> and stores nothing", async () => {
    const other = await projectWithLocations(team, { name: "Other vessel" }, ["elsewhere"]);
    const response = await team.editor.agent
      .post(`${base}/records`)
      .send({
        reason: "Partial check",
        scope: { loadCaseIds: [caseIds.Design, other.locationIds[0]], locationIds: [other.locationIds[0]] },
      })
      .expect(400);
    expect(errorPaths(response.body).sort()).toEqual(["scope.loadCaseIds.1", "scope.locationIds.0"]);
    expect(
      recordListSchema.parse((await team.viewer.agent.get(`${base}/records`).expect(200)).body).records,
    ).toEqual([]);
  });

  it("when a list is empty or holds something other than a UUID, then the answer is 400 naming that field", async () => {
    const empty = await team.editor.agent
      .post(`${base}/records`)
      .send({ reason: "Partial check", scope: { loadCaseIds: [], locationIds: [shell] } })
      .expect(400);
    expect(errorPaths(empty.body)).toEqual(["scope.loadCaseIds"]);
    expect(empty.body.error.details[0].message).toBe("Choose at least one load case.");
    const notId = await team.editor.agent
      .post(`${base}/records`)
      .send({ reason: "Partial check", scope: { loadCaseIds: [caseIds.Design], locationIds: ["shell"] } })
      .expect(400);
    expect(errorPaths(notId.body)).toEqual(["scope.locationIds.0"]);
    expect((await team.viewer.agent.get(`${base}/records`).expect(200)).body.records).toEqual([]);
  });
});

describe("a record of chosen load cases and locations", () => {
  it("when the owner edits a state outside the scope and an editor submits the scope, then the record holds only the scope's inputs and rows, and its governing case is the scope's own", async () => {
    // The owner is now the last editor of Upset and of its state at the nozzle, both outside the scope.
    await setState(team.owner, "Upset", nozzle, 205);
    const response = await team.editor.agent
      .post(`${base}/records`)
      .send({
        reason: "Operating and design at the shell and skirt",
        // Duplicates collapse; the record lists the project's order, not the order chosen.
        scope: {
          loadCaseIds: [caseIds.Design, caseIds.Operating, caseIds.Design],
          locationIds: [skirt, shell],
        },
      })
      .expect(201);
    const summary = recordSummarySchema.parse(response.body);
    records.push(summary.id);
    const expectedScope = {
      loadCases: [
        { id: caseIds.Operating, name: "Operating" },
        { id: caseIds.Design, name: "Design" },
      ],
      locations: [
        { id: shell, name: "shell" },
        { id: skirt, name: "skirt" },
      ],
      projectLoadCases: 3,
      projectLocations: 3,
    };
    expect(summary.scope).toEqual(expectedScope);

    const { content, hash } = await detail(summary.id);
    expect(recordHash(content)).toBe(hash);
    expect(content.scope).toEqual(expectedScope);
    expect(content.inputs.loadCases.map((c) => c.name)).toEqual(["Operating", "Design"]);
    expect(content.inputs.locations.map((l) => l.name)).toEqual(["shell", "skirt"]);
    expect(content.inputs.loadCases.flatMap((c) => c.states)).toHaveLength(4);
    expect(content.inputs.combinations.map((c) => c.name)).toEqual(["Sustained"]);
    // The forging is used only at the nozzle, outside the scope.
    expect(content.inputs.materials.map((m) => m.name)).toEqual(["Plate 250"]);
    expect(Object.values(content.ids.materials)).toEqual([plateId]);
    expect(Object.values(content.ids.loadCases).sort()).toEqual([caseIds.Operating, caseIds.Design].sort());
    expect(Object.values(content.ids.locations).sort()).toEqual([shell, skirt].sort());
    expect(content.stateRevisions).toHaveLength(4);

    const rowIds = content.results.rows.map((r) => r.rowId).sort();
    const sustained = content.results.rows.find((r) => r.caseName === "Sustained")!.caseId;
    expect(rowIds).toEqual(
      [
        ...[caseIds.Operating, caseIds.Design].flatMap((c) => [`case:${c}:${shell}`, `case:${c}:${skirt}`]),
        `combination:${sustained}:${shell}`,
        `combination:${sustained}:${skirt}`,
      ].sort(),
    );
    expect(content.results.governingByLocation.map((g) => g.locationName)).toEqual(["shell", "skirt"]);
    // Sustained at the shell: σ = 1·60 + 0.5·100 = 110 MPa, n = 250/110 (superposition and uniaxial von Mises).
    expect(content.results.governingOverall).toMatchObject({ caseName: "Sustained", locationName: "shell" });
    expect(content.results.governingOverall!.factor).toBeCloseTo(250 / 110, 9);
    expect(content.results.summary).toContain("Sustained");
    expect(JSON.stringify(content.results)).not.toContain("Upset");
    expect(JSON.stringify(content.results)).not.toContain("nozzle");

    const list = recordListSchema.parse((await team.viewer.agent.get(`${base}/records`).expect(200)).body);
    expect(list.records[0].scope).toEqual(expectedScope);
    const audit = (await team.viewer.agent.get(wsPath(team, `/audit?entityId=${summary.id}`)).expect(200))
      .body;
    expect(audit.events[0].summary).toContain("covering 2 of 3 load cases and 2 of 3 locations");
  });

  it("when the record's PDF is read, then it says it covers 2 of 3 load cases and 2 of 3 locations by name", async () => {
    const res = await team.viewer.agent
      .get(`${base}/records/${records[0]}/report.pdf`)
      .buffer(true)
      .parse(binaryBody as never)
      .expect(200);
    const { text } = await extractText(new Uint8Array(res.body as Buffer), { mergePages: true });
    const flat = text.replace(/\s+/g, " ");
    const sentence =
      "This record covers 2 of 3 load cases (Operating, Design) and 2 of 3 locations (shell, skirt); results outside it are not part of this record.";
    // Once on the cover and once in the scope section.
    expect(flat.split(sentence)).toHaveLength(3);
  });

  it("when the owner, who last edited only inputs outside the scope, approves, then independence lets them", async () => {
    const response = await team.owner.agent
      .post(`${base}/records/${records[0]}/approve`)
      .send({})
      .expect(200);
    expect(recordSummarySchema.parse(response.body).status).toBe("approved");
  });

  it("when a state outside the approved scope changes, then the project does not differ from the approved record; inside it, it does", async () => {
    expect((await review()).currentDiffersFromApproved).toBe(false);
    await setState(team.editor, "Design", nozzle, 85);
    await setState(team.editor, "Upset", shell, 190);
    expect(await review()).toMatchObject({ status: "approved", currentDiffersFromApproved: false });
    await setState(team.editor, "Design", shell, 120);
    expect(await review()).toMatchObject({ currentDiffersFromApproved: true });
  });

  it("when the project is resubmitted with another scope, then the diff lists the scope change first", async () => {
    const response = await team.editor.agent
      .post(`${base}/records`)
      .send({
        reason: "Upset added to the check",
        scope: { loadCaseIds: [...SCOPE().loadCaseIds, caseIds.Upset], locationIds: SCOPE().locationIds },
      })
      .expect(201);
    const summary = recordSummarySchema.parse(response.body);
    records.push(summary.id);
    // Every load case but not every location: the load cases are the whole project's now.
    expect(summary.scope?.loadCases.map((c) => c.name)).toEqual(["Operating", "Design", "Upset"]);
    const diff = recordDiffSchema.parse(
      (await team.reviewer.agent.get(`${base}/records/${summary.id}/diff`).expect(200)).body,
    );
    expect(diff.from.id).toBe(records[0]);
    expect(diff.inputs.changed[0]).toEqual({
      kind: "scope",
      label: "Scope",
      field: "load cases",
      from: "Operating, Design",
      to: "whole project",
    });
    expect(diff.inputs.changed.filter((c) => c.kind === "scope")).toHaveLength(1);
    expect(diff.inputs.added.map((a) => a.label)).toEqual(
      expect.arrayContaining(["Upset", "Upset at shell", "Upset at skirt", "Upset check"]),
    );
    expect(diff.inputs.changed).toContainEqual({
      kind: "state",
      label: "Design at shell",
      field: "σxx",
      from: "100 MPa",
      to: "120 MPa",
    });
  });

  it("when a whole-project record is submitted, then its summary's scope is null and its content has none", async () => {
    await team.reviewer.agent
      .post(`${base}/records/${records[1]}/return`)
      .send({ comment: "Check the whole vessel." })
      .expect(200);
    const response = await team.editor.agent
      .post(`${base}/records`)
      .send({ reason: "Whole vessel", scope: null })
      .expect(201);
    const summary = recordSummarySchema.parse(response.body);
    expect(summary.scope).toBeNull();
    const { content } = await detail(summary.id);
    expect("scope" in content).toBe(false);
    const diff = recordDiffSchema.parse(
      (await team.reviewer.agent.get(`${base}/records/${summary.id}/diff`).expect(200)).body,
    );
    expect(diff.inputs.changed[0]).toEqual({
      kind: "scope",
      label: "Scope",
      field: "locations",
      from: "shell, skirt",
      to: "whole project",
    });
  });
});

describe("a record approved before classification line ends were kept", () => {
  it("when the approved content lacks linearizationEnds and the project has a line, then the project does not differ from it until a state changes", async () => {
    const made = await projectWithLocations(
      team,
      { name: "Older record vessel", defaultMaterial: { kind: "published", id: "sa516-70" } },
      ["wall"],
    );
    const path = wsPath(team, `/projects/${made.projectId}`);
    const created = await team.editor.agent
      .post(`${path}/load-cases`)
      .send({ name: "Design", states: [{ locationId: made.locationIds[0], stress: mpa(100, 50) }] })
      .expect(201);
    const caseId = created.body.loadCase.id as string;
    await team.editor.agent
      .post(`${path}/load-cases/${caseId}/linearizations`)
      .send(linearWall(made.locationIds[0]))
      .expect(201);
    const project = await findProject(team.workspaceId, made.projectId);
    const now = await buildRecordContent(context.sequelize, project);
    expect(now.linearizationEnds).toHaveLength(1);
    // The record as a server before linearizationEnds froze it.
    const { linearizationEnds: _ends, ...older } = now;
    const stored = await insertRecord({
      projectId: made.projectId,
      workspaceId: team.workspaceId,
      number: 1,
      revision: "A",
      reason: "Frozen before line ends were kept",
      content: older,
      hash: recordHash(older as RecordContent),
      engineVersion: older.engine.version,
      requiredApprovals: 1,
      inputEditors: [],
      submittedBy: team.editor.user.id,
      submittedByName: team.editor.user.name,
      submittedAt: new Date(),
    });
    await setRecordStatus(stored.id, { status: "approved", approvedAt: new Date() });
    const reviewOf = async () =>
      projectReviewSchema.parse((await team.viewer.agent.get(`${path}/review`).expect(200)).body);
    expect(await reviewOf()).toMatchObject({ status: "approved", currentDiffersFromApproved: false });

    const current = (await team.editor.agent.get(`${path}/load-cases/${caseId}`).expect(200)).body.loadCase;
    await team.editor.agent
      .put(`${path}/load-cases/${caseId}/states/${made.locationIds[0]}`)
      .send({ version: current.version, stress: mpa(110, 50) })
      .expect(200);
    expect((await reviewOf()).currentDiffersFromApproved).toBe(true);
  });
});

describe("the OpenAPI document", () => {
  it("when the submit route is documented, then its body lists scope with both id lists, optional and null by default", async () => {
    const doc = (await team.viewer.agent.get("/api/openapi.json").expect(200)).body;
    const schema =
      doc.paths["/api/workspaces/{workspaceId}/projects/{projectId}/records"].post.requestBody.content[
        "application/json"
      ].schema;
    expect(schema.required ?? []).not.toContain("scope");
    expect(schema.properties.scope.default).toBeNull();
    expect(JSON.stringify(schema.properties.scope)).toContain("loadCaseIds");
    expect(JSON.stringify(schema.properties.scope)).toContain("locationIds");
  });
});

describe("the migration that adds the scope column", () => {
  it("when it is undone and applied again, then the column goes and comes back filled from each record's content, and cannot be written itself", async () => {
    const sequelize = context.sequelize;
    const rollback = new Error("roll back the schema test");
    const seen: unknown[] = [];
    const chosen = { loadCases: [], locations: [], projectLoadCases: 2, projectLocations: 1 };
    await expect(
      sequelize.transaction(async (transaction) => {
        const migrationContext = { queryInterface: sequelize.getQueryInterface(), sequelize, transaction };
        const scopeOf = async (id: string) =>
          (
            await sequelize.query<{ scope: unknown }>(`select scope from calculation_records where id = $1`, {
              bind: [id],
              transaction,
              type: QueryTypes.SELECT,
            })
          )[0].scope;
        const [record] = await sequelize.query<{ id: string }>(
          `insert into calculation_records (project_id, workspace_id, number, revision, status, reason, content, hash,
             engine_version, required_approvals, submitted_by_name, submitted_at)
           values ($1, $2, 99, 'A', 'returned', 'r', $3::jsonb, repeat('a', 64), 'x', 1, 'Someone', now()) returning id`,
          {
            bind: [projectId, team.workspaceId, JSON.stringify({ scope: chosen })],
            transaction,
            type: QueryTypes.SELECT,
          },
        );
        seen.push(await scopeOf(record.id));
        await scopeColumn.down(migrationContext);
        seen.push(
          (
            await sequelize.query(
              `select 1 from information_schema.columns where table_name = 'calculation_records' and column_name = 'scope'`,
              { transaction, type: QueryTypes.SELECT },
            )
          ).length,
        );
        await scopeColumn.up(migrationContext);
        seen.push(await scopeOf(record.id));
        await sequelize.query(`savepoint before_update`, { transaction });
        try {
          await sequelize.query(`update calculation_records set scope = null where id = $1`, {
            bind: [record.id],
            transaction,
          });
          seen.push("updated");
        } catch (error) {
          seen.push((error as Error).message);
        }
        throw rollback;
      }),
    ).rejects.toBe(rollback);
    expect(seen.slice(0, 3)).toEqual([chosen, 0, chosen]);
    expect(seen[3]).toMatch(/can only be updated to DEFAULT/);
  });
});
