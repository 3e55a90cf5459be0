import type { AppContext } from "../context";
import type { AnyRoute } from "../openapi/registry";
import { auditRoutes } from "./audit";
import { combinationRoutes } from "./combinations";
import { comparisonRoutes } from "./comparison";
import { linearizationRoutes } from "./linearizations";
import { loadCaseRoutes } from "./load-cases";
import { locationRoutes } from "./locations";
import { materialRoutes } from "./materials";
import { pointTableRoutes } from "./point-tables";
import { projectTransferRoutes } from "./project-transfer";
import { recordRoutes } from "./records";
import { reportRoutes } from "./report";
import { trashRoutes } from "./trash";
import { projectRoutes } from "./projects";

/**
 * Every route of the project area (projects, locations, load cases with their linearizations and
 * point tables, combinations, materials, comparison, audit, trash, import/export, review and
 * records, reports), added to the route table in one line.
 */
export function projectAreaRoutes(context: AppContext): AnyRoute[] {
  return [
    ...materialRoutes(context),
    ...projectRoutes(context),
    ...locationRoutes(context),
    ...loadCaseRoutes(context),
    ...linearizationRoutes(context),
    ...pointTableRoutes(context),
    ...combinationRoutes(context),
    ...comparisonRoutes(context),
    ...auditRoutes(),
    ...trashRoutes(context),
    ...projectTransferRoutes(context),
    ...recordRoutes(context),
    ...reportRoutes(context),
  ];
}
