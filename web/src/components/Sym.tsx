/**
 * A typeset symbol: a Greek letter (or any base) with a real subscript and optional prime,
 * e.g. <Sym base="σ" sub="x′y′" /> or <Sym base="τ" sub="max" />.
 */
export function Sym({ base, sub, className = "" }: { base: string; sub?: string; className?: string }) {
  return (
    <span className={`whitespace-nowrap italic-none ${className}`}>
      {base}
      {sub && <sub className="text-[0.72em] leading-none">{sub}</sub>}
    </span>
  );
}
