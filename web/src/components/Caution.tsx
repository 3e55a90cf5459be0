import { RESULTS_CAUTION } from "../../../core/contract/cautions";

/**
 * The permanent caution that stands near every result and in every report.
 * Quiet by design: it is always there, so it must not shout.
 */
export function Caution({ className = "" }: { className?: string }) {
  return (
    <p className={`text-sm text-graphite-soft ${className}`}>
      <span aria-hidden="true">⚠ </span>
      {RESULTS_CAUTION}
    </p>
  );
}
