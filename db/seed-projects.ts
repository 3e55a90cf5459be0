import type { Transaction } from "sequelize";
import { AuditEvent } from "./models/audit-event";
import { Combination } from "./models/combination";
import { CombinationTerm } from "./models/combination-term";
import { LoadCase } from "./models/load-case";
import { Location } from "./models/location";
import { Material } from "./models/material";
import { Project } from "./models/project";
import { StressState } from "./models/stress-state";
import { Workspace } from "./models/workspace";
import { DEMO_WORKSPACE_NAME } from "./seed-accounts";

/**
 * Seed step "projects": the CT-7 projects of the demo scenario (every name and number
 * invented), their states computed here from the scenario's inputs with handbook formulas.
 * The shell's hydrostatic test at the head-to-shell junction governs and fails the required
 * factor of 1.5 (Tresca n ≈ 1.30), so the demo shows what a failure looks like.
 */

const MPA = 1e6;
/** Standard gravity, m/s² (exact by definition). */
const G0 = 9.80665;

type Plane = { xx: number; yy: number; xy?: number };
type SeedState = { location: string; mpa: Plane; source: "calculator" | "measured"; note: string };
type SeedCase = { name: string; category: string; description: string; states: SeedState[] };

// ── CT-7 shell and heads ──────────────────────────────────────────────────────────────
const SHELL_RADIUS_MM = 600;
const SHELL_WALL_MM = 8;
/**
 * Invented discontinuity bending at the head-to-shell junction, proportional to pressure:
 * σb = 133 × p (MPa per MPa), added to the axial membrane stress on the surface.
 */
const JUNCTION_BENDING_PER_MPA = 133;

/** Thin-wall cylinder membrane stresses: σθ = p·r/t (hoop), σx = p·r/(2t) (axial). */
function membrane(pMpa: number): Plane {
  const hoop = (pMpa * SHELL_RADIUS_MM) / SHELL_WALL_MM;
  return { xx: hoop / 2, yy: hoop };
}

function shellCase(name: string, category: string, pMpa: number): SeedCase {
  const m = membrane(pMpa);
  return {
    name,
    category,
    description: `Internal pressure ${pMpa} MPa.`,
    states: [
      {
        location: "mid-shell",
        mpa: m,
        source: "calculator",
        note: "thin-wall membrane: σθ = pr/t, σx = pr/2t (x axial, y hoop), r = 600 mm, t = 8 mm",
      },
      {
        location: "head-to-shell junction",
        mpa: { xx: m.xx + JUNCTION_BENDING_PER_MPA * pMpa, yy: m.yy },
        source: "calculator",
        note: "membrane plus an assumed discontinuity bending σb = 133·p on σx (outer surface)",
      },
    ],
  };
}

// ── CT-7 lifting lug ──────────────────────────────────────────────────────────────────
/** Empty tank 2.4 t with a dynamic factor of 1.5, taken by one lug (conservative). */
const LUG_LOAD_N = 2400 * G0 * 1.5;
const LUG = { thicknessMm: 12, widthMm: 80, holeMm: 30, leverMm: 80 };

function lugCases(): SeedCase[] {
  const area = LUG.widthMm * LUG.thicknessMm; // mm², section at the weld
  const netArea = (LUG.widthMm - LUG.holeMm) * LUG.thicknessMm; // mm², net section at the pin hole
  const vertical = LUG_LOAD_N;
  const tiltV = LUG_LOAD_N * Math.cos(Math.PI / 6);
  const tiltH = LUG_LOAD_N * Math.sin(Math.PI / 6);
  // In-plane bending at the weld from the horizontal component: σb = H·h / (t·b²/6).
  const bending = (tiltH * LUG.leverMm) / ((LUG.thicknessMm * LUG.widthMm ** 2) / 6);
  return [
    {
      name: "Vertical lift",
      category: "lifting",
      description: "Empty tank 2.4 t, dynamic factor 1.5, one lug taking the whole load.",
      states: [
        {
          location: "lug weld toe",
          mpa: { xx: vertical / area, yy: 0 },
          source: "calculator",
          note: "σ = F/(b·t)",
        },
        {
          location: "pin hole net section",
          mpa: { xx: vertical / netArea, yy: 0 },
          source: "calculator",
          note: "σ = F/((b − d)·t), no Kt",
        },
      ],
    },
    {
      name: "Tilted lift at 30°",
      category: "lifting",
      description: "Sling at 30° from vertical: V = F·cos 30°, H = F·sin 30° at 80 mm above the weld.",
      states: [
        {
          location: "lug weld toe",
          mpa: { xx: tiltV / area + bending, yy: 0, xy: tiltH / area },
          source: "calculator",
          note: "σ = V/(b·t) + H·h/(t·b²/6), τ = H/(b·t)",
        },
        {
          location: "pin hole net section",
          mpa: { xx: tiltV / netArea, yy: 0, xy: tiltH / netArea },
          source: "calculator",
          note: "σ = V/((b − d)·t), τ = H/((b − d)·t), no Kt",
        },
      ],
    },
    {
      name: "Proof load (rosette)",
      category: "test",
      description: "Rectangular rosette 0/45/90 at the weld toe read during the proof load.",
      states: [
        {
          location: "lug weld toe",
          mpa: rosette(420, 150, -90),
          source: "measured",
          note: "ε0 = 420, ε45 = 150, ε90 = −90 µε; E = 210 GPa, ν = 0.3",
        },
      ],
    },
  ];
}

