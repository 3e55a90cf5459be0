import {
  IDENTITY_ROTATION,
  type CheckRequirement,
  type Criterion,
  type DecimalMark,
  type ParseProblem,
  type Mat3,
  type StressTensor,
  type StressUnit,
  type Vec3,
} from "../../../../../core";
import { EXAMPLE_STATES } from "./examples";

/** How the stress is typed in. */
export type InputForm = "grid" | "six" | "plane";
/** How the element's rotation is written out and typed. */
export type RotationView = "axis-angle" | "euler";
/** Which Mohr picture is drawn. */
export type MohrView = "3d" | "plane";
/** What a drag on the 3D view turns. */
export type DragTarget = "element" | "view";

/** Euler sequences offered by name (intrinsic, each angle counter-clockwise positive). */
export const EULER_SEQUENCES = ["ZYX", "XYZ", "ZXZ", "ZYZ"] as const;
export type EulerSequence = (typeof EULER_SEQUENCES)[number];

/** Material strengths, always stored in MPa (the unit of the published list); null = not given. */
export type MaterialChoice = {
  /** id of a built-in published material, or null when typed in */
  presetId: string | null;
  yield: number | null;
  ultimateTension: number | null;
  ultimateCompression: number | null;
};

/** How the paste box reads commas: ask when a comma is ambiguous, or the user's stated decimal mark. */
export type DecimalChoice = "ask" | DecimalMark;

/** Whether the material is ductile or brittle: decided from its data (a preset's flag, else a yield strength) or chosen. */
export type BehaviourChoice = "from-data" | "ductile" | "brittle";

/** A project's required factors, one per criterion it checks, and where they come from (for a bench opened from a project row). */
export type ProjectRequirements = {
  requirements: CheckRequirement[];
  /** in words, e.g. "CT-7 shell and heads, load case category “test”: the “test” factors" */
  source: string;
};

/** What undo and redo step through: the tensor and the unit it is written in. */
export type StressSnapshot = { tensor: StressTensor; unit: StressUnit };

/** The whole editor state of the bench. Everything shown is derived from it through core. */
export type BenchState = {
  /** the stress state, in the original x y z axes, in `unit` */
  tensor: StressTensor;
  unit: StressUnit;
  /** the element's frame: rows are x′ y′ z′ written in x y z (core's convention, σ′ = RσRᵀ) */
  rotation: Mat3;
  rotationView: RotationView;
  eulerSequence: EulerSequence;
  material: MaterialChoice;
  /** the safety factor the design must reach, with every criterion (when no project's factors apply) */
  requiredFactor: number;
  /** the factors of the project the state was opened from (they replace `requiredFactor`), or null */
  projectRequirements: ProjectRequirements | null;
  /** ductile or brittle: from the material's data, or the user's choice */
  behaviour: BehaviourChoice;
  /** rate criteria that do not suit the material too, and let them govern (the user asks) */
  includeUnsuited: boolean;
  /** criteria drawn on the envelope plot */
  envelopeCriteria: Criterion[];
  /** optional plane of interest through the element (unit normal in x y z) */
  plane: { enabled: boolean; normal: Vec3 };
  mohrView: MohrView;
  inputForm: InputForm;
  dragTarget: DragTarget;
  /** the last rejected paste, shown beside the input; the tensor is never touched by a failed paste */
  pasteError: string | null;
  /** a short note on what the last successful paste was read as */
  pasteNote: string | null;
  /** the kind of the last refusal the user can resolve by a choice (decimal mark, order), and its text */
  pasteProblem: { problem: ParseProblem; text: string } | null;
  /** the decimal mark pastes are read with (the paste box keeps it per user) */
  pasteDecimal: DecimalChoice;
  /**
   * Input cells whose text is not an acceptable stress (not a number, or beyond the input range).
   * While any is listed, the tensor is not what the user sees, so every result is out of date.
   */
  invalidInputs: string[];
  history: { past: StressSnapshot[]; future: StressSnapshot[] };
};

/** Largest number of undo steps kept. */
export const HISTORY_LIMIT = 100;

/** The state a fresh bench opens with: the CT-7 head-to-shell junction, outer surface, at design pressure. */
export function initialBenchState(): BenchState {
  return {
    tensor: { ...EXAMPLE_STATES.find((e) => e.id === "junction-design")!.tensor },
    unit: "MPa",
    rotation: IDENTITY_ROTATION,
    rotationView: "axis-angle",
    eulerSequence: "ZYX",
    material: { presetId: "s355", yield: 355, ultimateTension: 470, ultimateCompression: 470 },
    requiredFactor: 1.5,
    projectRequirements: null,
    behaviour: "from-data",
    includeUnsuited: false,
    envelopeCriteria: ["von-mises", "tresca"],
    plane: { enabled: false, normal: [1, 1, 0] },
    mohrView: "3d",
    inputForm: "grid",
    dragTarget: "element",
    pasteError: null,
    pasteNote: null,
    pasteProblem: null,
    pasteDecimal: "ask",
    invalidInputs: [],
    history: { past: [], future: [] },
  };
}

/** True when every input cell holds an acceptable stress: the results describe what the user sees. */
export const selectInputValid = (state: Pick<BenchState, "invalidInputs">): boolean =>
  state.invalidInputs.length === 0;
