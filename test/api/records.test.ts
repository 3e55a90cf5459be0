import { QueryTypes } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  projectReviewSchema,
  recordDetailSchema,
  recordDiffSchema,
  recordSummarySchema,
  type RecordContent,
} from "../../core/contract/records";
import { approvedDifferenceComputations } from "../../api/domain/records/approved-difference";
import { canonicalJson, recordHash } from "../../api/domain/records/content";
import { Membership } from "../../db/models/membership";
import * as recordsMigration from "../../db/migrations/20261203-1440-create-calculation-records";
import * as auditActions from "../../db/migrations/20261203-1441-audit-record-actions";
import { buildTestApp } from "../support/app";
import { signUp, type TestAccount } from "../support/accounts";
import { mailCount, waitForMail } from "../support/mailbox";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

/**
 * The review of a calculation: submit → comment → return → answer → change → resubmit → diff →
 * approve (one, then two approvals), and the frozen record staying as it was afterwards.
 *
 * The stress values are chosen so the verdict visibly changes: at σxx = 120, σyy = 60 MPa the
 * von Mises stress is √(120² − 120·60 + 60²) ≈ 103.9 MPa (formula), a factor of about 2.4 on a
 * 250 MPa yield, which passes 1.5; at σxx = 300 MPa it is √(300² − 300·60 + 60²) ≈ 275 MPa, a
 * factor below 1, which fails (formula; plane-stress von Mises, common practice, no source).
 */

