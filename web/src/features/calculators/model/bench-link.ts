import type { StressTensor } from "../../../../../core";
import { benchLinkForValues } from "../../../lib/bench-link";
import { stressUnitOf, type UnitSet } from "./units";

/**
 * The bench address for a calculated state: the tensor in the calculator's own frame (axes named on
 * its page) and in the unit set's stress unit, so the bench shows the same numbers. View only: a
 * calculated state is not saved anywhere yet.
 */
export function calculatorBenchLink(tensor: StressTensor, units: UnitSet): string {
  return benchLinkForValues(tensor, stressUnitOf(units));
}
