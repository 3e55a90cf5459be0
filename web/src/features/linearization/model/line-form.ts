import type {
  LinearizationInputBody,
  LinearizationView,
  PathPoint,
} from "../../../../../core/contract/linearizations";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { parsePathText } from "./path-text";

/**
 * The linearization form as the engineer fills it (text fields as typed), and the request body
 * the server linearizes. Pure: the page draws and calls these.
 */
export type LineForm = {
  name: string;
  /** "" for no location (the project's material then). */
  locationId: string;
  pathText: string;
  lengthUnit: "mm" | "m" | "in";
  stressUnit: StressUnitName;
  /** The line's direction in the stresses' frame, needed when points are placed by distance. */
  lineDirection: [string, string, string];
  /** The second local axis; all three blank for core's stated default. */
  secondAxis: [string, string, string];
  membrane: "general" | "local";
  stresses: "primary" | "primary-plus-secondary";
  allowableSource: "typed" | "material";
  S: string;
  Sy: string;
  Su: string;
  timeDependent: boolean;
  equivalent: "von-mises" | "tresca";
  bendEveryComponent: boolean;
};

export const EMPTY_FORM: LineForm = {
  name: "",
  locationId: "",
  pathText: "",
  lengthUnit: "mm",
  stressUnit: "MPa",
  lineDirection: ["1", "0", "0"],
  secondAxis: ["", "", ""],
  membrane: "local",
  stresses: "primary",
  allowableSource: "typed",
  S: "",
  Sy: "",
  Su: "",
  timeDependent: false,
  equivalent: "von-mises",
  bendEveryComponent: false,
};

/** What each classification checks, in the words the form shows beside the choice. */
export function classificationExplained(form: Pick<LineForm, "membrane" | "stresses">): string {
  if (form.stresses === "primary-plus-secondary") {
    return "Primary + secondary: only the range check PL + Pb + Q ≤ SPS = max(3S, 2Sy) at the worse surface (3S without Sy, without Su, when Sy/Su > 0.7 or when S is time-dependent). Check primary limits on a line of the primary loads alone.";
  }
  return form.membrane === "general"
    ? "General primary membrane, away from discontinuities: Pm ≤ S on the membrane, and Pm + Pb ≤ 1.5S at the worse surface."
    : "Local primary membrane, near a discontinuity: PL ≤ 1.5S on the membrane, and PL + Pb ≤ 1.5S at the worse surface.";
}

const numberOrNull = (text: string) => {
  const t = text.trim().replace(",", ".");
  return t === "" ? null : Number(t);
};

/**
 * The request body for the form, or the problems that keep it from being sent, by field name.
 * Numbers the server bounds (S > 0, finite values) are left to its 400, which names the field too.
 */
export function requestBodyOf(
  form: LineForm,
): { ok: true; body: LinearizationInputBody } | { ok: false; problems: Record<string, string> } {
  const problems: Record<string, string> = {};
  const parsed = parsePathText(form.pathText);
  if (!parsed.ok) problems.pathText = parsed.message;
  const vector = (v: [string, string, string], field: string) => {
    if (v.every((c) => c.trim() === "")) return null;
    const n = v.map(numberOrNull);
    if (n.some((c) => c === null || !Number.isFinite(c))) {
      problems[field] = "give three numbers, x y z";
      return null;
    }
    return n as [number, number, number];
  };
  const lineDirection = vector(form.lineDirection, "lineDirection");
  const secondAxis = vector(form.secondAxis, "secondAxis");
  if (parsed.ok && parsed.positions === "distance" && lineDirection === null && !problems.lineDirection) {
    problems.lineDirection = "give the line's direction x y z: the points are placed by distance";
  }
  const S = numberOrNull(form.S);
  if (S === null || !Number.isFinite(S)) problems.S = "give the allowable S (a number)";
  const optional = (text: string, field: string) => {
    const v = numberOrNull(text);
    if (v !== null && !Number.isFinite(v)) problems[field] = "a number, or leave it blank";
    return v;
  };
  const Sy = optional(form.Sy, "Sy");
  const Su = optional(form.Su, "Su");
  if (!parsed.ok || Object.keys(problems).length > 0) return { ok: false, problems };
  return {
    ok: true,
    body: {
      name: form.name.trim() || "Unnamed line",
      locationId: form.locationId || null,
      path: {
        positions: parsed.positions,
        lengthUnit: form.lengthUnit,
        stressUnit: form.stressUnit,
        lineDirection: parsed.positions === "distance" ? lineDirection : null,
        points: parsed.points,
      },
      secondAxis,
      classification: { membrane: form.membrane, stresses: form.stresses },
      allowables:
        form.allowableSource === "typed"
          ? { source: "typed", S: S!, Sy, Su, timeDependent: form.timeDependent }
          : { source: "material", S: S!, timeDependent: form.timeDependent },
      equivalent: form.equivalent,
      bending: form.bendEveryComponent ? "all-components" : "annex-5a",
    },
  };
}

/** The points written back as a tab-separated table with a header, so a saved line can be edited. */
export function pathTextOf(positions: "distance" | "xyz", points: readonly PathPoint[]): string {
  const keys =
    positions === "distance"
      ? (["distance", "xx", "yy", "zz", "xy", "yz", "zx"] as const)
      : (["x", "y", "z", "xx", "yy", "zz", "xy", "yz", "zx"] as const);
  const header = keys.map((k) => (k.length === 2 ? `s${k}` : k)).join("\t");
  return [header, ...points.map((p) => keys.map((k) => String(p[k] ?? "")).join("\t"))].join("\n");
}

const text = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));
const vectorText = (v: readonly number[] | null): [string, string, string] =>
  v ? [String(v[0]), String(v[1]), String(v[2])] : ["", "", ""];

/** A saved line as the form that would save it again. */
export function formOf(saved: LinearizationView): LineForm {
  const { input } = saved;
  return {
    name: saved.name,
    locationId: saved.locationId ?? "",
    pathText: pathTextOf(input.path.positions, input.path.points),
    lengthUnit: input.path.lengthUnit,
    stressUnit: input.path.stressUnit,
    lineDirection: input.path.lineDirection ? vectorText(input.path.lineDirection) : ["1", "0", "0"],
    secondAxis: vectorText(input.secondAxis),
    membrane: input.classification.membrane,
    stresses: input.classification.stresses,
    allowableSource: input.allowables.source,
    S: text(input.allowables.S),
    Sy: text(input.allowables.Sy),
    Su: text(input.allowables.Su),
    timeDependent: input.allowables.timeDependent,
    equivalent: input.equivalent,
    bendEveryComponent: input.bending === "all-components",
  };
}

/**
 * The form field a server error names (`path.points.3.distance` → the path box), so a 400 shows
 * beside what to change.
 */
export function formFieldOf(serverPath: string): string {
  if (serverPath.startsWith("path.lineDirection")) return "lineDirection";
  if (serverPath.startsWith("path")) return "path";
  if (serverPath.startsWith("allowables.")) return serverPath.slice("allowables.".length);
  return serverPath;
}
