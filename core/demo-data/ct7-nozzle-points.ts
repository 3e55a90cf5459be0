/**
 * The CT-7 demo's finite-element point table around nozzle N2: INVENTED FOR THE PRODUCT, no real
 * vessel or analysis. Instead of a finite-element run, the points come from a closed form: the
 * stresses around a circular hole in a wide plate under far-field membrane stress, Kirsch's
 * solution (handbook formula, recalled from memory), superposed for the shell's two membrane
 * stresses — axial σx = p·r/(2t) along x, hoop σθ = p·r/t along y (thin-wall membrane formulas,
 * common practice, no source). A hole in a biaxial 1 : 2 field concentrates the hoop stress to
 * 2.5·σθ at the hole's edge on the x axis, so under the hydrostatic test a small region there
 * exceeds what a factor of 1.5 on the yield strength allows, and the rest of the table passes.
 * Plane stress on the shell's unrolled mid-surface: σz = τyz = τzx = 0. Coordinates in mm from
 * the nozzle's axis, x along the vessel, y around it.
 */
import { thinCylinder } from "../calculators/thin-wall";
import { CT7_NOZZLE_PROJECT, CT7_SHELL, CT7_SHELL_LOAD_CASES } from "./ct7-scenario";

/** Nozzle N2's bore radius, mm (invented). */
export const CT7_NOZZLE_BORE_RADIUS_MM = 50;
/** Points per ring around the bore and rings from the bore's edge outward. */
const POINTS_PER_RING = 240;
const RINGS = 125;
/** The outermost ring's radius as a multiple of the bore radius. */
const OUTER_RADIUS_RATIO = 5;
/** The first node number (the numbers are the generator's own). */
const FIRST_NODE = 200_001;

/**
 * Kirsch's stresses (polar: σr, σθ, τrθ) at (r, θ) around a hole of radius a under far-field
 * uniaxial stress s along θ = 0 (handbook formula, recalled from memory).
 */
function kirsch(s: number, a: number, r: number, theta: number): [number, number, number] {
  const q = (a * a) / (r * r);
  const c2 = Math.cos(2 * theta);
  const s2 = Math.sin(2 * theta);
  return [
    (s / 2) * (1 - q) + (s / 2) * (1 - 4 * q + 3 * q * q) * c2,
    (s / 2) * (1 + q) - (s / 2) * (1 + 3 * q * q) * c2,
    -(s / 2) * (1 + 2 * q - 3 * q * q) * s2,
  ];
}

/**
 * Plane-stress components (x along the vessel, y around it) at (r, θ) for membrane stresses sx
 * along x and sy along y: the load along y is the load along x turned by 90°.
 */
export function stressAroundBore(
  sx: number,
  sy: number,
  a: number,
  r: number,
  theta: number,
): { xx: number; yy: number; xy: number } {
  const [r1, t1, s1] = kirsch(sx, a, r, theta);
  const [r2, t2, s2] = kirsch(sy, a, r, theta - Math.PI / 2);
  const sr = r1 + r2;
  const st = t1 + t2;
  const srt = s1 + s2;
  // polar → Cartesian (rotation of a plane stress state by θ)
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  return {
    xx: sr * c * c + st * s * s - 2 * srt * s * c,
    yy: sr * s * s + st * c * c + 2 * srt * s * c,
    xy: (sr - st) * s * c + srt * (c * c - s * s),
  };
}

/** The demo's point table: which load case it belongs to and the file as an engineer would upload it. */
export type DemoPointTable = {
  projectName: string;
  caseName: string;
  fileName: string;
  /** the file's text: a header, then id, x y z (mm) and six components (MPa), comma-separated */
  text: string;
  layout: { separator: ","; decimal: "."; skipRows: 0; header: true };
  columns: { id: 0; x: 1; y: 2; z: 3; xx: 4; yy: 5; zz: 6; xy: 7; yz: 8; zx: 9 };
  unit: "MPa";
  idKind: "number";
};

/** The hydrostatic test's table around nozzle N2: 125 rings × 240 points = 30,000 points. */
export function ct7NozzlePointTable(): DemoPointTable {
  const test = CT7_SHELL_LOAD_CASES.find((c) => c.name === "Hydrostatic test")!;
  const membrane = thinCylinder(test.pressureMpa, CT7_SHELL.insideRadiusMm, CT7_SHELL.wallMm);
  const a = CT7_NOZZLE_BORE_RADIUS_MM;
  const lines = ["node,x,y,z,sxx,syy,szz,sxy,syz,szx"];
  let node = FIRST_NODE;
  for (let i = 0; i < RINGS; i++) {
    // evenly spaced rings: the region past the allowable stays a few rings deep at the bore
    const r = a * (1 + ((OUTER_RADIUS_RATIO - 1) * i) / (RINGS - 1));
    for (let j = 0; j < POINTS_PER_RING; j++) {
      const theta = (2 * Math.PI * j) / POINTS_PER_RING;
      const s = stressAroundBore(membrane.axial, membrane.hoop, a, r, theta);
      lines.push(
        `${node++},${(r * Math.cos(theta)).toFixed(3)},${(r * Math.sin(theta)).toFixed(3)},0,` +
          `${s.xx.toFixed(4)},${s.yy.toFixed(4)},0,${s.xy.toFixed(4)},0,0`,
      );
    }
  }
  return {
    projectName: CT7_NOZZLE_PROJECT,
    caseName: test.name,
    fileName: "ct7-n2-hydrotest-points.csv",
    text: lines.join("\n") + "\n",
    layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
    columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
    unit: "MPa",
    idKind: "number",
  };
}
