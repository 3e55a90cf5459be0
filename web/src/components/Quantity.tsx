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
  /** mark the number by sign meaning with a coloured bar: tension warm, compression cool */
  tone?: "tension" | "compression";
}) {
  // The sign meaning is a coloured bar beside the number (graphics need 3:1 contrast, small text 4.5:1),
  // so the digits stay graphite and readable; the sign itself says the same in words.
  const bar =
    tone === "tension"
      ? "border-tension"
      : tone === "compression"
        ? "border-compression"
        : "border-transparent";
  return (
    <span className={`whitespace-nowrap ${className}`}>
      <span className={`num border-r-[3px] pr-1 ${tone ? bar : "border-transparent"}`} data-tone={tone}>
        {value}
      </span>
      {unit !== undefined && (
        <span className={`unit text-[0.85em] ${unit === "°" ? "" : "ml-1"}`}>{unit}</span>
      )}
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
