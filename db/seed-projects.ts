import type { Transaction } from "sequelize";
import { CT7_SHAFT_BAR, ct7Projects, type DemoProject } from "../core/demo-data/ct7-scenario";
import { AuditEvent } from "./models/audit-event";
import { Combination } from "./models/combination";
import { CombinationTerm } from "./models/combination-term";
import { LoadCase } from "./models/load-case";
import { Location } from "./models/location";
import { Material } from "./models/material";
import { Project } from "./models/project";
import { StressState } from "./models/stress-state";
import { Workspace } from "./models/workspace";
import { DEMO_WORKSPACE_NAME } from "./seed-accounts";

/**
 * Seed step "projects": the CT-7 projects of the demo scenario (every name and number
 * invented). Their inputs and states come from core/demo/ct7-scenario.ts, which computes them
 * with core's calculators and handbook formulas (thin-wall membrane σθ = pr/t, σx = pr/2t plus
 * an invented junction bending; lug sections; the 0/45/90 rosette; solid shaft
 * σ = 32M/πd³ + 4P/πd², τ = 16T/πd³), so the bench examples and the seed hold one set of numbers.
 * The shell's hydrostatic test at the head-to-shell junction governs and fails the required
 * factor of 1.5 (Tresca n ≈ 1.30), so the demo shows what a failure looks like.
 */

/** Creates one project with its locations, cases, states (revision 1, in MPa as entered) and combinations. */
async function createProject(
  transaction: Transaction,
  workspaceId: string,
  ownerId: string | null,
  spec: DemoProject,
  libraryIds: Record<string, string>,
): Promise<void> {
  const who = { createdBy: ownerId, updatedBy: ownerId };
  const project = await Project.create(
    {
      workspaceId,
      name: spec.name,
      description: spec.description,
      unitSystem: "SI",
      requirements: spec.requirements,
      defaultPublishedMaterial: "publishedId" in spec.material ? spec.material.publishedId : null,
      defaultMaterialId:
        "libraryMaterial" in spec.material ? libraryIds[spec.material.libraryMaterial] : null,
      ...who,
    },
    { transaction },
  );
  const locationIds = new Map<string, string>();
  for (const [position, name] of spec.locations.entries()) {
    const l = await Location.create({ projectId: project.id, name, position, ...who }, { transaction });
    locationIds.set(name, l.id);
  }
  const caseIds = new Map<string, string>();
  for (const [position, c] of spec.cases.entries()) {
    const row = await LoadCase.create(
      {
        projectId: project.id,
        name: c.name,
        category: c.category,
        description: c.description,
        position,
        ...who,
      },
      { transaction },
    );
    caseIds.set(c.name, row.id);
    for (const s of c.states) {
      const t = s.tensor;
      await StressState.create(
        {
          loadCaseId: row.id,
          locationId: locationIds.get(s.location)!,
          revision: 1,
          isCurrent: true,
          xxPa: t.xx,
          yyPa: t.yy,
          zzPa: t.zz,
          xyPa: t.xy,
          yzPa: t.yz,
          zxPa: t.zx,
          unit: "MPa",
          source: s.source,
          note: s.note,
          createdBy: ownerId,
        },
        { transaction },
      );
    }
  }
  for (const [position, combo] of spec.combinations.entries()) {
    const row = await Combination.create(
      { projectId: project.id, name: combo.name, description: combo.description, position, ...who },
      { transaction },
    );
    await CombinationTerm.bulkCreate(
      combo.terms.map((t, i) => ({
        combinationId: row.id,
        loadCaseId: caseIds.get(t.caseName)!,
        factor: t.factor,
        position: i,
      })),
      { transaction },
    );
  }
  await AuditEvent.create(
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
    { transaction },
  );
}

/** Adds the demo projects to the demo workspace (skipped when it is missing or already has projects). */
export async function seedDemoProjects(transaction: Transaction, log: (line: string) => void): Promise<void> {
  const workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE_NAME }, transaction });
  if (!workspace) return;
  if ((await Project.count({ where: { workspaceId: workspace.id }, transaction })) > 0) return;
  const owner = workspace.createdBy;

  const { key, ...bar } = CT7_SHAFT_BAR;
  const shaftBar = await Material.create(
    { workspaceId: workspace.id, unit: "MPa", ...bar, createdBy: owner, updatedBy: owner },
    { transaction },
  );
  const projects = ct7Projects();
  for (const spec of projects) {
    await createProject(transaction, workspace.id, owner, spec, { [key]: shaftBar.id });
  }
  log(`demo projects: ${projects.length} CT-7 projects in "${DEMO_WORKSPACE_NAME}"`);
}
