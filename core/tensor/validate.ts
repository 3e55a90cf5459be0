import { MAX_INPUT_STRESS } from "../constants/input-bounds";
import { COMPONENTS, type Mat3, type StressTensor, type Vec3 } from "./types";

/** Throws TypeError/RangeError unless `x` is a finite number. @param x value @param name what it is, for the message */
export function assertFinite(x: unknown, name: string): asserts x is number {
  if (typeof x !== "number") throw new TypeError(`${name} must be a number, got ${typeof x}`);
  if (!Number.isFinite(x)) throw new RangeError(`${name} must be finite, got ${x}`);
}

/** Throws unless `s` has six finite numeric components. @param s tensor @param name argument name */
export function assertTensor(s: unknown, name = "s"): asserts s is StressTensor {
  if (typeof s !== "object" || s === null) throw new TypeError(`${name} must be a StressTensor object`);
  const rec = s as Record<string, unknown>;
  for (const c of COMPONENTS) assertFinite(rec[c], `${name}.${c}`);
}

/** Throws unless `v` is an array of three finite numbers. @param v vector @param name argument name */
export function assertVec3(v: unknown, name: string): asserts v is Vec3 {
  if (!Array.isArray(v) || v.length !== 3) throw new TypeError(`${name} must be an array of 3 numbers`);
  for (let i = 0; i < 3; i++) assertFinite(v[i], `${name}[${i}]`);
}

/** Throws unless `m` is three rows of three finite numbers. @param m matrix @param name argument name */
export function assertMat3(m: unknown, name: string): asserts m is Mat3 {
  if (!Array.isArray(m) || m.length !== 3) throw new TypeError(`${name} must be an array of 3 rows`);
  for (let i = 0; i < 3; i++) assertVec3(m[i], `${name}[${i}]`);
}

export { MAX_INPUT_STRESS };

/**
 * Why a stress value cannot be accepted as input, or undefined when it can: it must be a finite
 * number no larger in magnitude than {@link MAX_INPUT_STRESS}.
 * @param value the value, in the unit it was entered in
 * @returns a short reason ("is not a finite number", "is larger than 1e12 in magnitude …") to follow
 *   the field's name
 */
export function stressInputProblem(value: number): string | undefined {
  if (typeof value !== "number" || !Number.isFinite(value)) return "is not a finite number";
  if (Math.abs(value) > MAX_INPUT_STRESS) {
    return (
      `is larger than ${MAX_INPUT_STRESS.toExponential()} in magnitude: no real stress is near it, ` +
      "and results at that scale would overflow or lose every smaller component"
    );
  }
  return undefined;
}
