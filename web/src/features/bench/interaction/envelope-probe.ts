/**
 * The envelope plot's probe moved by the keyboard, as a pure reducer: arrows step it by a
 * twentieth of the plot's half-width (five times that with Shift), clamped to the plot; Home puts
 * it on the state (or the origin); Escape removes it.
 */

/** The probed point (σA, σB) in the bench unit, or none. */
export type Probe = readonly [number, number] | null;

/** Fraction of the plot's half-width one arrow press moves the probe. */
export const PROBE_STEP = 1 / 20;
/** Shift multiplies the step by this. */
export const PROBE_SHIFT_FACTOR = 5;

const MOVES: Readonly<Record<string, readonly [number, number]>> = {
  ArrowRight: [1, 0],
  ArrowLeft: [-1, 0],
  ArrowUp: [0, 1],
  ArrowDown: [0, -1],
};

/**
 * The probe after a key press.
 * @param probe where it is now (null: not shown; arrows then start from the origin)
 * @param key the KeyboardEvent key
 * @param shift whether Shift is held
 * @param extent the plot spans −extent … extent on both axes
 * @param state the state (σA, σB), or null when it is not plane stress
 * @returns the new probe, or undefined when the key does not move it (let the browser have it)
 */
export function probeAfterKey(
  probe: Probe,
  key: string,
  shift: boolean,
  extent: number,
  state: readonly [number, number] | null,
): Probe | undefined {
  if (key === "Escape") return null;
  if (key === "Home") return probeStart(state);
  const move = MOVES[key];
  if (!move) return undefined;
  const step = extent * PROBE_STEP * (shift ? PROBE_SHIFT_FACTOR : 1);
  const at = probe ?? [0, 0];
  const clamp = (v: number) => Math.max(-extent, Math.min(extent, v));
  return [clamp(at[0] + move[0] * step), clamp(at[1] + move[1] * step)];
}

/** Where a keyboard user's probe starts: on the state, or the origin when there is none. */
export function probeStart(state: readonly [number, number] | null): readonly [number, number] {
  return state ? [state[0], state[1]] : [0, 0];
}
