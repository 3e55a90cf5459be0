import { useId } from "react";
import type { UtilisationHistogram as Histogram } from "../../../../../core";
import { SvgAxis } from "../../../components/SvgAxis";
import { utilisationColour } from "../model/colour-scale";
import { histogramGeometry } from "../model/histogram";

const W = 520;
const H = 180;
const M = { left: 66, right: 12, top: 10, bottom: 40 };
/** Room for the "u = 1 (required factor)" label at 11 px (98 px in the SVG's units, measured in Chromium) and a margin. */
const LABEL_ROOM = 110;

/** How many points have each governing utilisation, in bins; the line u = 1 is the required factor. */
export function UtilisationHistogram({ histogram }: { histogram: Histogram }) {
  const pw = W - M.left - M.right;
  const ph = H - M.top - M.bottom;
  const g = histogramGeometry(histogram, pw, ph);
  // a page may show two histograms (a table just read and a stored one), so the title's id is the instance's own
  const titleId = useId();
  return (
    <figure className="min-w-0">
      <div className="overflow-x-auto" role="region" aria-label="Utilisation histogram" tabIndex={0}>
        <svg
          viewBox={`0 0 ${W} ${H}`}
          className="block w-full min-w-[420px]"
          role="img"
          aria-labelledby={titleId}
        >
          <title id={titleId}>Histogram of governing utilisation over the points</title>
          <g transform={`translate(${M.left} ${M.top})`}>
            {g.bars.map((b) => (
              <rect
                key={b.from}
                x={b.x}
                y={b.y}
                width={b.width}
                height={b.height}
                fill={utilisationColour(b.from)}
              >
                <title>
                  {`u ${b.from.toFixed(2)}${b.to === null ? " and over" : `–${b.to.toFixed(2)}`}: ${b.count.toLocaleString("en-US")} points (${b.verdict})`}
                </title>
              </rect>
            ))}
            <line
              x1={g.requiredAt}
              x2={g.requiredAt}
              y1={0}
              y2={ph}
              className="stroke-fail"
              strokeDasharray="4 3"
            />
            {/* Beside the line, on whichever side leaves the label inside the plot. */}
            <text
              x={g.requiredAt > pw - LABEL_ROOM ? g.requiredAt - 4 : g.requiredAt + 4}
              y={10}
              textAnchor={g.requiredAt > pw - LABEL_ROOM ? "end" : "start"}
              className="fill-fail text-[11px]"
            >
              u = 1 (required factor)
            </text>
            <SvgAxis
              orient="bottom"
              ticks={g.xTicks}
              range={[0, pw]}
              transform={`translate(0 ${ph})`}
              className="num text-[11px]"
            />
            <SvgAxis
              orient="left"
              ticks={g.yTicks}
              range={[ph, 0]}
              transform="translate(0 0)"
              className="num text-[11px]"
            />
            <text x={pw / 2} y={ph + 34} textAnchor="middle" className="fill-graphite text-[12px]">
              governing utilisation u = n required / n (dimensionless)
            </text>
            <text
              transform={`translate(${-56} ${ph / 2}) rotate(-90)`}
              textAnchor="middle"
              className="fill-graphite text-[12px]"
            >
              points
            </text>
          </g>
        </svg>
      </div>
    </figure>
  );
}
