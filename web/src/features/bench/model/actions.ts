// Long because it is the bench store's complete list of pure actions (edit, paste, units,
// undo/redo, examples, rotation): one reducer-like file that tests read as the bench's rules.
/**
 * The bench's named pure actions: `(state, input) → state`. The store, the keyboard, the toolbar
 * buttons and the pointer reducers all call these; none of them does mechanics beyond asking core.
 */
import {
  COMPONENTS,
  IDENTITY_ROTATION,
  convertStress,
  maxShearFrame,
  multiplyMat3,
  orthonormalize,
  parseTensor,
  principalFrame,
  publishedMaterial,
  rotationFromAxisAngle,
  rotationFromEuler,
  stressInputProblem,
  type Component,
  type Criterion,
  type DecimalMark,
  type Mat3,
  type StressTensor,
  type StressUnit,
  type Vec3,
} from "../../../../../core";
import { orderInSymbols } from "../../../lib/stress";
import {
  HISTORY_LIMIT,
  type BenchState,
  type DecimalChoice,
  type DragTarget,
  type EulerSequence,
  type InputForm,
  type MaterialChoice,
  type MohrView,
  type RotationView,
} from "./bench-state";
import { EXAMPLE_STATES } from "./examples";

const SIX = COMPONENTS;

/** Records the current tensor and unit for undo, then applies the change. */
function withHistory(state: BenchState, tensor: StressTensor, unit: StressUnit = state.unit): BenchState {
  if (unit === state.unit && SIX.every((c) => tensor[c] === state.tensor[c])) return state;
  const past = [...state.history.past, { tensor: state.tensor, unit: state.unit }].slice(-HISTORY_LIMIT);
  return { ...state, tensor, unit, pasteError: null, pasteProblem: null, history: { past, future: [] } };
}

/**
 * Sets one component. The tensor is stored by its six independent components, so editing σxy is
 * editing σyx too: the 3×3 grid is symmetric by construction.
 */
export function setComponent(state: BenchState, component: Component, value: number): BenchState {
  if (stressInputProblem(value) !== undefined) return state;
  return withHistory(state, { ...state.tensor, [component]: value });
}

/** The component a cell (row i, column j) of the 3×3 grid shows: (0,1) and (1,0) are both σxy. */
export function componentAt(i: number, j: number): Component {
  const key = `${Math.min(i, j)}${Math.max(i, j)}`;
  const map: Record<string, Component> = {
    "00": "xx",
    "11": "yy",
    "22": "zz",
    "01": "xy",
    "12": "yz",
    "02": "zx",
  };
  return map[key];
}

/** Replaces the whole tensor (and optionally its unit) as one undoable edit. */
export function setTensor(state: BenchState, tensor: StressTensor, unit?: StressUnit): BenchState {
  return withHistory(state, { ...tensor }, unit ?? state.unit);
}

/**
 * Changes the unit. "convert" keeps the physical stress and rewrites the numbers (67.5 MPa → 9790 psi);
 * "reinterpret" keeps the numbers and says they were in the new unit all along (67.5 MPa → 67.5 psi).
 */
export function changeUnit(state: BenchState, unit: StressUnit, mode: "convert" | "reinterpret"): BenchState {
  if (unit === state.unit) return state;
  if (mode === "reinterpret") return withHistory(state, state.tensor, unit);
  const tensor = Object.fromEntries(
    SIX.map((c) => [c, convertStress(state.tensor[c], state.unit, unit)]),
  ) as StressTensor;
  return withHistory(state, tensor, unit);
}

/**
 * Reads pasted text with core's parseTensor, with the decimal mark the user chose (`state.pasteDecimal`
 * unless `choice.decimal` overrides it) and, for six bare values, the order they chose. A failure
 * leaves the tensor as it was and records the message (which names the line and column) and, when a
 * choice resolves it (decimal mark, component order), the problem and the text so the paste box can
 * offer that choice and read the same text again; a success replaces the tensor, adopting the pasted
 * unit when one was written.
 */
