import type { Transaction } from "sequelize";
import type { ProjectExport } from "../../../core/contract/project-export";
import { createLinearization } from "../../../db/repositories/linearizations";
import type { ProjectRow } from "../../../db/repositories/projects";
import { errors, HttpError } from "../../errors";
import { allowablesFor, computeLinearization, summaryOf, type StoredLinearizationInput } from "./compute";
import { materialOfLine } from "./material";

type FileLine = NonNullable<ProjectExport["loadCases"][number]["linearizations"]>[number];

/**
 * Writes the stress classification lines of one load case of an export file, each linearized
 * again by the server with core's `linearize` (a file carries inputs, never results), with Sy and
 * Su read from the imported materials where the line takes them from a material. A line core
 * refuses is refused with 400 naming its place in the file (`loadCases.2.linearizations.0.path.points`),
 * and the caller's transaction leaves nothing behind.
 * @param fieldPrefix the case's place in the file, e.g. `loadCases.2`
 * @returns how many lines were written
 */
export async function importLinearizations(
  transaction: Transaction,
  userId: string,
  project: ProjectRow,
  loadCaseId: string,
  lines: readonly FileLine[],
  locationIds: ReadonlyMap<string, string>,
  fieldPrefix: string,
): Promise<number> {
  for (const [j, line] of lines.entries()) {
    const { name, location, ...input } = line;
    const stored: StoredLinearizationInput = input;
    const locationId = location === null ? null : locationIds.get(location)!;
    const material =
      stored.allowables.source === "material" ? await materialOfLine(project, locationId, transaction) : null;
    let summary;
    try {
      summary = summaryOf(stored, computeLinearization(stored, allowablesFor(stored, material)));
    } catch (e) {
      if (e instanceof HttpError && e.id === "invalid_input" && Array.isArray(e.details)) {
        throw errors.invalidInput(
          (e.details as { path: string; message: string }[]).map((d) => ({
            ...d,
            path: `${fieldPrefix}.linearizations.${j}.${d.path}`,
          })),
        );
      }
      throw e;
    }
    await createLinearization(
      {
        projectId: project.id,
        loadCaseId,
        locationId,
        name,
        input: stored as unknown as Record<string, unknown>,
        summary: summary as unknown as Record<string, unknown>,
        createdBy: userId,
        updatedBy: userId,
      },
      transaction,
    );
  }
  return lines.length;
}
