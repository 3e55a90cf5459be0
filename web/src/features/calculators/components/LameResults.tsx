import type { ReactNode } from "react";
import type { StressTensor } from "../../../../../core";
import { Sym } from "../../../components/Sym";
import { stressUnitOf, unitFor, type UnitSet } from "../model/units";
import { StateTable } from "./StateTable";
import { ThroughWallPlot, type PlotSeries } from "./ThroughWallPlot";

/** One normal stress of the element: its component, subscript (θ, φ, r, z) and what it is. */
export type LameRow = { id: "xx" | "yy" | "zz"; sub: string; meaning: string };

/**
 * The results of a thick-walled (Lamé) calculator: the radius, the element's axes in words, the
 * three normal stresses there and the through-wall plot. The cylinder and the sphere differ only
 * in their axes, rows and plotted lines.
 */
export function LameResults({
  result,
  units,
  axes,
  rows,
  series,
}: {
  result: { radius: number; tensor: StressTensor; profile: { radius: number }[] };
  units: UnitSet;
  /** "Element axes: …" sentence for this shape. */
  axes: ReactNode;
  rows: LameRow[];
  series: PlotSeries[];
}) {
  const unit = stressUnitOf(units);
  return (
    <>
      <p className="text-[13px] text-graphite-soft">
        At r = <span className="num">{Number(result.radius.toPrecision(6))}</span>{" "}
        <span className="unit">{unitFor("length", units)}</span>. {axes}
      </p>
      <StateTable
        caption="Lamé stresses at the chosen radius"
        unit={unit}
        rows={rows.map((row) => ({
          id: row.id,
          symbol: <Sym base="σ" sub={row.sub} />,
          meaning: row.meaning,
          value: result.tensor[row.id],
        }))}
      />
      <ThroughWallPlot
        radii={result.profile.map((q) => q.radius)}
        marked={result.radius}
        lengthUnit={unitFor("length", units)}
        stressUnit={unit}
        series={series}
      />
    </>
  );
}