export function applyPaste(
  state: BenchState,
  text: string,
  choice: { decimal?: DecimalMark; order?: readonly Component[] } = {},
): BenchState {
  const decimal = choice.decimal ?? (state.pasteDecimal === "ask" ? undefined : state.pasteDecimal);
  const result = parseTensor(text, { decimal, order: choice.order });
  if (!result.ok) {
    const problem = result.error.problem;
    const resolvable = problem === "ambiguous-comma" || problem === "order-needed";
    return {
      ...state,
      pasteError: result.error.message,
      pasteNote: null,
      pasteProblem: resolvable ? { problem, text } : null,
    };
  }
  const unit = result.unit ?? state.unit;
  const next = withHistory(state, result.tensor, unit);
  const form = { matrix: "a 3×3 matrix", components: "six components", plane: "plane stress σx σy τxy" }[
    result.form
  ];
  const point = result.point ? ` of ${result.point.kind} ${result.point.number}` : "";
  const order = choice.order && result.form === "components" ? ` (${orderInSymbols(choice.order)})` : "";
  return {
    ...next,
    pasteError: null,
    pasteProblem: null,
    pasteNote: `Read as ${form}${order}${point}, in ${unit}${result.unit === undefined ? " (no unit written: the bench's unit)" : ""}.`,
    inputForm: result.form === "plane" ? "plane" : next.inputForm,
  };
}

/** Sets the decimal mark pastes are read with ("ask": refuse an ambiguous comma and offer the choice). */
export function setPasteDecimal(state: BenchState, decimal: DecimalChoice): BenchState {
  return state.pasteDecimal === decimal ? state : { ...state, pasteDecimal: decimal };
}

/**
 * Records whether an input cell holds an acceptable stress. While any cell does not, the panels
 * that show results say they are out of date and show no verdict.
 * @param key the cell's name (its accessible label)
 */
export function setInputValidity(state: BenchState, key: string, valid: boolean): BenchState {
  const listed = state.invalidInputs.includes(key);
  if (valid === !listed) return state;
  return {
    ...state,
    invalidInputs: valid ? state.invalidInputs.filter((k) => k !== key) : [...state.invalidInputs, key],
  };
}

/** Clears the paste message. */
export function dismissPasteMessage(state: BenchState): BenchState {
  return { ...state, pasteError: null, pasteNote: null, pasteProblem: null };
}

/** Steps back one stress edit. */
export function undo(state: BenchState): BenchState {
  const { past, future } = state.history;
  if (past.length === 0) return state;
  const previous = past[past.length - 1];
  return {
    ...state,
    tensor: previous.tensor,
    unit: previous.unit,
    history: { past: past.slice(0, -1), future: [{ tensor: state.tensor, unit: state.unit }, ...future] },
  };
}

/** Steps forward again after an undo. */
export function redo(state: BenchState): BenchState {
  const { past, future } = state.history;
  if (future.length === 0) return state;
  const [next, ...rest] = future;
  return {
    ...state,
    tensor: next.tensor,
    unit: next.unit,
    history: { past: [...past, { tensor: state.tensor, unit: state.unit }], future: rest },
  };
}

/** Loads one of the demo-scenario example states (an undoable edit; the element keeps its frame). */
export function loadExample(state: BenchState, id: string): BenchState {
  const example = EXAMPLE_STATES.find((e) => e.id === id);
  if (!example) return state;
  return withHistory(state, example.tensor, example.unit);
}

/** Sets the element's frame (re-orthonormalised so drift never builds up). */
export function setRotation(state: BenchState, rotation: Mat3): BenchState {
  return { ...state, rotation: orthonormalize(rotation) };
}

/**
 * Turns the element about an axis fixed in the original x y z frame (as a drag or an arrow key does):
 * the element's frame becomes R · Rturn, where Rturn = rotationFromAxisAngle(axis, angle).
 */
export function turnElement(state: BenchState, axis: Vec3, angleDeg: number): BenchState {
  if (angleDeg === 0 || !Number.isFinite(angleDeg)) return state;
  return setRotation(state, multiplyMat3(state.rotation, rotationFromAxisAngle(axis, angleDeg)));
}

/** Sets the frame from an axis and an angle, measured from the original axes. */
export function setAxisAngle(state: BenchState, axis: Vec3, angleDeg: number): BenchState {
  if (!(Math.hypot(axis[0], axis[1], axis[2]) > 0) || !Number.isFinite(angleDeg)) return state;
  return setRotation(state, rotationFromAxisAngle(axis, angleDeg));
}

/** Sets the frame from three intrinsic Euler angles in the chosen sequence. */
export function setEuler(state: BenchState, sequence: EulerSequence, angles: Vec3): BenchState {
  if (!angles.every(Number.isFinite)) return state;
  return { ...setRotation(state, rotationFromEuler(sequence, angles)), eulerSequence: sequence };
}

/** Sets the frame to a turn by θ about z alone (the plane-stress angle). */
export function setPlaneAngle(state: BenchState, thetaDeg: number): BenchState {
  if (!Number.isFinite(thetaDeg)) return state;
  return setRotation(state, rotationFromAxisAngle([0, 0, 1], thetaDeg));
}

