import type { ComparisonWithSections } from "../../../core/contract/comparison";
import type { RecordContent } from "../../../core/contract/records";
import { listLinearizations } from "../../../db/repositories/linearizations";
import type { Transaction } from "sequelize";
import {
  allowablesFor,
  computeLinearization,
  type StoredLinearizationInput,
} from "../linearizations/compute";

/**
 * For each stress classification line the comparison lists: where it runs, and its equivalent
 * stresses — membrane, membrane plus bending and peak at both ends — which the comparison's
 * section (checks only) does not carry and the report prints. The lines' stored inputs are
 * linearized again with the server's engine; equivalent stresses do not depend on allowables, so
 * none are resolved. Empty (and so left out of the content) without lines, so a record of a
 * project without any reads and hashes as before.
 */
export async function linearizationEndsOf(
  results: ComparisonWithSections,
  transaction?: Transaction,
): Promise<Pick<RecordContent, "linearizationEnds">> {
  const listed = results.linearizations ?? [];
  if (listed.length === 0) return {};
  const wanted = new Set(listed.map((l) => l.id));
  const caseIds = [...new Set(listed.map((l) => l.caseId))];
  // One case after another: the reads share the freeze's transaction, and pg deprecates
  // queueing several queries on one client at once.
  const rows: Awaited<ReturnType<typeof listLinearizations>> = [];
  for (const id of caseIds) rows.push(...(await listLinearizations(id, transaction)));
  const byId = new Map(rows.filter((r) => wanted.has(r.id)).map((r) => [r.id, r]));
  const ends = listed.flatMap((line) => {
    const row = byId.get(line.id);
    if (!row) return [];
    const input = row.input as StoredLinearizationInput;
    let result: ReturnType<typeof computeLinearization>;
    try {
      result = computeLinearization(input, allowablesFor(input, null));
    } catch {
      // A line the engine refuses now was saved under another engine: the record keeps its checks only.
      return [];
    }
    const points = input.path.points;
    const position = (p: (typeof points)[number]) =>
      input.path.positions === "distance" ? [p.distance!] : [p.x!, p.y!, p.z!];
    const e = result.equivalent;
    return [
      {
        id: line.id,
        lengthUnit: input.path.lengthUnit,
        pointCount: result.pointCount,
        thickness: result.thickness,
        start: position(points[0]),
        end: position(points[points.length - 1]),
        equivalent: {
          label: e.label,
          membrane: e.membrane,
          membranePlusBending: e.membranePlusBending,
          peak: e.peak,
        },
      },
    ];
  });
  return ends.length === 0 ? {} : { linearizationEnds: ends };
}
