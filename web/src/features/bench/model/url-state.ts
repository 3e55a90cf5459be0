/**
 * The bench's shareable state in the URL's query, so a link reproduces what the sender saw:
 * s = six components (xx yy zz xy yz zx, in u), u = unit, r = rotation as axis x,y,z and angle (°),
 * rv = rotation description, seq = Euler sequence, m = built-in material id or "custom" with
 * fy, fu, fc (MPa), n = required factor, mb = material behaviour when chosen (ductile|brittle),
 * un = 1 when criteria that do not suit the material are rated too, env = envelope criteria, p = plane normal (when shown),
 * mohr = Mohr picture, in = input form. Unknown or malformed parameters are ignored, never fatal.
 */
import {
  CRITERIA,
  STRESS_UNITS,
  axisAngleFromRotation,
  publishedMaterial,
  rotationFromAxisAngle,
  stressInputProblem,
  type Criterion,
  type StressUnit,
  type Vec3,
} from "../../../../../core";
import { readStressParam, stressParam } from "../../../lib/bench-link";
import { EULER_SEQUENCES, type BenchState, type EulerSequence } from "./bench-state";

const CRITERION_CODE: Readonly<Record<Criterion, string>> = {
  "von-mises": "vm",
  tresca: "tr",
  "max-principal": "mp",
  "mohr-coulomb": "mc",
  "modified-mohr": "mm",
};

/** 15 significant figures: the link gives back the very numbers shown, to double rounding. */
function num(v: number): string {
  return Number(v.toPrecision(15)).toString();
}

function numbers(text: string | null, count: number): number[] | null {
  if (text === null) return null;
  const parts = text.split(",").map((p) => Number(p));
  if (parts.length !== count || parts.some((v) => !Number.isFinite(v))) return null;
  return parts;
}

/** The shareable part of the state as a query string (without "?"). */
export function encodeBenchState(state: BenchState): string {
  const q = new URLSearchParams();
  q.set("s", stressParam(state.tensor));
  q.set("u", state.unit);
  const { axis, angleDeg } = axisAngleFromRotation(state.rotation);
  if (angleDeg !== 0) q.set("r", [...axis, angleDeg].map(num).join(","));
  if (state.rotationView !== "axis-angle") q.set("rv", state.rotationView);
  if (state.eulerSequence !== "ZYX") q.set("seq", state.eulerSequence);
  const m = state.material;
  if (m.presetId !== null) q.set("m", m.presetId);
  else {
    q.set("m", "custom");
    if (m.yield !== null) q.set("fy", num(m.yield));
    if (m.ultimateTension !== null) q.set("fu", num(m.ultimateTension));
    if (m.ultimateCompression !== null) q.set("fc", num(m.ultimateCompression));
  }
  q.set("n", num(state.requiredFactor));
  if (state.behaviour !== "from-data") q.set("mb", state.behaviour);
  if (state.includeUnsuited) q.set("un", "1");
  q.set("env", state.envelopeCriteria.map((c) => CRITERION_CODE[c]).join(","));
  if (state.plane.enabled) q.set("p", state.plane.normal.map(num).join(","));
  if (state.mohrView !== "3d") q.set("mohr", state.mohrView);
  if (state.inputForm !== "grid") q.set("in", state.inputForm);
  return q.toString().replace(/%2C/g, ",");
}

/**
 * Reads a query string back into the shareable fields it holds validly.
 * @param search query string, with or without "?"
 */
export function decodeBenchState(search: string): Partial<BenchState> {
  const q = new URLSearchParams(search);
  const out: Partial<BenchState> = {};
  const s = readStressParam(q.get("s"));
  // A link is an entry point too: a stress beyond the input range is ignored like any malformed value.
  if (s && Object.values(s).every((v) => stressInputProblem(v) === undefined)) out.tensor = s;
  const u = q.get("u");
  if (u !== null && (STRESS_UNITS as readonly string[]).includes(u)) out.unit = u as StressUnit;
  const r = numbers(q.get("r"), 4);
  if (r && Math.hypot(r[0], r[1], r[2]) > 0) out.rotation = rotationFromAxisAngle([r[0], r[1], r[2]], r[3]);
  const rv = q.get("rv");
  if (rv === "euler" || rv === "axis-angle") out.rotationView = rv;
  const seq = q.get("seq");
  if (seq !== null && (EULER_SEQUENCES as readonly string[]).includes(seq))
    out.eulerSequence = seq as EulerSequence;
  const m = q.get("m");
  if (m === "custom") {
    const strength = (key: string) => {
      const v = Number(q.get(key));
      return q.get(key) !== null && v > 0 && Number.isFinite(v) ? v : null;
    };
    out.material = {
      presetId: null,
      yield: strength("fy"),
      ultimateTension: strength("fu"),
      ultimateCompression: strength("fc"),
    };
  } else if (m !== null) {
    const p = publishedMaterial(m);
    if (p) {
      out.material = {
        presetId: p.id,
        yield: p.yield ?? null,
        ultimateTension: p.ultimateTension,
        ultimateCompression: p.ultimateCompression,
      };
    }
  }
  const n = Number(q.get("n"));
  if (q.get("n") !== null && Number.isFinite(n) && n >= 1) out.requiredFactor = n;
  const mb = q.get("mb");
  if (mb === "ductile" || mb === "brittle") out.behaviour = mb;
  if (q.get("un") === "1") out.includeUnsuited = true;
  const env = q.get("env");
  if (env !== null) {
    const codes = env.split(",");
    out.envelopeCriteria = CRITERIA.filter((c) => codes.includes(CRITERION_CODE[c]));
  }
  const p = numbers(q.get("p"), 3);
  if (p && Math.hypot(p[0], p[1], p[2]) > 0) out.plane = { enabled: true, normal: p as unknown as Vec3 };
  const mohr = q.get("mohr");
  if (mohr === "plane" || mohr === "3d") out.mohrView = mohr;
  const form = q.get("in");
  if (form === "grid" || form === "six" || form === "plane") out.inputForm = form;
  return out;
}

/**
 * The address the bench writes for its state, or null when the address is no longer the bench's.
 * The router renders a navigation in a transition: for a moment the address is already the next
 * page while the bench is still mounted, and a write then would stamp the bench's query onto it.
 * @param source the `workspace/project/case/location` the bench was opened from, kept first
 */
export function benchAddress(
  current: { pathname: string; hash: string },
  benchPath: string,
  source: string | null,
  query: string,
): string | null {
  if (current.pathname !== benchPath) return null;
  return `${benchPath}?${source ? `source=${source}&` : ""}${query}${current.hash}`;
}