/** Snaps the element to the principal frame: the readout becomes diag(σ1, σ2, σ3). */
export function snapToPrincipal(state: BenchState): BenchState {
  return setRotation(state, principalFrame(state.tensor));
}

/** Snaps the element to the maximum-shear frame: τmax on the x′ and y′ faces. */
export function snapToMaxShear(state: BenchState): BenchState {
  return setRotation(state, maxShearFrame(state.tensor));
}

/** Turns the element back onto the original axes. */
export function resetRotation(state: BenchState): BenchState {
  return { ...state, rotation: IDENTITY_ROTATION };
}

/** Chooses a built-in material (its published strengths replace the typed ones). */
export function choosePublishedMaterial(state: BenchState, id: string): BenchState {
  const m = publishedMaterial(id);
  if (!m) return state;
  return {
    ...state,
    material: {
      presetId: m.id,
      yield: m.yield ?? null,
      ultimateTension: m.ultimateTension,
      ultimateCompression: m.ultimateCompression,
    },
    envelopeCriteria: m.brittle
      ? ["max-principal", "mohr-coulomb", "modified-mohr"]
      : ["von-mises", "tresca"],
  };
}

/**
 * Types one strength in the bench's unit (stored in MPa); typing makes the material a custom one.
 * A blank, zero or negative value clears the strength (the criteria needing it then say so).
 */
export function setStrength(
  state: BenchState,
  key: keyof Omit<MaterialChoice, "presetId">,
  value: number | null,
): BenchState {
  const mpa =
    value === null || !(value > 0) || !Number.isFinite(value)
      ? null
      : convertStress(value, state.unit, "MPa");
  return { ...state, material: { ...state.material, presetId: null, [key]: mpa } };
}

/** Sets the required safety factor (must be ≥ 1; other values are ignored). */
export function setRequiredFactor(state: BenchState, factor: number): BenchState {
  if (!Number.isFinite(factor) || factor < 1) return state;
  return { ...state, requiredFactor: factor };
}

/** Takes a project's required factors (one per criterion, with where they come from); null returns to the bench's own factor. */
export function setProjectRequirements(
  state: BenchState,
  project: BenchState["projectRequirements"],
): BenchState {
  return { ...state, projectRequirements: project };
}

/** Says whether the material is ductile or brittle, or lets its data decide. */
export function setBehaviour(state: BenchState, behaviour: BenchState["behaviour"]): BenchState {
  return { ...state, behaviour };
}

/** Asks for criteria that do not suit the material to be rated (and to take part in the governing search), or not. */
export function setIncludeUnsuited(state: BenchState, include: boolean): BenchState {
  return { ...state, includeUnsuited: include };
}

/** Shows or hides one criterion's envelope on the σ1–σ2 plot. */
export function toggleEnvelope(state: BenchState, criterion: Criterion): BenchState {
  const on = state.envelopeCriteria.includes(criterion);
  return {
    ...state,
    envelopeCriteria: on
      ? state.envelopeCriteria.filter((c) => c !== criterion)
      : [...state.envelopeCriteria, criterion],
  };
}

/** Sets the plane of interest by its normal (ignored when zero or not finite). */
export function setPlaneNormal(state: BenchState, normal: Vec3): BenchState {
  if (!normal.every(Number.isFinite) || !(Math.hypot(normal[0], normal[1], normal[2]) > 0)) return state;
  return { ...state, plane: { ...state.plane, normal } };
}

/** Shows or hides the plane of interest. */
export function setPlaneEnabled(state: BenchState, enabled: boolean): BenchState {
  return { ...state, plane: { ...state.plane, enabled } };
}

/** Picks the Mohr picture. */
export function setMohrView(state: BenchState, view: MohrView): BenchState {
  return { ...state, mohrView: view };
}

/** Picks the input form. */
export function setInputForm(state: BenchState, form: InputForm): BenchState {
  return { ...state, inputForm: form };
}

/** Picks how the rotation is written. */
export function setRotationView(state: BenchState, view: RotationView): BenchState {
  return { ...state, rotationView: view };
}

/** Picks the Euler sequence used for the readout and for typed angles. */
export function setEulerSequence(state: BenchState, sequence: EulerSequence): BenchState {
  return { ...state, eulerSequence: sequence };
}

/** Picks what a drag on the 3D view turns. */
export function setDragTarget(state: BenchState, target: DragTarget): BenchState {
  return { ...state, dragTarget: target };
}

/** Replaces the shareable part of the state (from a link), keeping history empty. */
export function applyShared(state: BenchState, shared: Partial<BenchState>): BenchState {
  return {
    ...state,
    ...shared,
    history: { past: [], future: [] },
    pasteError: null,
    pasteNote: null,
    pasteProblem: null,
  };
}
