import { createHash } from "node:crypto";
import type { Transaction } from "sequelize";
import { parsePointTable } from "../core";
import { ct7NozzlePointTable } from "../core/demo-data/ct7-nozzle-points";
import { CT7_SHAFT_BAR, ct7Projects, type DemoProject } from "../core/demo-data/ct7-scenario";
import { LoadCase } from "./models/load-case";
import { Project } from "./models/project";
import { chunksOf } from "./repositories/point-table-chunks";
import { createPointTable, storePointTableContent } from "./repositories/point-tables";
import { Workspace } from "./models/workspace";
import { insertAuditEvent } from "./repositories/audit";
import { createCombination } from "./repositories/combinations";
import { createLoadCase } from "./repositories/load-cases";
import { createLocation } from "./repositories/locations";
import { createMaterial } from "./repositories/materials";
import { countProjects, createProject } from "./repositories/projects";
import { writeStressStates } from "./repositories/stress-states";
import { DEMO_WORKSPACE_NAME } from "./seed-accounts";

/**
 * Seed step "projects": the CT-7 projects of the demo scenario (every name and number
 * invented). Their inputs and states come from core/demo/ct7-scenario.ts, which computes them
 * with core's calculators and handbook formulas (thin-wall membrane σθ = pr/t, σx = pr/2t plus
 * an invented junction bending; lug sections; the 0/45/90 rosette; solid shaft
 * σ = 32M/πd³ + 4P/πd², τ = 16T/πd³), so the bench examples and the seed hold one set of numbers.
 * The shell's hydrostatic test at the head-to-shell junction governs and fails the required
 * factor of 1.5 (Tresca n ≈ 1.30), so the demo shows what a failure looks like. The mid-shell
 * states and the lug rosette keep their calculator inputs (pressure, radius and wall; gauge
 * readings, E and ν), so the demo shows the trail from inputs to verdict.
 */

/** Creates one project with its locations, cases, states (revision 1, in MPa as entered) and combinations. */
export async function createDemoProject(
  transaction: Transaction,
  workspaceId: string,
  ownerId: string | null,
  spec: DemoProject,
  libraryIds: Record<string, string>,
): Promise<void> {
  const who = { createdBy: ownerId, updatedBy: ownerId };
  const project = await createProject(
    {
      workspaceId,
      name: spec.name,
      description: spec.description,
      unitSystem: "SI",
      requirements: [...spec.requirements],
      defaultPublishedMaterial: "publishedId" in spec.material ? spec.material.publishedId : null,
      defaultMaterialId:
        "libraryMaterial" in spec.material ? libraryIds[spec.material.libraryMaterial] : null,
      ...who,
    },
    transaction,
  );
  const locationIds = new Map<string, string>();
  for (const [position, name] of spec.locations.entries()) {
    const l = await createLocation({ projectId: project.id, name, position, ...who }, transaction);
    locationIds.set(name, l.id);
  }
  const caseIds = new Map<string, string>();
  for (const [position, c] of spec.cases.entries()) {
    const row = await createLoadCase(
      {
        projectId: project.id,
        name: c.name,
        category: c.category,
        description: c.description,
        position,
        ...who,
      },
      transaction,
    );
    caseIds.set(c.name, row.id);
    await writeStressStates(
      c.states.map((s) => ({
        loadCaseId: row.id,
        locationId: locationIds.get(s.location)!,
        componentsPa: s.tensor,
        unit: "MPa",
        source: s.source,
        note: s.note,
        calculator: s.calculator ?? null,
        createdBy: ownerId,
      })),
      transaction,
    );
  }
  for (const [position, combo] of spec.combinations.entries()) {
    await createCombination(
      { projectId: project.id, name: combo.name, description: combo.description, position, ...who },
      combo.terms.map((t) => ({ loadCaseId: caseIds.get(t.caseName)!, factor: t.factor })),
      transaction,
    );
  }
  await insertAuditEvent(
    {
      workspaceId,
      projectId: project.id,
      entityType: "project",
      entityId: project.id,
      action: "create",
      actorId: ownerId,
      actorName: "demo seed",
      summary: `created the demo project "${project.name}"`,
    },
    transaction,
  );
}

/** Adds the demo projects to the demo workspace (skipped when it is missing or already has projects). */
export async function seedDemoProjects(transaction: Transaction, log: (line: string) => void): Promise<void> {
  const workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE_NAME }, transaction });
  if (!workspace) return;
  if ((await countProjects(workspace.id, transaction)) > 0) return;
  const owner = workspace.createdBy;

  const { key, ...bar } = CT7_SHAFT_BAR;
  const shaftBar = await createMaterial(
    { workspaceId: workspace.id, unit: "MPa", ...bar, createdBy: owner, updatedBy: owner },
    transaction,
  );
  const projects = ct7Projects();
  for (const spec of projects) {
    await createDemoProject(transaction, workspace.id, owner, spec, { [key]: shaftBar.id });
  }
  const points = await seedDemoPointTable(transaction, workspace.id, owner);
  log(
    `demo projects: ${projects.length} CT-7 projects in "${DEMO_WORKSPACE_NAME}", a point table of ${points} points`,
  );
}

/**
 * Adds the nozzle project's point table (core/demo-data/ct7-nozzle-points.ts) to its load case,
 * read by the same parser and stored in the same binary chunks as an upload; the server evaluates
 * it when it is first read. Returns the points stored.
 */
export async function seedDemoPointTable(
  transaction: Transaction,
  workspaceId: string,
  ownerId: string | null,
) {
  const demo = ct7NozzlePointTable();
  const project = await Project.findOne({ where: { workspaceId, name: demo.projectName }, transaction });
  const loadCase =
    project &&
    (await LoadCase.findOne({ where: { projectId: project.id, name: demo.caseName }, transaction }));
  if (!project || !loadCase)
    throw new Error(`the demo has no load case "${demo.caseName}" in "${demo.projectName}"`);
  const table = await createPointTable(
    {
      projectId: project.id,
      loadCaseId: loadCase.id,
      fileName: demo.fileName,
      sizeBytes: Buffer.byteLength(demo.text),
      sha256: createHash("sha256").update(demo.text).digest("hex"),
      layout: demo.layout,
      columns: demo.columns,
      unit: demo.unit,
      idKind: demo.idKind,
      createdBy: ownerId,
    },
    transaction,
  );
  const parsed = parsePointTable(demo.text, { ...demo.layout, columns: demo.columns, unit: demo.unit });
  await storePointTableContent(
    table.id,
    {
      chunks: chunksOf(parsed),
      pointCount: parsed.count,
      hasCoordinates: parsed.coordinates !== null,
      badRows: parsed.badRows,
    },
    transaction,
  );
  return parsed.count;
}
