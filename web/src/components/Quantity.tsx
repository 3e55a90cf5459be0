import type { ReactNode } from "react";

/**
 * A value with its unit, as on a calculation sheet: the number in JetBrains Mono with tabular
 * figures (so columns align), the unit after it in a lighter weight. `value` is already formatted.
 */
export function Quantity({
  value,
  unit,
  className = "",
  tone,
}: {
  value: string;
  unit?: ReactNode;
  className?: string;
  /** colour the number by sign meaning: tension warm, compression cool */
  tone?: "tension" | "compression";
}) {
  const colour = tone === "tension" ? "text-tension" : tone === "compression" ? "text-compression" : "";
  return (
    <span className={`whitespace-nowrap ${className}`}>
      <span className={`num ${colour}`}>{value}</span>
      {unit !== undefined && <span className="unit ml-1 text-[0.85em]">{unit}</span>}
    </span>
  );
}

/**
 * Tone for a stress value by its sign; values within rounding of zero get none.
 * @param value stress, tension positive
 * @param scale the largest stress it is shown beside (values below 1e-9 of it count as zero)
 */
export function stressTone(value: number, scale = Math.abs(value)): "tension" | "compression" | undefined {
  if (Math.abs(value) <= 1e-9 * scale || value === 0) return undefined;
  return value > 0 ? "tension" : "compression";
}
