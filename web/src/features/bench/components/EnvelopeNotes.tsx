/**
 * Beside the envelope plot: the criteria to draw (each with its line style), the probe's reading
 * and what the state's ray meets.
 */
import { CRITERIA, type Criterion } from "../../../../../core";
import { CRITERION_LABEL, type envelopeProbe } from "../model/derive";
import { factor, fixed } from "../model/format";
import { ENVELOPE_STYLE } from "./envelope-style";

export function EnvelopeNotes({
  chosen,
  onToggle,
  unit,
  decimals: d,
  probe,
  reading,
  state,
  pairNames,
  ray,
  first,
}: {
  chosen: readonly Criterion[];
  onToggle: (c: Criterion) => void;
  unit: string;
  decimals: number;
  probe: readonly [number, number] | null;
  reading: ReturnType<typeof envelopeProbe> | null;
  state: readonly [number, number] | null;
  pairNames: readonly string[] | null;
  ray: { n: number } | null;
  first: Criterion | undefined;
}) {
  return (
    <div className="min-w-0 flex-1 space-y-1 text-[12px] leading-4">
      <fieldset>
        <legend className="mb-0.5 text-graphite-soft">Draw</legend>
        {CRITERIA.map((c) => (
          <label key={c} className="flex items-center gap-1.5">
            <input type="checkbox" checked={chosen.includes(c)} onChange={() => onToggle(c)} />
            <svg width="22" height="6" aria-hidden="true">
              <line
                x1="0"
                x2="22"
                y1="3"
                y2="3"
                strokeWidth={1.6}
                strokeDasharray={ENVELOPE_STYLE[c].dash}
                className={ENVELOPE_STYLE[c].className}
              />
            </svg>
            {CRITERION_LABEL[c]}
          </label>
        ))}
      </fieldset>
      <p
        id="envelope-probe"
        aria-live="polite"
        className="min-h-8 text-graphite"
        data-testid="envelope-probe"
      >
        {probe ? (
          <>
            Point (σA, σB) = (<span className="num">{fixed(probe[0], d)}</span>,{" "}
            <span className="num">{fixed(probe[1], d)}</span>) <span className="unit">{unit}</span>
            {reading?.nearest ? (
              <>
                ; nearest along its ray: {CRITERION_LABEL[reading.nearest.criterion]}, at{" "}
                <span className="num" data-testid="envelope-probe-n">
                  {factor(reading.nearest.n)}
                </span>{" "}
                × the point.
              </>
            ) : (
              "; no envelope on its ray."
            )}
          </>
        ) : (
          <span className="text-graphite-soft">
            Point at the plot (or focus it and use the arrow keys) to read σA, σB and the nearest envelope.
          </span>
        )}
      </p>
      {state ? (
        <p className="text-graphite-soft" data-testid="envelope-ray">
          State (σA, σB) = ({pairNames?.join(", ")}) = (<span className="num">{fixed(state[0], d)}</span>,{" "}
          <span className="num">{fixed(state[1], d)}</span>) {unit}.{" "}
          {ray && first ? (
            <>
              The dashed ray meets the {CRITERION_LABEL[first]} envelope at n ={" "}
              <span className="num text-graphite">{factor(ray.n)}</span> times the state.
            </>
          ) : (
            "No envelope drawn for this state."
          )}
        </p>
      ) : (
        <p className="text-graphite-soft">
          The state is triaxial (no principal stress is zero): this plot applies to plane stress; the table
          still holds.
        </p>
      )}
    </div>
  );
}
