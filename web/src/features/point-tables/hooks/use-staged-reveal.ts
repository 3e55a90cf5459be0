import { startTransition, useEffect, useState } from "react";
import { yieldToPage } from "../model/steps";

/**
 * How many of a view's `sections` to show: the first at once, then one more after each frame is
 * drawn (a frame, then a task of its own), so each section's render, layout and paint is a task of
 * its own rather than one long one. Starts again at 1 when `of` changes.
 */
export function useStagedReveal(sections: number, of: unknown): number {
  const [shown, setShown] = useState({ of, count: 1 });
  const count = shown.of === of ? shown.count : 1;
  useEffect(() => {
    if (count >= sections) return;
    let cancelled = false;
    const frame = requestAnimationFrame(() => {
      void yieldToPage().then(() => {
        if (!cancelled) startTransition(() => setShown({ of, count: count + 1 }));
      });
    });
    return () => {
      cancelled = true;
      cancelAnimationFrame(frame);
    };
  }, [of, count, sections]);
  return count;
}
