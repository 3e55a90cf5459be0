/**
 * Angle types and conversions. Degrees at the public API, radians only inside `Math.*` calls;
 * the brands keep the two from being mixed silently.
 */

declare const degreesBrand: unique symbol;
declare const radiansBrand: unique symbol;

/** An angle in degrees (counter-clockwise positive unless a function says otherwise). */
export type Degrees = number & { readonly [degreesBrand]: true };
/** An angle in radians. */
export type Radians = number & { readonly [radiansBrand]: true };

/** Marks a plain number as degrees. @param value angle, degrees */
export function deg(value: number): Degrees {
  return value as Degrees;
}

/** Marks a plain number as radians. @param value angle, radians */
export function rad(value: number): Radians {
  return value as Radians;
}

/** Converts degrees to radians. @param angle angle, degrees */
export function degToRad(angle: Degrees | number): Radians {
  return ((angle * Math.PI) / 180) as Radians;
}

/** Converts radians to degrees. @param angle angle, radians */
export function radToDeg(angle: Radians | number): Degrees {
  return ((angle * 180) / Math.PI) as Degrees;
}

/**
 * Cosine and sine of an angle given in degrees, exact (0, ±1) at whole multiples of 90°.
 * The angle is reduced to [0°, 360°) before conversion, so large angles keep their accuracy.
 * @param angle angle, degrees
 * @returns `[cos, sin]`
 */
export function cosSinDeg(angle: Degrees | number): [number, number] {
  let d = angle % 360;
  if (d < 0) d += 360;
  if (d === 0) return [1, 0];
  if (d === 90) return [0, 1];
  if (d === 180) return [-1, 0];
  if (d === 270) return [0, -1];
  const r = degToRad(d);
  return [Math.cos(r), Math.sin(r)];
}
