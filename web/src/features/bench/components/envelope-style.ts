import type { Criterion } from "../../../../../core";

/** Stroke style per criterion: distinguished by dash pattern as well as shade, never by colour alone. */
export const ENVELOPE_STYLE: Readonly<Record<Criterion, { dash: string; className: string }>> = {
  "von-mises": { dash: "", className: "stroke-ink" },
  tresca: { dash: "6 3", className: "stroke-graphite" },
  "max-principal": { dash: "2 3", className: "stroke-graphite-soft" },
  "mohr-coulomb": { dash: "8 3 2 3", className: "stroke-close" },
  "modified-mohr": { dash: "1 2", className: "stroke-fail" },
};
