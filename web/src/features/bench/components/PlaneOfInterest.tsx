import { NumberField } from "../../../components/NumberField";
import { Quantity, stressTone } from "../../../components/Quantity";
import { Sym } from "../../../components/Sym";
import { planeTraction } from "../model/derive";
import { decimalsFor, fixed } from "../model/format";
import { useBenchStore } from "../model/store";
import { useMemo } from "react";

const fmt = (v: number) => Number(v.toFixed(4)).toString();

/** Normal from two angles: azimuth φ in x–y from x, elevation from the x–y plane (degrees). */
function fromAngles(azimuth: number, elevation: number): [number, number, number] {
  const a = (azimuth * Math.PI) / 180;
  const e = (elevation * Math.PI) / 180;
  return [Math.cos(e) * Math.cos(a), Math.cos(e) * Math.sin(a), Math.sin(e)];
}

/** The optional plane of interest: a normal typed as components or two angles, and its traction (core). */
export function PlaneOfInterest() {
  const plane = useBenchStore((s) => s.plane);
  const tensor = useBenchStore((s) => s.tensor);
  const unit = useBenchStore((s) => s.unit);
  const act = useBenchStore((s) => s.act);
  const result = useMemo(() => planeTraction(tensor, plane.normal), [tensor, plane.normal]);
  const [nx, ny, nz] = result.unitNormal;
  const azimuth = (Math.atan2(ny, nx) * 180) / Math.PI;
  const elevation = (Math.asin(Math.max(-1, Math.min(1, nz))) * 180) / Math.PI;
  const d = decimalsFor(Math.max(...result.traction.map(Math.abs), Math.abs(result.normal), 1e-300));
  return (
    <div className="text-[13px]">
      <label className="flex items-center gap-1.5">
        <input
          type="checkbox"
          checked={plane.enabled}
          onChange={(e) => act.setPlaneEnabled(e.target.checked)}
        />
        Plane of interest through the element
      </label>
      {plane.enabled && (
        <div className="mt-1 space-y-1">
          <div className="flex items-end gap-1">
            {(["n x", "n y", "n z"] as const).map((label, k) => (
              <NumberField
                key={label}
                label={label}
                value={plane.normal[k]}
                format={fmt}
                className="w-14"
                onCommit={(v) => {
                  const next: [number, number, number] = [...plane.normal];
                  next[k] = v ?? 0;
                  act.setPlaneNormal(next);
                }}
              />
            ))}
            <span className="px-1 pb-1 text-[12px] text-graphite-soft">or</span>
            <NumberField
              label="azimuth"
              value={azimuth}
              format={fmt}
              unit="°"
              className="w-16"
              onCommit={(v) => act.setPlaneNormal(fromAngles(v ?? 0, elevation))}
            />
            <NumberField
              label="elevation"
              value={elevation}
              format={fmt}
              unit="°"
              className="w-16"
              onCommit={(v) => act.setPlaneNormal(fromAngles(azimuth, v ?? 0))}
            />
          </div>
          <p data-testid="plane-result" className="text-[12px]">
            <Sym base="σ" sub="n" /> ={" "}
            <Quantity value={fixed(result.normal, d)} unit={unit} tone={stressTone(result.normal)} />
            {"  ·  "}
            <Sym base="τ" sub="n" /> = <Quantity value={fixed(result.shear, d)} unit={unit} />
            {"  ·  "}t = (<span className="num">{result.traction.map((v) => fixed(v, d)).join(", ")}</span>){" "}
            <span className="unit">{unit}</span>
          </p>
        </div>
      )}
    </div>
  );
}
