import { Quantity, stressTone } from "../../../components/Quantity";
import { useRotated, useRotationDescription, useSummary } from "../hooks/use-derived";
import { principalAxisNames, principalName } from "../model/derive";
import { decimalsFor, fixed } from "../model/format";
import { useBenchStore } from "../model/store";
import type { StressTensor } from "../../../../../core";

const AXES = ["x′", "y′", "z′"] as const;

function entry(t: StressTensor, i: number, j: number): number {
  const m = [
    [t.xx, t.xy, t.zx],
    [t.xy, t.yy, t.yz],
    [t.zx, t.yz, t.zz],
  ];
  return m[i][j];
}

/** σ′ = RσRᵀ in the element's frame, live, plus the rotation in the chosen description. */
export function RotatedReadout() {
  const unit = useBenchStore((s) => s.unit);
  const view = useBenchStore((s) => s.rotationView);
  const sequence = useBenchStore((s) => s.eulerSequence);
  const { rotated } = useRotated();
  const rot = useRotationDescription();
  const rotation = useBenchStore((s) => s.rotation);
  const { principal } = useSummary();
  // On principal axes, say which principal stress each axis carries (the names of the principal panel).
  const onPrincipal = principalAxisNames(rotation, rotated, principal);
  const scale = Math.max(...Object.values(rotated).map(Math.abs));
  const d = decimalsFor(scale);
  return (
    <div className="text-[13px]">
      <table
        className="w-full"
        aria-label={`Components σ′ = R σ Rᵀ in x′ y′ z′, ${unit}`}
        data-testid="rotated-readout"
      >
        <caption className="mb-0.5 text-left text-[12px] text-graphite-soft">
          σ′ = R σ Rᵀ in x′ y′ z′, {unit}
        </caption>
        <thead>
          <tr className="text-[12px] text-graphite-soft">
            <th scope="col" />
            {AXES.map((a) => (
              <th key={a} scope="col" className="text-right font-mono font-normal">
                {a}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {AXES.map((row, i) => (
            <tr key={row} className="border-t border-rule/60">
              <th scope="row" className="pr-1 text-left font-mono text-[12px] font-normal text-graphite-soft">
                {row}
              </th>
              {AXES.map((col, j) => {
                const v = entry(rotated, i, j);
                return (
                  <td key={col} className="py-px text-right" data-cell={`${i}${j}`} data-value={v}>
                    <Quantity value={fixed(v, d)} tone={i === j ? stressTone(v, scale) : undefined} />
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      {onPrincipal && (
        <p className="mt-0.5 text-[12px] text-graphite" data-testid="principal-axis-names">
          On principal axes: {AXES.map((a, i) => `${a} ${principalName(onPrincipal[i])}`).join(", ")}
        </p>
      )}
      <p className="mt-1 text-[12px] text-graphite-soft" data-testid="rotation-description">
        {view === "axis-angle" ? (
          <>
            Frame turned{" "}
            <span className="whitespace-nowrap">
              <Quantity value={fixed(rot.axisAngle.angleDeg, 2)} unit="°" />
            </span>{" "}
            <span className="whitespace-nowrap">
              about axis (<span className="num">{rot.axisAngle.axis.map((v) => fixed(v, 3)).join(", ")}</span>
              )
            </span>
          </>
        ) : (
          <>
            {sequence} intrinsic:{" "}
            {rot.euler.map((v, k) => (
              <span key={k}>
                <Quantity value={fixed(v, 2)} unit="°" />
                {k < 2 ? ", " : ""}
              </span>
            ))}
          </>
        )}
        {rot.aboutZ !== null && rot.axisAngle.angleDeg !== 0 && (
          <>
            {" "}
            · about z only: θ = <Quantity value={fixed(rot.aboutZ, 2)} unit="°" />
          </>
        )}
      </p>
    </div>
  );
}
