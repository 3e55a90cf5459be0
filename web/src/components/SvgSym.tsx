/** A symbol with a real subscript inside SVG text (Unicode subscript letters fall back to other fonts). */
export function SvgSym({ base, sub, after = " " }: { base: string; sub: string; after?: string }) {
  return (
    <>
      {base}
      <tspan dy={3} fontSize="0.75em">
        {sub}
      </tspan>
      {/* Back to the baseline; `after` carries what follows the subscript (a space, or a comma). */}
      <tspan dy={-3}>{after}</tspan>
    </>
  );
}
