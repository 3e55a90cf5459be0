import { afterAll, describe, expect, inject, it } from "vitest";
import { thinCylinder } from "../../core/calculators/thin-wall";
import { ct7Projects } from "../../core/demo-data/ct7-scenario";
import { ensureDatabase } from "../../db/ensure-database";
import { migrate } from "../../db/migrate";
import { AuditEvent } from "../../db/models/audit-event";
import { LoadCase } from "../../db/models/load-case";
import { Location } from "../../db/models/location";
import { Project } from "../../db/models/project";
import { StressState } from "../../db/models/stress-state";
import { componentsPaOf, writeStressStates } from "../../db/repositories/stress-states";
import { seedDemo } from "../../db/seed";
import { buildTestApp } from "../support/app";

// A demo seeded before the demo states kept their calculator inputs: the start-up seed step gives
// them their inputs as a new revision (same stresses), leaves a state a user saved since alone,
// and does nothing the second time.

/** The demo states that come with calculator inputs, as "case @ location". */
const DEMO_WITH_INPUTS = ct7Projects().flatMap((p) =>
  p.cases.flatMap((c) =>
    c.states.filter((s) => s.calculator).map((s) => ({ project: p.name, caseName: c.name, state: s })),
  ),
);

/** Every revision of a demo state, oldest first. */
async function revisionsOf(projectName: string, caseName: string, locationName: string) {
  const project = await Project.findOne({ where: { name: projectName } });
  const loadCase = await LoadCase.findOne({ where: { projectId: project!.id, name: caseName } });
  const location = await Location.findOne({ where: { projectId: project!.id, name: locationName } });
  return StressState.findAll({
    where: { loadCaseId: loadCase!.id, locationId: location!.id },
    order: [["revision", "ASC"]],
  });
}

describe("the demo seed's calculator-input back-fill", () => {
  const adminUrl = inject("adminUrl");
  const databaseUrl = adminUrl.replace(/\/postgres$/, "/sigmacube_seed_backfill");
  let closeApp: () => Promise<void> = async () => {};
  afterAll(() => closeApp());

  it("when a demo seeded without calculator inputs starts again, then each untouched calculator state gets its inputs as revision 2 with the same stresses, an edited one is left alone, and a third start changes nothing", async () => {
    await ensureDatabase(adminUrl, "sigmacube_seed_backfill");
    const { context, close } = buildTestApp({ databaseUrl, webDist: null });
    closeApp = close;
    await migrate(context.sequelize);
    expect((await seedDemo(context.sequelize)).seeded).toBe(true);
    expect(DEMO_WITH_INPUTS.length).toBe(7);

    // Old-style demo: the states were stored without their inputs.
    const seeded: StressState[] = [];
    for (const d of DEMO_WITH_INPUTS)
      seeded.push((await revisionsOf(d.project, d.caseName, d.state.location))[0]);
    await StressState.update({ calculator: null }, { where: { id: seeded.map((r) => r.id) } });
    // A user has since saved the design case at mid-shell with other stresses (revision 2).
    const edited = DEMO_WITH_INPUTS.find((d) => d.caseName === "Design")!;
    const editedRow = seeded[DEMO_WITH_INPUTS.indexOf(edited)];
    const userPa = { ...componentsPaOf(editedRow), yy: 80e6 };
    await writeStressStates([
      {
        loadCaseId: editedRow.loadCaseId,
        locationId: editedRow.locationId,
        componentsPa: userPa,
        unit: "MPa",
        source: "typed",
        note: "re-entered from the revised drawing",
        calculator: null,
        createdBy: null,
      },
    ]);
    const auditBefore = await AuditEvent.count({
      where: { actorName: "demo seed", entityType: "stress-state" },
    });

    const lines: string[] = [];
    const second = await seedDemo(context.sequelize, (l) => lines.push(l));
    expect(second).toEqual({ seeded: false, version: 3, backfilled: 6 });
    expect(lines).toEqual(["demo seed: 6 demo states got the calculator inputs they came from"]);

    for (const [i, d] of DEMO_WITH_INPUTS.entries()) {
      const rows = await revisionsOf(d.project, d.caseName, d.state.location);
      const label = `${d.caseName} @ ${d.state.location}`;
      if (d === edited) {
        expect(
          rows.map((r) => r.revision),
          label,
        ).toEqual([1, 2]);
        expect(rows[1].isCurrent).toBe(true);
        expect(rows[1].calculator, label).toBeNull();
        expect(componentsPaOf(rows[1])).toEqual(userPa);
        continue;
      }
      expect(
        rows.map((r) => [r.revision, r.isCurrent]),
        label,
      ).toEqual([
        [1, false],
        [2, true],
      ]);
      expect(rows[0].calculator, label).toBeNull();
      expect(rows[1].calculator, label).toEqual(d.state.calculator);
      expect(rows[1].createdBy, label).toBeNull();
      expect(componentsPaOf(rows[1]), label).toEqual(componentsPaOf(seeded[i]));
      expect([rows[1].unit, rows[1].source, rows[1].note], label).toEqual([
        seeded[i].unit,
        seeded[i].source,
        seeded[i].note,
      ]);
      // The stored inputs give the stored stresses: thin-wall membrane σθ = pr/t, σx = pr/2t
      // (any strength-of-materials text), for the mid-shell states in Pa and m.
      if (d.state.calculator!.name === "thin-wall") {
        const n = rows[1].calculator!.inputs.numbers;
        expect(thinCylinder(n.p.value * 1e6, n.r.value * 1e-3, n.t.value * 1e-3).tensor).toEqual(
          componentsPaOf(rows[1]),
        );
      }
    }
    const audit = await AuditEvent.findAll({
      where: { actorName: "demo seed", entityType: "stress-state" },
      order: [["id", "ASC"]],
    });
    expect(audit.length - auditBefore).toBe(6);
    expect(audit.at(-1)!.summary).toMatch(
      /^added the shaft calculator's inputs to the state of "Steady running"/,
    );

    // Started once more: nothing left to add, nothing written.
    const states = await StressState.count();
    const events = await AuditEvent.count();
    expect(await seedDemo(context.sequelize)).toEqual({ seeded: false, version: 3, backfilled: 0 });
    expect(await StressState.count()).toBe(states);
    expect(await AuditEvent.count()).toBe(events);
  });
});
