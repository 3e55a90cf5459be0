/** Which points "keep as location" takes: a set of point indices the engineer ticks and unticks. */
import type { TableEvaluation } from "./merge-evaluations";

/** The governing point of every rated criterion, each once: what is offered for keeping first. */
export function governingSelection(evaluation: Pick<TableEvaluation, "criteria">): Set<number> {
  const out = new Set<number>();
  for (const c of evaluation.criteria) if (c.governing !== null) out.add(c.governing.index);
  return out;
}

/** The set with `index` added, or removed when it was there (a new set: React state). */
export function toggleIn(set: ReadonlySet<number>, index: number): Set<number> {
  const next = new Set(set);
  if (!next.delete(index)) next.add(index);
  return next;
}
