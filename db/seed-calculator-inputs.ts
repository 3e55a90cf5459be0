import type { Transaction } from "sequelize";
import type { Components } from "../core/contract/load-cases";
import { ct7Projects, type DemoState } from "../core/demo-data/ct7-scenario";
import { LoadCase } from "./models/load-case";
import { Location } from "./models/location";
import { Project } from "./models/project";
import { StressState } from "./models/stress-state";
import { Workspace } from "./models/workspace";
import { insertAuditEvent } from "./repositories/audit";
import { toPlain } from "./repositories/plain";
import { componentsPaOf, writeStressStates, type StressStateRow } from "./repositories/stress-states";
import { DEMO_WORKSPACE_NAME } from "./seed-accounts";

/**
 * Seed step "calculator inputs", run on every start: a demo seeded before the demo states kept
 * their calculator inputs (the mid-shell states, the lug rosette, the agitator shaft) gets them,
 * as a new revision of each such state written by the one state writer, with the same stresses,
 * unit, source and note, and an audit line naming the demo seed. The history then shows the
 * revision that added the inputs, and the earlier one stays.
 *
 * A seed step rather than a migration: it is about the demo's content (core/demo-data), not the
 * schema; a migration would run once on every database, demo or not, while this step asks each
 * time whether a demo state still lacks its inputs, so a demo restored from an old dump is mended
 * on its next start too, and the version-numbered seed steps (whose step 4 waits for the records'
 * freezing) stay as they are.
 *
 * A state is only touched while it is still the one the seed wrote: its current row is revision 1,
 * it has no calculator inputs, and its six components equal the demo's (which are what the
 * inputs give: core/demo-data/ct7-calculator-inputs.test.ts) to 1e-12 of the largest. A state a
 * user has saved again since — edited, re-entered or given inputs of their own — is left alone;
 * so is a project, load case or location that was renamed, removed or whose name is no longer
 * unique. Once the inputs are there the step finds nothing to do, so running it again changes nothing.
 *
 * @returns how many states got their inputs
 */
export async function backfillDemoCalculatorInputs(
  transaction: Transaction,
  log: (line: string) => void = () => {},
): Promise<number> {
  const workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE_NAME }, transaction });
  if (!workspace) return 0;
  const found: { projectId: string; row: StressStateRow; demo: DemoState; caseName: string }[] = [];
  for (const spec of ct7Projects()) {
    const wanted = spec.cases.flatMap((c) =>
      c.states.filter((s) => s.calculator !== undefined).map((s) => ({ caseName: c.name, demo: s })),
    );
    if (wanted.length === 0) continue;
    const project = await only(
      Project.findAll({
        where: { workspaceId: workspace.id, name: spec.name, deletedAt: null },
        transaction,
      }),
    );
    if (!project) continue;
    const byName = { where: { projectId: project.id, deletedAt: null }, transaction };
    const cases = await LoadCase.findAll(byName);
    const locations = await Location.findAll(byName);
    for (const { caseName, demo } of wanted) {
      const loadCase = uniqueByName(cases, caseName);
      const location = uniqueByName(locations, demo.location);
      if (!loadCase || !location) continue;
      const current = await StressState.findOne({
        where: { loadCaseId: loadCase.id, locationId: location.id, isCurrent: true },
        transaction,
      });
      if (!current) continue;
      const row = toPlain(current);
      if (row.revision !== 1 || row.calculator !== null) continue;
      if (!sameComponents(componentsPaOf(row), demo.tensor)) continue;
      found.push({ projectId: project.id, row, demo, caseName });
    }
  }
  if (found.length === 0) return 0;

  const written = await writeStressStates(
    found.map(({ row, demo }) => ({
      loadCaseId: row.loadCaseId,
      locationId: row.locationId,
      componentsPa: componentsPaOf(row),
      unit: row.unit,
      source: row.source,
      note: row.note,
      calculator: demo.calculator!,
      // Saved by no person: the history shows "—" and the audit line names the demo seed, and no
      // member becomes the last editor of an input a calculation record may have frozen.
      createdBy: null,
    })),
    transaction,
  );
  for (const [i, { saved, previous }] of written.entries()) {
    const { projectId, demo, caseName } = found[i];
    await insertAuditEvent(
      {
        workspaceId: workspace.id,
        projectId,
        entityType: "stress-state",
        entityId: saved.id,
        action: "update",
        actorId: null,
        actorName: "demo seed",
        summary: `added the ${demo.calculator!.name} calculator's inputs to the state of "${caseName}" at "${demo.location}" (revision ${saved.revision}, the same stresses)`,
        changes: {
          loadCaseId: saved.loadCaseId,
          locationId: saved.locationId,
          revision: saved.revision,
          fromPa: previous ? componentsPaOf(previous) : null,
          toPa: componentsPaOf(saved),
          unit: saved.unit,
          calculator: demo.calculator,
        },
      },
      transaction,
    );
  }
  log(`demo seed: ${found.length} demo states got the calculator inputs they came from`);
  return found.length;
}

/** The one row found, or null when there is none or more than one (a name no longer unique). */
async function only<T>(rows: Promise<T[]>): Promise<T | null> {
  const all = await rows;
  return all.length === 1 ? all[0] : null;
}

function uniqueByName<T extends { name: string }>(rows: readonly T[], name: string): T | null {
  const matching = rows.filter((r) => r.name === name);
  return matching.length === 1 ? matching[0] : null;
}

const KEYS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;

/** Equal to 1e-12 of the largest component: what the seed wrote, not a value anyone typed since. */
function sameComponents(stored: Components, demo: Components): boolean {
  const scale = Math.max(...KEYS.map((k) => Math.abs(demo[k])));
  return KEYS.every((k) => Math.abs(stored[k] - demo[k]) <= 1e-12 * scale);
}