/**
 * Plane stress from a rectangular rosette (0/45/90, microstrain): εx = ε0, εy = ε90,
 * γxy = 2ε45 − ε0 − ε90; σx = E/(1−ν²)(εx + νεy), σy = E/(1−ν²)(εy + νεx), τ = E/(2(1+ν))·γxy.
 */
function rosette(e0: number, e45: number, e90: number): Plane {
  const E = 210_000; // MPa, S355-like steel
  const nu = 0.3;
  const [ex, ey, gxy] = [e0 * 1e-6, e90 * 1e-6, (2 * e45 - e0 - e90) * 1e-6];
  const k = E / (1 - nu * nu);
  return { xx: k * (ex + nu * ey), yy: k * (ey + nu * ex), xy: (E / (2 * (1 + nu))) * gxy };
}

// ── CT-7 agitator shaft ───────────────────────────────────────────────────────────────
const SHAFT = { diameterMm: 45, torqueNm: 850, momentNm: 420, thrustN: 3000 };
/** Invented start-up torque peak: 1.8 × the running torque. */
const START_UP_TORQUE_FACTOR = 1.8;

/** Solid shaft: σ = 32M/(πd³) + 4P/(πd²), τ = 16T/(πd³) (N, mm → MPa). */
function shaftState(torqueNm: number): Plane {
  const d = SHAFT.diameterMm;
  const sigma = (32 * SHAFT.momentNm * 1e3) / (Math.PI * d ** 3) + (4 * SHAFT.thrustN) / (Math.PI * d ** 2);
  const tau = (16 * torqueNm * 1e3) / (Math.PI * d ** 3);
  return { xx: sigma, yy: 0, xy: tau };
}

const shaftNote = "σ = 32M/πd³ + 4P/πd², τ = 16T/πd³; d = 45 mm, M = 420 N·m, P = 3 kN";

/** Creates one project with its locations, cases, states and combinations. */
async function createProject(
  transaction: Transaction,
  workspaceId: string,
  ownerId: string | null,
  spec: {
    name: string;
    description: string;
    requirements: { criterion: string; requiredFactor: number }[];
    material: { publishedId?: string; libraryId?: string };
    locations: string[];
    cases: SeedCase[];
    combinations?: { name: string; description: string; terms: { caseName: string; factor: number }[] }[];
  },
): Promise<void> {
  const who = { createdBy: ownerId, updatedBy: ownerId };
  const project = await Project.create(
    {
      workspaceId,
      name: spec.name,
      description: spec.description,
      unitSystem: "SI",
      requirements: spec.requirements,
      defaultPublishedMaterial: spec.material.publishedId ?? null,
      defaultMaterialId: spec.material.libraryId ?? null,
      ...who,
    },
    { transaction },
  );
  const locationIds = new Map<string, string>();
  for (const [position, name] of spec.locations.entries()) {
    const l = await Location.create({ projectId: project.id, name, position, ...who }, { transaction });
    locationIds.set(name, l.id);
  }
  const caseIds = new Map<string, string>();
  for (const [position, c] of spec.cases.entries()) {
    const row = await LoadCase.create(
      {
        projectId: project.id,
        name: c.name,
        category: c.category,
        description: c.description,
        position,
        ...who,
      },
      { transaction },
    );
    caseIds.set(c.name, row.id);
    for (const s of c.states) {
      await StressState.create(
        {
          loadCaseId: row.id,
          locationId: locationIds.get(s.location)!,
          revision: 1,
          isCurrent: true,
          xxPa: s.mpa.xx * MPA,
          yyPa: s.mpa.yy * MPA,
          zzPa: 0,
          xyPa: (s.mpa.xy ?? 0) * MPA,
          yzPa: 0,
          zxPa: 0,
          unit: "MPa",
          source: s.source,
          note: s.note,
          createdBy: ownerId,
        },
        { transaction },
      );
    }
  }
  for (const [position, combo] of (spec.combinations ?? []).entries()) {
    const row = await Combination.create(
      { projectId: project.id, name: combo.name, description: combo.description, position, ...who },
      { transaction },
    );
    await CombinationTerm.bulkCreate(
      combo.terms.map((t, i) => ({
        combinationId: row.id,
        loadCaseId: caseIds.get(t.caseName)!,
        factor: t.factor,
        position: i,
      })),
      { transaction },
    );
  }
  await AuditEvent.create(
    {
      workspaceId,
      projectId: project.id,
      entityType: "project",
      entityId: project.id,
      action: "create",
      actorId: ownerId,
      actorName: "demo seed",
      summary: `created the demo project "${project.name}"`,
    },
    { transaction },
  );
}

