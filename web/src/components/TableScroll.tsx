import type { ReactNode } from "react";

/**
 * A table's own box that scrolls sideways when the table is wider than the screen (a phone),
 * so the page itself never does (relative: the header's screen-reader-only text is positioned
 * absolutely and would otherwise stretch the page). It takes the keyboard focus so the arrow keys can scroll it.
 */
export function TableScroll({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className="relative overflow-x-auto rounded border border-rule bg-panel focus-visible:outline focus-visible:outline-2 focus-visible:outline-ink"
    >
      {children}
    </div>
  );
}
