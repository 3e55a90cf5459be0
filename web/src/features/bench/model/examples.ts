import { COMPONENTS, convertStress, type StressTensor, type StressUnit } from "../../../../../core";
import {
  CT7_LOCATIONS,
  CT7_LUG,
  CT7_SHELL_LOAD_CASES,
  ct7State,
  type Ct7ShellCaseName,
} from "../../../../../core/demo-data/ct7-scenario";

/** A stress state to start from, from the CT-7 demo scenario (invented; every number is fictional). */
export type ExampleState = {
  id: string;
  title: string;
  /** the state's note from the scenario: what it is and the formula it came from */
  detail: string;
  unit: StressUnit;
  tensor: StressTensor;
};

const SHELL = "CT-7 shell and heads";
const LUG = "CT-7 lifting lug";
const SHAFT = "CT-7 agitator shaft";

/** The scenario's states are in Pa; the bench shows them in MPa. */
function inMegapascals(tensor: StressTensor): StressTensor {
  const out = { ...tensor };
  for (const c of COMPONENTS) out[c] = convertStress(tensor[c], "Pa", "MPa");
  return out;
}

/** A load case's name with its pressure, e.g. "Vacuum upset −0.1 MPa". */
function withPressure(name: Ct7ShellCaseName): string {
  const p = CT7_SHELL_LOAD_CASES.find((c) => c.name === name)!.pressureMpa;
  return `${name} ${String(p).replace("-", "−")} MPa`;
}

/** Which scenario states the bench offers, under which id and title (the ids are kept in links). */
const PICKS: { id: string; title: string; project: string; loadCase: string; location: string }[] = [
  {
    id: "shell-design",
    title: `CT-7 shell, mid-shell — ${withPressure("Design")}`,
    project: SHELL,
    loadCase: "Design",
    location: CT7_LOCATIONS.midShell,
  },
  {
    id: "shell-hydrotest",
    title: `CT-7 shell, mid-shell — ${withPressure("Hydrostatic test")}`,
    project: SHELL,
    loadCase: "Hydrostatic test",
    location: CT7_LOCATIONS.midShell,
  },
  {
    id: "shell-vacuum",
    title: `CT-7 shell, mid-shell — ${withPressure("Vacuum upset")}`,
    project: SHELL,
    loadCase: "Vacuum upset",
    location: CT7_LOCATIONS.midShell,
  },
  {
    id: "junction-design",
    title: `CT-7 head-to-shell junction, outer surface — ${withPressure("Design")}`,
    project: SHELL,
    loadCase: "Design",
    location: CT7_LOCATIONS.junction,
  },
  {
    id: "junction-hydrotest",
    title: `CT-7 head-to-shell junction, outer surface — ${withPressure("Hydrostatic test")}`,
    project: SHELL,
    loadCase: "Hydrostatic test",
    location: CT7_LOCATIONS.junction,
  },
  {
    id: "lug-tilted",
    title: `CT-7 lifting lug, weld toe — Tilted lift at ${CT7_LUG.tiltDeg}°`,
    project: LUG,
    loadCase: `Tilted lift at ${CT7_LUG.tiltDeg}°`,
    location: CT7_LOCATIONS.lugWeldToe,
  },
  {
    id: "lug-rosette",
    title: "CT-7 lifting lug, rosette at the weld toe — proof load",
    project: LUG,
    loadCase: "Proof load (rosette)",
    location: CT7_LOCATIONS.lugWeldToe,
  },
  {
    id: "shaft-steady",
    title: "CT-7 agitator shaft surface — Steady running",
    project: SHAFT,
    loadCase: "Steady running",
    location: CT7_LOCATIONS.shaftCoupling,
  },
  {
    id: "shaft-startup",
    title: "CT-7 agitator shaft surface — Start-up",
    project: SHAFT,
    loadCase: "Start-up",
    location: CT7_LOCATIONS.shaftCoupling,
  },
];

/** The example states offered on the bench: the demo scenario's own states (core/demo), in MPa. */
export const EXAMPLE_STATES: readonly ExampleState[] = PICKS.map((pick) => {
  const state = ct7State(pick.project, pick.loadCase, pick.location);
  return {
    id: pick.id,
    title: pick.title,
    detail: state.note,
    unit: "MPa",
    tensor: inMegapascals(state.tensor),
  };
});