const { app, context, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let checker2: TestAccount;
let base: string;
let projectId: string;
let locationIds: string[];
let loadCaseId: string;
let materialId: string;
const records: string[] = [];

const stateAt = async (who: TestAccount, locationId: string, xx: number) => {
  const current = (await who.agent.get(`${base}/load-cases/${loadCaseId}`).expect(200)).body.loadCase;
  await who.agent
    .put(`${base}/load-cases/${loadCaseId}/states/${locationId}`)
    .send({ version: current.version, stress: mpa(xx, 60) })
    .expect(200);
};

const review = async () =>
  projectReviewSchema.parse((await team.viewer.agent.get(`${base}/review`).expect(200)).body);

beforeAll(async () => {
  team = await projectTeam(app);
  checker2 = await signUp(app, { name: "Second Checker" });
  await Membership.create({
    workspaceId: team.workspaceId,
    userId: checker2.user.id,
    role: "reviewer",
    joinedVia: "seed",
  });
  const material = await team.editor.agent
    .post(wsPath(team, "/materials"))
    .send({ name: "Plate 250", yield: 250, reference: "mill certificate 4711" })
    .expect(201);
  materialId = material.body.material.id;
  const made = await projectWithLocations(
    team,
    {
      name: "Records vessel",
      requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
      defaultMaterial: { kind: "workspace", id: materialId },
    },
    ["shell", "nozzle"],
  );
  projectId = made.projectId;
  locationIds = made.locationIds;
  base = wsPath(team, `/projects/${projectId}`);
  const created = await team.editor.agent
    .post(`${base}/load-cases`)
    .send({
      name: "Design",
      states: [
        { locationId: locationIds[0], stress: mpa(120, 60) },
        { locationId: locationIds[1], stress: mpa(90, 30) },
      ],
    })
    .expect(201);
  loadCaseId = created.body.loadCase.id;
});

describe("submitting, commenting, returning and resubmitting a record", () => {
  it("when nothing was submitted, then the review is in work at revision A with nothing approved", async () => {
    expect(await review()).toMatchObject({
      status: "in-work",
      revision: "A",
      requiredApprovals: 1,
      latestRecord: null,
      lastApproved: null,
      currentDiffersFromApproved: null,
    });
  });

  it("when the reason is empty, then submitting answers 400 naming reason and stores nothing", async () => {
    const response = await team.editor.agent.post(`${base}/records`).send({ reason: "  " }).expect(400);
    expect(response.body.error.details.map((d: { path: string }) => d.path)).toContain("reason");
    expect((await team.viewer.agent.get(`${base}/records`).expect(200)).body.records).toEqual([]);
  });

  it("when an editor submits, then record 1 revision A is frozen with its hash and engine version, and reviewers and the owner are mailed", async () => {
    const editorMailBefore = await mailCount(app, team.editor.email);
    const response = await team.editor.agent
      .post(`${base}/records`)
      .send({ reason: "First issue of the shell check" })
      .expect(201);
    const summary = recordSummarySchema.parse(response.body);
    records.push(summary.id);
    expect(summary).toMatchObject({ number: 1, revision: "A", status: "submitted", requiredApprovals: 1 });
    expect(summary.submittedBy).toEqual({ id: team.editor.user.id, name: team.editor.user.name });
    const detail = recordDetailSchema.parse(
      (await team.viewer.agent.get(`${base}/records/${summary.id}`).expect(200)).body,
    );
    expect(recordHash(detail.content)).toBe(summary.hash);
    expect(detail.content.results.rows).toHaveLength(2);
    expect(detail.events).toMatchObject([
      { action: "submit", status: "submitted", note: "First issue of the shell check" },
    ]);
    for (const person of [team.reviewer, team.owner, checker2]) {
      const mail = await waitForMail(app, person.email, { subject: /submitted for check/ });
      expect(mail.subject).toContain("Records vessel");
      expect(mail.subject).toContain("record 1, revision A");
      expect(mail.text).toContain(`/workspaces/${team.workspaceId}/projects/${projectId}`);
    }
    expect(await mailCount(app, team.editor.email)).toBe(editorMailBefore);
    expect(await review()).toMatchObject({ status: "submitted", revision: "A" });
  });

  it("when another record is submitted while one waits for a check, then the answer is 409", async () => {
    const response = await team.editor2.agent.post(`${base}/records`).send({ reason: "again" }).expect(409);
    expect(response.body.error.id).toBe("record_pending");
  });

  it("when a reviewer comments on the record and on one of its rows, then both comments are kept; an unknown row is a 400 naming rowId", async () => {
    const rowId = `case:${loadCaseId}:${locationIds[0]}`;
    const whole = await team.reviewer.agent
      .post(`${base}/records/${records[0]}/comments`)
      .send({ text: "Where does the yield of Plate 250 come from?" })
      .expect(201);
    expect(whole.body).toMatchObject({ rowId: null, replyTo: null, by: { id: team.reviewer.user.id } });
    const onRow = await team.reviewer.agent
      .post(`${base}/records/${records[0]}/comments`)
      .send({ text: "The shell membrane stress looks low.", rowId })
      .expect(201);
    expect(onRow.body.rowId).toBe(rowId);
    const wrong = await team.reviewer.agent
      .post(`${base}/records/${records[0]}/comments`)
      .send({ text: "x", rowId: `case:${loadCaseId}:${projectId}` })
      .expect(400);
    expect(wrong.body.error.details).toEqual([{ path: "rowId", message: expect.any(String) }]);
    const badReply = await team.reviewer.agent
      .post(`${base}/records/${records[0]}/comments`)
      .send({ text: "x", replyTo: projectId })
      .expect(400);
    expect(badReply.body.error.details[0].path).toBe("replyTo");
    await team.viewer.agent.post(`${base}/records/${records[0]}/comments`).send({ text: "x" }).expect(403);
  });

  it("when the submitter tries to return their own record, then it is refused for independence; an editor may not return at all", async () => {
    // The owner submits nothing here; the editor is both the submitter and below the checker roles.
    const own = await team.editor.agent
      .post(`${base}/records/${records[0]}/return`)
      .send({ comment: "mine" })
      .expect(403);
    expect(own.body.error.message).toMatch(/reviewers and owners/);
    const empty = await team.reviewer.agent
      .post(`${base}/records/${records[0]}/return`)
      .send({ comment: "" })
      .expect(400);
    expect(empty.body.error.details[0].path).toBe("comment");
  });

  it("when a reviewer returns it, then it is returned, signed and dated, audited, and the originator is mailed", async () => {
    const response = await team.reviewer.agent
      .post(`${base}/records/${records[0]}/return`)
      .send({ comment: "Please check the shell state against the FE result." })
      .expect(200);
    const summary = recordSummarySchema.parse(response.body);
    expect(summary.status).toBe("returned");
    expect(summary.returned).toMatchObject({
      by: { id: team.reviewer.user.id },
      comment: "Please check the shell state against the FE result.",
    });
    const mail = await waitForMail(app, team.editor.email, { subject: /returned with comments/ });
    expect(mail.text).toContain("Please check the shell state against the FE result.");
    const audit = (await team.viewer.agent.get(wsPath(team, `/audit?entityId=${records[0]}`)).expect(200))
      .body;
    expect(audit.events.map((e: { action: string }) => e.action)).toEqual(["return", "submit"]);
    expect(await review()).toMatchObject({ status: "returned", revision: "A" });
    // Returned already: a second decision is a conflict.
    await team.owner.agent.post(`${base}/records/${records[0]}/approve`).send({}).expect(409);
    await team.owner.agent.post(`${base}/records/${records[0]}/comments`).send({ text: "late" }).expect(409);
  });

  it("when the originator answers a comment on the returned record, then the answer points at it", async () => {
    const detail = recordDetailSchema.parse(
      (await team.editor.agent.get(`${base}/records/${records[0]}`).expect(200)).body,
    );
    const rowComment = detail.comments.find((c) => c.rowId !== null)!;
    const answer = await team.editor.agent
      .post(`${base}/records/${records[0]}/comments`)
      .send({ text: "Corrected to the FE value, 300 MPa.", replyTo: rowComment.id })
      .expect(201);
    expect(answer.body).toMatchObject({ replyTo: rowComment.id, by: { id: team.editor.user.id } });
  });

  it("when a state is changed and the project resubmitted, then record 2 keeps revision A, record 1 is superseded, and the diff shows the state and the verdict change", async () => {
    await stateAt(team.editor, locationIds[0], 300);
    const response = await team.editor.agent
      .post(`${base}/records`)
      .send({ reason: "Shell state from the FE result" })
      .expect(201);
    const summary = recordSummarySchema.parse(response.body);
    records.push(summary.id);
    expect(summary).toMatchObject({ number: 2, revision: "A", status: "submitted" });
    const list = (await team.viewer.agent.get(`${base}/records`).expect(200)).body.records;
    expect(list.map((r: { number: number; status: string }) => [r.number, r.status])).toEqual([
      [2, "submitted"],
      [1, "superseded"],
    ]);
    const diff = recordDiffSchema.parse(
      (await team.reviewer.agent.get(`${base}/records/${summary.id}/diff`).expect(200)).body,
    );
    expect(diff.from.id).toBe(records[0]);
    expect(diff.inputs.changed).toContainEqual({
      kind: "state",
      label: "Design at shell",
      field: "σxx",
      from: "120 MPa",
      to: "300 MPa",
    });
    expect(diff.inputs.added).toEqual([]);
    expect(diff.inputs.removed).toEqual([]);
    expect(diff.verdictChanges).toEqual([
      {
        rowId: `case:${loadCaseId}:${locationIds[0]}`,
        caseName: "Design",
        locationName: "shell",
        criterion: "von-mises",
        from: { verdict: "pass", factor: expect.any(Number) },
        to: { verdict: "fail", factor: expect.any(Number) },
      },
    ]);
    expect(diff.verdictChanges[0].from!.factor).toBeCloseTo(
      250 / Math.sqrt(120 ** 2 - 120 * 60 + 60 ** 2),
      6,
    );
    expect(diff.verdictChanges[0].to!.factor).toBeCloseTo(250 / Math.sqrt(300 ** 2 - 300 * 60 + 60 ** 2), 6);
  });

  it("when the first record's diff is asked without another to compare with, then the answer is 404", async () => {
    await team.viewer.agent.get(`${base}/records/${records[0]}/diff`).expect(404);
  });
});

describe("approving a record", () => {
  it("when an editor approves, then it is refused: only reviewers and owners sign records off", async () => {
    const editor = await team.editor2.agent
      .post(`${base}/records/${records[1]}/approve`)
      .send({})
      .expect(403);
    expect(editor.body.error).toMatchObject({
      id: "forbidden",
      message: expect.stringMatching(/reviewers and owners/),
    });
  });

  it("when a reviewer approves, then the record and the project are approved, the originator is mailed, and nothing differs from the approved record", async () => {
    const response = await team.reviewer.agent
      .post(`${base}/records/${records[1]}/approve`)
      .send({ comment: "Checked against the FE result." })
      .expect(200);
    const summary = recordSummarySchema.parse(response.body);
    expect(summary.status).toBe("approved");
    expect(summary.approvals).toMatchObject([
      { by: { id: team.reviewer.user.id }, comment: "Checked against the FE result." },
    ]);
    expect(summary.approvedAt).not.toBeNull();
    await waitForMail(app, team.editor.email, { subject: /is approved/ });
    expect(await review()).toMatchObject({
      status: "approved",
      revision: "A",
      currentDiffersFromApproved: false,
      lastApproved: { id: records[1] },
    });
    const again = await team.reviewer.agent
      .post(`${base}/records/${records[1]}/approve`)
      .send({})
      .expect(409);
    expect(again.body.error.id).toBe("already_approved");
  });

  it("when the review status is read again with nothing changed, then the project's content is not taken again; when a state is edited, then it is, and the status says the results differ", async () => {
    expect((await review()).currentDiffersFromApproved).toBe(false);
    const before = approvedDifferenceComputations();
    expect(await review()).toMatchObject({ status: "approved", currentDiffersFromApproved: false });
    expect(await review()).toMatchObject({ status: "approved", currentDiffersFromApproved: false });
    expect(approvedDifferenceComputations()).toBe(before);

    await stateAt(team.editor, locationIds[0], 310);
    expect(await review()).toMatchObject({
      status: "in-work",
      revision: "B",
      currentDiffersFromApproved: true,
    });
    expect(approvedDifferenceComputations()).toBe(before + 1);
    expect((await review()).currentDiffersFromApproved).toBe(true);
    expect(approvedDifferenceComputations()).toBe(before + 1);
  });

  it("when the owner requires two approvals and edits an input, then the owner cannot approve the next record, and it needs two other checkers", async () => {
    const bad = await team.owner.agent.patch(`${base}/review`).send({ requiredApprovals: 3 }).expect(400);
    expect(bad.body.error.details[0].path).toBe("requiredApprovals");
    await team.editor.agent.patch(`${base}/review`).send({ requiredApprovals: 2 }).expect(403);
    expect(
      (await team.owner.agent.patch(`${base}/review`).send({ requiredApprovals: 2 }).expect(200)).body,
    ).toMatchObject({
      requiredApprovals: 2,
    });
    await stateAt(team.owner, locationIds[1], 100);
    expect(await review()).toMatchObject({
      status: "in-work",
      revision: "B",
      currentDiffersFromApproved: true,
    });
    const submitted = recordSummarySchema.parse(
      (await team.editor.agent.post(`${base}/records`).send({ reason: "Nozzle load raised" }).expect(201))
        .body,
    );
    records.push(submitted.id);
    expect(submitted).toMatchObject({ number: 3, revision: "B", requiredApprovals: 2 });
    const owner = await team.owner.agent.post(`${base}/records/${submitted.id}/approve`).send({}).expect(403);
    expect(owner.body.error.id).toBe("independence");
    expect(owner.body.error.message).toMatch(/last to edit inputs of this record.*nozzle/);
    const first = await team.reviewer.agent
      .post(`${base}/records/${submitted.id}/approve`)
      .send({})
      .expect(200);
    expect(first.body).toMatchObject({
      status: "submitted",
      approvals: [{ by: { id: team.reviewer.user.id } }],
    });
    const second = await checker2.agent.post(`${base}/records/${submitted.id}/approve`).send({}).expect(200);
    expect(second.body.status).toBe("approved");
    expect(second.body.approvals).toHaveLength(2);
    // The earlier approved record stays approved.
    const list = (await team.viewer.agent.get(`${base}/records`).expect(200)).body.records;
    expect(list.map((r: { number: number; status: string }) => [r.number, r.status])).toEqual([
      [3, "approved"],
      [2, "approved"],
      [1, "superseded"],
    ]);
  });

  it("when the owner submits and then tries to approve their own record, then it is refused for independence", async () => {
    await stateAt(team.editor, locationIds[1], 110);
    const own = recordSummarySchema.parse(
      (await team.owner.agent.post(`${base}/records`).send({ reason: "Owner's own issue" }).expect(201)).body,
    );
    records.push(own.id);
    const refused = await team.owner.agent.post(`${base}/records/${own.id}/approve`).send({}).expect(403);
    expect(refused.body.error).toMatchObject({
      id: "independence",
      message: expect.stringMatching(/You submitted this record/),
    });
    const returnOwn = await team.owner.agent
      .post(`${base}/records/${own.id}/return`)
      .send({ comment: "x" })
      .expect(403);
    expect(returnOwn.body.error.id).toBe("independence");
    await team.reviewer.agent
      .post(`${base}/records/${own.id}/return`)
      .send({ comment: "Not needed." })
      .expect(200);
  });
});

describe("a frozen record after the project changes", () => {
  it("when the project, a library material and the allowables are edited, then the approved record reads back byte for byte with its hash, and the review says the current project differs", async () => {
    const before = (await team.viewer.agent.get(`${base}/records/${records[2]}`).expect(200)).body;
    const frozenText = canonicalJson(before.content);
    const project = (await team.editor.agent.get(base).expect(200)).body.project;
    await team.editor.agent
      .patch(base)
      .send({ version: project.version, name: "Records vessel, renamed" })
      .expect(200);
    const renamed = (await team.editor.agent.get(base).expect(200)).body.project;
    await team.editor.agent
      .patch(base)
      .send({ version: renamed.version, requirements: [{ criterion: "von-mises", requiredFactor: 2 }] })
      .expect(200);
    const material = (await team.editor.agent.get(wsPath(team, `/materials/${materialId}`)).expect(200)).body
      .material;
    await team.editor.agent
      .patch(wsPath(team, `/materials/${materialId}`))
      .send({ version: material.version, yield: 200 })
      .expect(200);
    const after = (await team.viewer.agent.get(`${base}/records/${records[2]}`).expect(200)).body;
    expect(canonicalJson(after.content)).toBe(frozenText);
    expect(recordHash(after.content as RecordContent)).toBe(before.hash);
    expect(after.hash).toBe(before.hash);
    expect((after.content as RecordContent).inputs.materials[0].yieldPa).toBe(250e6);
    expect(await review()).toMatchObject({
      currentDiffersFromApproved: true,
      lastApproved: { id: records[2] },
    });
  });

  it("when a statement tries to change a record's content or hash in the database, then the trigger refuses it", async () => {
    await expect(
      context.sequelize.query(`update calculation_records set content = '{}'::jsonb where id = $1`, {
        bind: [records[2]],
        type: QueryTypes.UPDATE,
      }),
    ).rejects.toThrow(/frozen/);
    await expect(
      context.sequelize.query(`update calculation_records set hash = repeat('0', 64) where id = $1`, {
        bind: [records[2]],
        type: QueryTypes.UPDATE,
      }),
    ).rejects.toThrow(/frozen/);
  });

  it("when another project's record id is asked under this project, then the answer is 404", async () => {
    const other = await projectWithLocations(team, { name: "Other vessel" }, ["head"]);
    const otherBase = wsPath(team, `/projects/${other.projectId}`);
    await team.viewer.agent.get(`${otherBase}/records/${records[0]}`).expect(404);
    await team.reviewer.agent.post(`${otherBase}/records/${records[0]}/approve`).send({}).expect(404);
    await team.viewer.agent.get(`${base}/records/${records[1]}/diff?against=${other.projectId}`).expect(404);
    await team.outsider.agent.get(`${base}/records`).expect(404);
  });
});

describe("the migrations that add calculation records", () => {
  it("when they are undone and applied again, then the tables and the audit actions go and come back, and the frozen-content trigger works again (up → down → up)", async () => {
    const sequelize = context.sequelize;
    const rollback = new Error("roll back the schema test");
    const seen: unknown[] = [];
    await expect(
      sequelize.transaction(async (transaction) => {
        const migrationContext = { queryInterface: sequelize.getQueryInterface(), sequelize, transaction };
        const tables = async () =>
          (
            await sequelize.query<{ table_name: string }>(
              `select table_name from information_schema.tables where table_name like 'record%' or table_name = 'calculation_records' order by table_name`,
              { transaction, type: QueryTypes.SELECT },
            )
          ).map((t) => t.table_name);
        await auditActions.down(migrationContext);
        await recordsMigration.down(migrationContext);
        seen.push(await tables());
        await recordsMigration.up(migrationContext);
        await auditActions.up(migrationContext);
        seen.push(await tables());
        const [project] = await sequelize.query<{ id: string }>(
          `insert into projects (workspace_id, name, requirements) values ($1, 'Migration check', '[]') returning id`,
          { bind: [team.workspaceId], transaction, type: QueryTypes.SELECT },
        );
        await sequelize.query(
          `insert into calculation_records (project_id, workspace_id, number, revision, status, reason, content, hash,
             engine_version, required_approvals, submitted_by_name, submitted_at)
           values ($1, $2, 1, 'A', 'submitted', 'r', '{}'::jsonb, repeat('a', 64), 'x', 1, 'Someone', now())`,
          { bind: [project.id, team.workspaceId], transaction },
        );
        await sequelize.query(`savepoint before_update`, { transaction });
        try {
          await sequelize.query(`update calculation_records set reason = 'changed' where project_id = $1`, {
            bind: [project.id],
            transaction,
          });
          seen.push("updated");
        } catch (error) {
          seen.push((error as Error).message);
          await sequelize.query(`rollback to savepoint before_update`, { transaction });
        }
        await sequelize.query(`update calculation_records set status = 'returned' where project_id = $1`, {
          bind: [project.id],
          transaction,
        });
        throw rollback;
      }),
    ).rejects.toBe(rollback);
    expect(seen[0]).toEqual([]);
    expect(seen[1]).toEqual(["calculation_records", "record_approvals", "record_comments", "record_events"]);
    expect(seen[2]).toMatch(/frozen/);
  });
});

describe("freezing while the project is being edited", () => {
  it("when states are saved while a record is submitted, then the frozen inputs and the frozen comparison describe the same revisions", async () => {
    const made = await projectWithLocations(
      team,
      { name: "Busy vessel", defaultMaterial: { kind: "workspace", id: materialId } },
      ["a", "b", "c"],
    );
    const busy = wsPath(team, `/projects/${made.projectId}`);
    const created = await team.editor.agent
      .post(`${busy}/load-cases`)
      .send({
        name: "Operating",
        states: made.locationIds.map((locationId) => ({ locationId, stress: mpa(50, 10) })),
      })
      .expect(201);
    const caseId = created.body.loadCase.id as string;
    let version = created.body.loadCase.version as number;
    let saved = 0;
    const edits = (async () => {
      for (let i = 0; i < 12; i += 1) {
        const response = await team.editor2.agent
          .put(`${busy}/load-cases/${caseId}/states/${made.locationIds[i % 3]}`)
          .send({ version, stress: mpa(60 + i, 10) });
        if (response.status === 200) {
          version = response.body.loadCase.version;
          saved += 1;
        }
      }
    })();
    const submitted = await team.editor.agent.post(`${busy}/records`).send({ reason: "Busy" }).expect(201);
    await edits;
    const detail = recordDetailSchema.parse(
      (await team.viewer.agent.get(`${busy}/records/${submitted.body.id}`).expect(200)).body,
    );
    const { content } = detail;
    const locationId = (key: string) => content.ids.locations[key];
    for (const s of content.stateRevisions) {
      const row = content.results.rows.find(
        (r) => r.kind === "load-case" && r.locationId === locationId(s.location),
      )!;
      const input = content.inputs.loadCases[0].states.find((x) => x.location === s.location)!;
      // The comparison row was computed from the same revision the inputs hold, with the same numbers.
      expect(row.stateRevision).toBe(s.revision);
      expect(row.componentsPa.xx).toBe(input.componentsPa.xx);
    }
    expect(content.stateRevisions).toHaveLength(3);
    expect(saved).toBe(12);
  });
});
