/**
 * Joins the ratings of a table's parts (one per worker, in file order) into the rating of the
 * whole, as core's PointTableEvaluator would give it in one piece: point indices shifted by the
 * points of the parts before, the governing point per criterion the highest utilisation (the
 * earlier point on a tie), counts and histogram bins added, the worst points merged.
 */
import type { PartEvaluation } from "./part-task";

export type TableEvaluation = PartEvaluation;

const FIRST_BAD_POINTS = 10;

export function mergeEvaluations(parts: readonly PartEvaluation[], worstCount: number): TableEvaluation {
  if (parts.length === 0) throw new RangeError("mergeEvaluations needs at least one part");
  if (parts.length === 1) return parts[0];
  const count = parts.reduce((s, p) => s + p.count, 0);
  const utilisation = new Float64Array(count);
  const worst: { index: number; utilisation: number }[] = [];
  const counts = parts[0].histogram.counts.map(() => 0);
  const criteria = parts[0].criteria.map((c) => ({
    ...c,
    governing: null as typeof c.governing,
    failing: 0,
    close: 0,
  }));
  const badFirst: number[] = [];
  let badCount = 0;
  let failing = 0;
  let close = 0;
  let offset = 0;
  for (const p of parts) {
    utilisation.set(p.utilisation, offset);
    for (const w of p.worst) worst.push({ index: w.index + offset, utilisation: w.utilisation });
    p.histogram.counts.forEach((n, k) => (counts[k] += n));
    p.criteria.forEach((c, i) => {
      const into = criteria[i];
      into.failing += c.failing;
      into.close += c.close;
      const g = c.governing;
      if (g !== null && (into.governing === null || g.utilisation > into.governing.utilisation)) {
        into.governing = { ...g, index: g.index + offset };
      }
    });
    for (const k of p.badPoints.first) if (badFirst.length < FIRST_BAD_POINTS) badFirst.push(k + offset);
    badCount += p.badPoints.count;
    failing += p.failing;
    close += p.close;
    offset += p.count;
  }
  worst.sort((a, b) => b.utilisation - a.utilisation || a.index - b.index);
  return {
    count,
    utilisation,
    worst: worst.slice(0, worstCount),
    histogram: { ...parts[0].histogram, counts },
    criteria,
    failing,
    close,
    badPoints: { count: badCount, first: badFirst },
  };
}
