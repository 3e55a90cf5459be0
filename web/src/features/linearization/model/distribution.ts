import type { LinearizationResultView } from "../../../../../core/contract/linearizations";

/** The local components in result order, with the names the plot and tables use for them. */
export const LOCAL_COMPONENTS = [
  { index: 0, symbol: "σxx", role: "through-thickness normal" },
  { index: 1, symbol: "σyy", role: "normal, second axis" },
  { index: 2, symbol: "σzz", role: "normal, third axis" },
  { index: 3, symbol: "τxy", role: "transverse shear" },
  { index: 4, symbol: "τyz", role: "in-plane shear" },
  { index: 5, symbol: "τzx", role: "transverse shear" },
] as const;

/** One component through the thickness: the total at each point, and the two linearized lines. */
export type Distribution = {
  /** distances from the first point (length unit) */
  x: number[];
  total: number[];
  /** constant: the membrane value at every x */
  membrane: number[];
  /** membrane + bending, linear from the first surface to the last, at every x */
  membranePlusBending: number[];
  /** whether this component was bent (Annex 5-A bends only σyy and σzz unless every component is) */
  bent: boolean;
};

/**
 * The through-thickness distribution of one local component from the server's result: the total
 * at the points, the membrane, and membrane + bending drawn as the straight line between its two
 * surface values (the bending stress is linear through the thickness by definition).
 * @param result the server's result
 * @param component 0…5, in local xx yy zz xy yz zx order
 */
export function distributionOf(result: LinearizationResultView, component: number): Distribution {
  const t = result.thickness;
  const m = result.membrane[component];
  const start = result.membranePlusBending.start[component];
  const end = result.membranePlusBending.end[component];
  return {
    x: result.x,
    total: result.local.map((row) => row[component]),
    membrane: result.x.map(() => m),
    membranePlusBending: result.x.map((x) => start + ((end - start) * x) / t),
    bent: result.bentComponents.includes(component),
  };
}
