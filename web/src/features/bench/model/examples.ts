import type { StressTensor, StressUnit } from "../../../../../core";

/** A stress state to start from, from the CT-7 demo scenario (invented; every number is fictional). */
export type ExampleState = {
  id: string;
  title: string;
  detail: string;
  unit: StressUnit;
  tensor: StressTensor;
};

const ZERO: StressTensor = { xx: 0, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 };

// CT-7 shell: inside radius r = 600 mm, wall t = 8 mm. Thin-wall membrane formulas (any strength-of-
// materials text): hoop σθ = p·r/t, axial σx = p·r/(2t); at mid-wall the radial stress is about −p/2.
// Axes: x = hoop, y = axial, z = radial.
const R = 600;
const T = 8;
function shell(p: number): StressTensor {
  return { ...ZERO, xx: (p * R) / T, yy: (p * R) / (2 * T), zz: -p / 2 };
}

// Head-to-shell junction, outer surface at design pressure: membrane stresses plus an invented
// discontinuity bending stress σb = 48 MPa in the axial direction (compressive on the outer
// surface here); in a cylindrical shell the hoop bending stress is ν·σb (Mθ = ν·Mx), ν = 0.3.
const BENDING = 48;
const NU = 0.3;

// Agitator shaft surface point: solid shaft d = 45 mm, torque T = 850 N·m, bending M = 420 N·m,
// axial thrust F = 3 kN (compressive). Handbook formulas: τ = 16T/(πd³), σb = 32M/(πd³), σa = F/(πd²/4).
// Axes: x = shaft axis, y = circumferential at the point; N and mm give MPa.
const D = 45;
function shaft(torqueNm: number): StressTensor {
  const tau = (16 * torqueNm * 1e3) / (Math.PI * D ** 3);
  const bending = (32 * 420e3) / (Math.PI * D ** 3);
  const axial = -3e3 / ((Math.PI * D ** 2) / 4);
  return { ...ZERO, xx: bending + axial, xy: tau };
}

// Lifting lug, strain-gauge rosette (rectangular 0/45/90) read during the proof load; invented
// readings ε0 = 980 µε, ε45 = 310 µε, ε90 = −240 µε on S355-like steel, E = 210 GPa, ν = 0.3.
// Rectangular rosette: εx = ε0, εy = ε90, γxy = 2ε45 − ε0 − ε90; plane-stress Hooke's law:
// σx = E(εx + νεy)/(1 − ν²), σy = E(εy + νεx)/(1 − ν²), τxy = G·γxy with G = E/(2(1 + ν)).
function rosette(e0: number, e45: number, e90: number): StressTensor {
  const E = 210e3; // MPa
  const ex = e0 * 1e-6;
  const ey = e90 * 1e-6;
  const gxy = (2 * e45 - e0 - e90) * 1e-6;
  const k = E / (1 - NU * NU);
  return { ...ZERO, xx: k * (ex + NU * ey), yy: k * (ey + NU * ex), xy: (E / (2 * (1 + NU))) * gxy };
}

/** The example states offered on the bench, computed from the demo scenario's numbers. */
export const EXAMPLE_STATES: readonly ExampleState[] = [
  {
    id: "shell-design",
    title: "CT-7 shell, mid-wall — Design 0.9 MPa",
    detail: "membrane σθ = pr/t, σx = pr/2t; x hoop, y axial, z radial",
    unit: "MPa",
    tensor: shell(0.9),
  },
  {
    id: "shell-hydrotest",
    title: "CT-7 shell, mid-wall — Hydrostatic test 1.17 MPa",
    detail: "membrane σθ = pr/t, σx = pr/2t",
    unit: "MPa",
    tensor: shell(1.17),
  },
  {
    id: "shell-vacuum",
    title: "CT-7 shell, mid-wall — Vacuum upset −0.1 MPa",
    detail: "membrane, external pressure: both in compression",
    unit: "MPa",
    tensor: shell(-0.1),
  },
  {
    id: "junction-design",
    title: "CT-7 head-to-shell junction, outer surface — Design",
    detail: "membrane + invented bending 48 MPa axial, ν·48 hoop",
    unit: "MPa",
    tensor: {
      ...ZERO,
      xx: (0.9 * R) / T - NU * BENDING,
      yy: (0.9 * R) / (2 * T) - BENDING,
    },
  },
  {
    id: "lug-rosette",
    title: "CT-7 lifting lug, rosette at the weld toe — proof load",
    detail: "ε = 980 / 310 / −240 µε, E = 210 GPa, ν = 0.3",
    unit: "MPa",
    tensor: rosette(980, 310, -240),
  },
  {
    id: "shaft-steady",
    title: "CT-7 agitator shaft surface — Steady running",
    detail: "d 45 mm, T 850 N·m, M 420 N·m, thrust 3 kN; x along the shaft",
    unit: "MPa",
    tensor: shaft(850),
  },
  {
    id: "shaft-startup",
    title: "CT-7 agitator shaft surface — Start-up",
    detail: "as steady, torque × 2.2 (invented starting-torque factor)",
    unit: "MPa",
    tensor: shaft(850 * 2.2),
  },
];
