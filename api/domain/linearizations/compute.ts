import { convertStress, linearize, type LinearizationResult } from "../../../core";
import type {
  LinearizationInputBody,
  LinearizationResultView,
  LinearizationSummary,
} from "../../../core/contract/linearizations";
import { errors } from "../../errors";
import type { ResolvedMaterial } from "../materials/resolve";

/** What is stored of a line besides its name and location: everything `linearize` needs. */
export type StoredLinearizationInput = Omit<LinearizationInputBody, "name" | "locationId">;

/** S, Sy and Su as the checks used them (path's stress unit), and where Sy and Su came from. */
export type AllowablesUsed = LinearizationResultView["allowables"];

/** The inputs of a body as they are stored (name and location live in columns of their own). */
export function storedInputOf(body: LinearizationInputBody): StoredLinearizationInput {
  const { path, secondAxis, classification, allowables, equivalent, bending } = body;
  return { path, secondAxis, classification, allowables, equivalent, bending };
}

/**
 * The request field a message of core's `linearize` is about: core names its own arguments
 * (`distances[3]`, `coordinates (point 2)`, `lineDirection`, `secondAxis`, `allowables.Sy`), the
 * request names the path's points.
 */
export function requestFieldOf(message: string): string {
  const distance = /^distances\[(\d+)\]/.exec(message);
  if (distance) return `path.points.${distance[1]}.distance`;
  const point = /^coordinates(?:\[\d+\])? \(point (\d+)\)/.exec(message);
  if (point) return `path.points.${point[1]}`;
  if (message.startsWith("stresses")) return "path.points";
  if (message.startsWith("distances") || message.startsWith("coordinates")) return "path.points";
  if (message.startsWith("lineDirection")) return "path.lineDirection";
  if (message.startsWith("secondAxis")) return "secondAxis";
  const allowable = /^allowables\.(\w+)/.exec(message);
  if (allowable) return `allowables.${allowable[1]}`;
  return "path";
}

/**
 * Sy and Su for the checks, in the path's stress unit: typed, or read from the resolved material
 * (the line's location's, else the project's default), with a sentence saying which.
 */
export function allowablesFor(
  input: StoredLinearizationInput,
  material: ResolvedMaterial | null,
): AllowablesUsed {
  const a = input.allowables;
  const unit = input.path.stressUnit;
  if (a.source === "typed") {
    return { S: a.S, Sy: a.Sy, Su: a.Su, timeDependent: a.timeDependent, note: "S, Sy and Su as typed." };
  }
  const fromPa = (pa: number | undefined) => (pa === undefined ? null : convertStress(pa, "Pa", unit));
  const Sy = fromPa(material?.strengths.yield);
  const Su = fromPa(material?.strengths.ultimateTension);
  const named =
    material === null || material.kind === "none"
      ? "no material is chosen for the line's location or the project, so Sy and Su are not known"
      : `Sy and Su from ${material.label} (${material.note.replace(/\.$/, "")})`;
  return { S: a.S, Sy, Su, timeDependent: a.timeDependent, note: `S as typed; ${named}.` };
}

const list = (a: Float64Array) => Array.from(a);
const ends = (e: { start: Float64Array; end: Float64Array }) => ({ start: list(e.start), end: list(e.end) });

/** Core's result as the JSON the API sends. */
function viewOf(
  r: LinearizationResult,
  input: StoredLinearizationInput,
  allowables: AllowablesUsed,
): LinearizationResultView {
  const local: number[][] = [];
  for (let i = 0; i < r.pointCount; i++) local.push(list(r.local.subarray(6 * i, 6 * i + 6)));
  return {
    stressUnit: input.path.stressUnit,
    lengthUnit: input.path.lengthUnit,
    pointCount: r.pointCount,
    thickness: r.thickness,
    x: list(r.x),
    frame: r.frame.map((row) => [...row]),
    frameNote: r.frameNote,
    local,
    bendingRule: r.bendingRule,
    bentComponents: [...r.bentComponents],
    membrane: list(r.membrane),
    bending: ends(r.bending),
    membranePlusBending: ends(r.membranePlusBending),
    peak: ends(r.peak),
    total: ends(r.total),
    equivalent: r.equivalent,
    allowables,
    checks: r.checks,
    checksNote: r.checksNote,
    notes: [...r.notes, allowables.note],
    warnings: r.warnings,
    source: r.source,
  };
}

/**
 * Refuses (400 naming `path.points`) a line so thin that the bending factor 6/t² overflows (positions
 * like 1e-200 apart): core would compute non-finite stresses, which must never reach a response.
 */
function assertIntegrableThickness(path: StoredLinearizationInput["path"]) {
  const first = path.points[0];
  const last = path.points[path.points.length - 1];
  const t =
    path.positions === "distance"
      ? Math.abs(last.distance! - first.distance!)
      : Math.hypot(last.x! - first.x!, last.y! - first.y!, last.z! - first.z!);
  if (t > 0 && !Number.isFinite(6 / (t * t))) {
    throw errors.invalidInput([
      {
        path: "path.points",
        message: `the line is ${t} long, too thin to integrate over; give the positions in a smaller length unit`,
      },
    ]);
  }
}

/**
 * Linearizes a line with core's `linearize` — the server's own computation, never a client's —
 * and answers 400 naming the request field when core refuses the path (points that do not
 * advance along the line, a second axis along it, …).
 * @param input the stored inputs (validated by the contract)
 * @param allowables S, Sy, Su as used (from {@link allowablesFor} at the save, kept with the line so
 *   reading it later gives the very result that was saved even if the material changed since)
 */
export function computeLinearization(
  input: StoredLinearizationInput,
  allowables: AllowablesUsed,
): LinearizationResultView {
  const { points, positions, lineDirection } = input.path;
  const stresses = new Float64Array(points.length * 6);
  points.forEach((p, i) => stresses.set([p.xx, p.yy, p.zz, p.xy, p.yz, p.zx], 6 * i));
  assertIntegrableThickness(input.path);
  let result: LinearizationResult;
  try {
    result = linearize({
      stresses,
      ...(positions === "distance"
        ? {
            distances: Float64Array.from(points, (p) => p.distance!),
            lineDirection: lineDirection as [number, number, number],
          }
        : { coordinates: Float64Array.from(points.flatMap((p) => [p.x!, p.y!, p.z!])) }),
      ...(input.secondAxis && { secondAxis: input.secondAxis as [number, number, number] }),
      bending: input.bending,
      equivalent: input.equivalent,
      classification: input.classification,
      allowables: {
        S: allowables.S,
        ...(allowables.Sy !== null && { Sy: allowables.Sy }),
        ...(allowables.Su !== null && { Su: allowables.Su }),
        timeDependent: allowables.timeDependent,
      },
    });
  } catch (e) {
    if (e instanceof RangeError) {
      throw errors.invalidInput([{ path: requestFieldOf(e.message), message: e.message }]);
    }
    throw e;
  }
  return viewOf(result, input, allowables);
}

/** What is kept beside a line's inputs at every save: what lists and the comparison show, and the allowables used. */
export type StoredSummary = Omit<
  LinearizationSummary,
  "id" | "loadCaseId" | "locationId" | "name" | "version" | "updatedAt"
> & { allowables: AllowablesUsed };

/** The summary of a freshly computed line. */
export function summaryOf(input: StoredLinearizationInput, result: LinearizationResultView): StoredSummary {
  return {
    classification: input.classification,
    equivalent: input.equivalent,
    stressUnit: input.path.stressUnit,
    pointCount: result.pointCount,
    checks: result.checks,
    allowables: result.allowables,
  };
}
