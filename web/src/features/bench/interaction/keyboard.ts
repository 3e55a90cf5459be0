/**
 * Keyboard turning as a pure mapping: a key (with modifiers) to a turn about one of the view's axes.
 * Arrow left/right turn about the screen's vertical, up/down about its horizontal, Page Up/Down
 * (or [ and ]) about the line of sight. Steps: 5°, Shift 15°, Alt 1°.
 */
import type { Vec3 } from "../../../../../core";
import type { ViewBasis } from "./trackball";

/** Step sizes, degrees. */
export const KEY_STEP = { normal: 5, large: 15, fine: 1 } as const;

/** The turn a key asks for, in the view's axes (0 right, 1 up, 2 towards the viewer), or null. */
export function keyTurn(
  key: string,
  modifiers: { shiftKey: boolean; altKey: boolean },
): { viewAxis: 0 | 1 | 2; angleDeg: number } | null {
  const step = modifiers.shiftKey ? KEY_STEP.large : modifiers.altKey ? KEY_STEP.fine : KEY_STEP.normal;
  switch (key) {
    case "ArrowRight":
      return { viewAxis: 1, angleDeg: step };
    case "ArrowLeft":
      return { viewAxis: 1, angleDeg: -step };
    case "ArrowUp":
      return { viewAxis: 0, angleDeg: -step };
    case "ArrowDown":
      return { viewAxis: 0, angleDeg: step };
    case "PageUp":
    case "]":
      return { viewAxis: 2, angleDeg: step };
    case "PageDown":
    case "[":
      return { viewAxis: 2, angleDeg: -step };
    default:
      return null;
  }
}

/** The view axis written in x y z. */
export function viewAxisInWorld(basis: ViewBasis, viewAxis: 0 | 1 | 2): Vec3 {
  return basis[viewAxis];
}
