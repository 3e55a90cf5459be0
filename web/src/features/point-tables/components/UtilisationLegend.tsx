import { COLOUR_TOP, legendTicks, utilisationColour } from "../model/colour-scale";

/**
 * The scatter's key: a strip of the colour scale with round utilisations under it and the
 * required factor (u = 1) marked by a rule and named, read left to right like the histogram.
 */
export function UtilisationLegend() {
  const ticks = legendTicks(0.25);
  const stops = Array.from({ length: 11 }, (_, k) => (k / 10) * COLOUR_TOP);
  return (
    <figure className="w-full max-w-md" aria-label="Colour key: governing utilisation">
      <figcaption className="mb-1 text-[13px] text-graphite-soft">
        colour: governing utilisation u (dimensionless)
      </figcaption>
      <div
        className="relative h-3 rounded-sm border border-rule"
        style={{
          background: `linear-gradient(to right, ${stops.map((u) => utilisationColour(u)).join(", ")})`,
        }}
      >
        <div
          className="absolute -top-1 h-5 w-px bg-graphite"
          style={{ left: `${(1 / COLOUR_TOP) * 100}%` }}
        />
      </div>
      <div className="relative h-5">
        {ticks.map((t) => (
          <span
            key={t.u}
            className={`num absolute top-0.5 whitespace-nowrap text-[11px] ${t.at >= 1 ? "-translate-x-full" : t.at > 0 ? "-translate-x-1/2" : ""} ${t.required ? "font-semibold text-graphite" : "text-graphite-soft"}`}
            style={{ left: `${t.at * 100}%` }}
          >
            {t.label}
          </span>
        ))}
      </div>
      <p className="text-[12px] text-graphite-soft">
        u = 1.00: the required factor; above it the point fails.
      </p>
    </figure>
  );
}