/** Adds the demo projects to the demo workspace (skipped when it is missing or already has projects). */
export async function seedDemoProjects(transaction: Transaction, log: (line: string) => void): Promise<void> {
  const workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE_NAME }, transaction });
  if (!workspace) return;
  if ((await Project.count({ where: { workspaceId: workspace.id }, transaction })) > 0) return;
  const owner = workspace.createdBy;

  const shaftBar = await Material.create(
    {
      workspaceId: workspace.id,
      name: "Agitator shaft bar, heat QC-5120",
      unit: "MPa",
      yieldPa: 460 * MPA,
      ultimateTensionPa: 700 * MPA,
      ultimateCompressionPa: 700 * MPA,
      elasticModulusPa: 210_000 * MPA,
      poissonRatio: 0.3,
      reference: "Quillon incoming certificate QC-5120 (demo data)",
      note: "Quenched and tempered bar; values from the certificate of the demo scenario.",
      createdBy: owner,
      updatedBy: owner,
    },
    { transaction },
  );

  await createProject(transaction, workspace.id, owner, {
    name: "CT-7 shell and heads",
    description:
      "Carbonation tank CT-7 for the Harrowgate Brewing Cooperative: cylindrical shell, inside radius 600 mm, wall 8 mm, design pressure 0.9 MPa.",
    requirements: [
      { criterion: "von-mises", requiredFactor: 1.5 },
      { criterion: "tresca", requiredFactor: 1.5 },
    ],
    material: { publishedId: "sa516-70" },
    locations: ["mid-shell", "head-to-shell junction"],
    cases: [
      shellCase("Operating", "operating", 0.75),
      shellCase("Design", "design", 0.9),
      shellCase("Hydrostatic test", "test", 1.17),
      shellCase("Vacuum upset", "upset", -0.1),
    ],
  });
  await createProject(transaction, workspace.id, owner, {
    name: "CT-7 lifting lug",
    description: "Plate lug 80 × 12 mm welded to the top head, pin hole 30 mm.",
    requirements: [
      { criterion: "von-mises", requiredFactor: 1.8 },
      { criterion: "tresca", requiredFactor: 1.8 },
    ],
    material: { publishedId: "s355" },
    locations: ["lug weld toe", "pin hole net section"],
    cases: lugCases(),
    combinations: [
      {
        name: "Tilted lift with proof factor 1.25",
        description: "The tilted lift scaled to the proof load.",
        terms: [{ caseName: "Tilted lift at 30°", factor: 1.25 }],
      },
    ],
  });
  await createProject(transaction, workspace.id, owner, {
    name: "CT-7 agitator shaft",
    description: "Solid shaft Ø45 mm: torque 850 N·m, bending moment 420 N·m, axial thrust 3 kN.",
    requirements: [
      { criterion: "von-mises", requiredFactor: 2 },
      { criterion: "tresca", requiredFactor: 2 },
    ],
    material: { libraryId: shaftBar.id },
    locations: ["shaft surface at the coupling"],
    cases: [
      {
        name: "Start-up",
        category: "operating",
        description: `Torque peak ${START_UP_TORQUE_FACTOR} × 850 N·m at start-up.`,
        states: [
          {
            location: "shaft surface at the coupling",
            mpa: shaftState(SHAFT.torqueNm * START_UP_TORQUE_FACTOR),
            source: "calculator",
            note: `${shaftNote}, T = 1530 N·m`,
          },
        ],
      },
      {
        name: "Steady running",
        category: "operating",
        description: "Torque 850 N·m.",
        states: [
          {
            location: "shaft surface at the coupling",
            mpa: shaftState(SHAFT.torqueNm),
            source: "calculator",
            note: `${shaftNote}, T = 850 N·m`,
          },
        ],
      },
    ],
  });
  await createProject(transaction, workspace.id, owner, {
    name: "CT-7 nozzle N2 (FE points)",
    description:
      "Finite-element point tensors around nozzle N2. Point tables (CSV uploads evaluated in the browser) come in a later version; this project is empty until then.",
    requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
    material: { publishedId: "sa516-70" },
    locations: [],
    cases: [],
  });
  log(`demo projects: 4 CT-7 projects in "${DEMO_WORKSPACE_NAME}"`);
}
