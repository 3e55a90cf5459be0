/**
 * The permanent caution that stands near every result and in every report.
 * Quiet by design: it is always there, so it must not shout.
 */
export function Caution({ className = "" }: { className?: string }) {
  return (
    <p className={`text-sm text-graphite-soft ${className}`}>
      <span aria-hidden="true">⚠ </span>
      Sigmacube is a screening and checking tool. Results assume linear-elastic material and small strains;
      the governing design code and a licensed engineer decide whether a design is acceptable.
    </p>
  );
}
