import type { PointTableOptions, PointTableSpec } from "../../../core/index";

/** A small seeded generator (mulberry32) so every run parses the same text. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Four-digit fractions "0000" … "9999", so a row is formatted without toFixed (which took most of the time). */
const FRACTIONS = Array.from({ length: 10_000 }, (_, i) => String(i).padStart(4, "0"));

/** `v` with `digits` (3 or 4) decimals, as toFixed writes it. */
function fixed(v: number, digits: 3 | 4): string {
  const scale = digits === 4 ? 10_000 : 1000;
  const k = Math.round(Math.abs(v) * scale);
  const whole = Math.floor(k / scale);
  const frac = FRACTIONS[k - whole * scale];
  return `${v < 0 && k !== 0 ? "-" : ""}${whole}.${digits === 4 ? frac : frac.slice(1)}`;
}

/**
 * A generated point table as a finite-element run writes one: a header, then per row an integer
 * id, x y z in mm (3 decimals) and six components in MPa (4 decimals), comma-separated; about 86
 * characters a row.
 */
export function generatePointTableText(rows: number, seed = 20_260_115): string {
  const rnd = seeded(seed);
  const out: string[] = ["id,x,y,z,sxx,syy,szz,sxy,syz,szx\n"];
  const c = () => fixed(rnd() * 1000, 3);
  const s = (a: number) => fixed((rnd() * 2 - 1) * a, 4);
  for (let i = 0; i < rows; i++) {
    out.push(`${i + 1},${c()},${c()},${c()},${s(300)},${s(300)},${s(300)},${s(120)},${s(120)},${s(120)}\n`);
  }
  return out.join("");
}

/** The layout of the generated text. */
export const GENERATED_LAYOUT: PointTableOptions = {
  separator: ",",
  header: true,
  unit: "MPa",
  columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
};

/**
 * The checks of the bench: a steel-like material with all three strengths (Pa), every criterion,
 * unsuited ones included, so every point gets all five safety factors.
 */
export const BENCH_SPEC: PointTableSpec = {
  material: { yield: 250e6, ultimateTension: 400e6, ultimateCompression: 600e6 },
  requirements: [
    { criterion: "von-mises", requiredFactor: 1.5 },
    { criterion: "tresca", requiredFactor: 1.5 },
    { criterion: "max-principal", requiredFactor: 2 },
    { criterion: "mohr-coulomb", requiredFactor: 2 },
    { criterion: "modified-mohr", requiredFactor: 2 },
  ],
};
