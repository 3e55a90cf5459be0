import type { Transaction } from "sequelize";
import { ct7NozzlePointTable } from "../core/demo-data/ct7-nozzle-points";
import { ct7Projects } from "../core/demo-data/ct7-scenario";
import { LoadCase } from "./models/load-case";
import { PointTable } from "./models/point-table";
import { Project } from "./models/project";
import { Workspace } from "./models/workspace";
import { insertAuditEvent } from "./repositories/audit";
import { createLoadCase } from "./repositories/load-cases";
import { DEMO_WORKSPACE_NAME } from "./seed-accounts";
import { seedDemoPointTable } from "./seed-projects";

/**
 * What the nozzle project said before point tables existed. A demo database seeded then holds the
 * project empty with this text; anything else means someone has worked on it since.
 */
const PLACEHOLDER_DESCRIPTION =
  "Finite-element point tensors around nozzle N2. Point tables (CSV uploads evaluated in the browser) come in a later version; this project is empty until then.";

/**
 * Seed step for a demo database made before point tables: gives the nozzle project its load case
 * and 30,000-point table, as a fresh seed does. Only a project still exactly as that older seed
 * left it (the placeholder text, no load case, no table) is touched; a project someone has worked
 * on is left alone. Returns the points stored (0 when nothing was done).
 */
export async function upgradeDemoNozzleProject(
  transaction: Transaction,
  log: (line: string) => void,
): Promise<number> {
  const workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE_NAME }, transaction });
  const demo = ct7NozzlePointTable();
  const project =
    workspace &&
    (await Project.findOne({ where: { workspaceId: workspace.id, name: demo.projectName }, transaction }));
  if (!workspace || !project || project.description !== PLACEHOLDER_DESCRIPTION) return 0;
  const [cases, tables] = [
    await LoadCase.count({ where: { projectId: project.id }, transaction }),
    await PointTable.count({ where: { projectId: project.id }, transaction }),
  ];
  if (cases > 0 || tables > 0) return 0;

  const spec = ct7Projects().find((p) => p.name === demo.projectName)!;
  const owner = workspace.createdBy;
  await project.update({ description: spec.description }, { transaction });
  for (const [position, c] of spec.cases.entries()) {
    await createLoadCase(
      {
        projectId: project.id,
        name: c.name,
        category: c.category,
        description: c.description,
        position,
        createdBy: owner,
        updatedBy: owner,
      },
      transaction,
    );
  }
  const points = await seedDemoPointTable(transaction, workspace.id, owner);
  await insertAuditEvent(
    {
      workspaceId: workspace.id,
      projectId: project.id,
      entityType: "project",
      entityId: project.id,
      action: "update",
      actorId: owner,
      actorName: "demo seed",
      summary: `added the hydrostatic test and its point table of ${points} points to the demo project "${project.name}"`,
    },
    transaction,
  );
  log(`demo upgrade: the nozzle project gets its point table (${points} points)`);
  return points;
}
