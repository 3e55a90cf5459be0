import { Panel } from "../../../components/Panel";
import { Quantity, stressTone } from "../../../components/Quantity";
import { Sym } from "../../../components/Sym";
import { useSummary } from "../hooks/use-derived";
import { PRINCIPAL_NAMING_RULE, principalName } from "../model/derive";
import { decimalsFor, fixed } from "../model/format";
import { useBenchStore } from "../model/store";
import { useOutOfDate } from "../hooks/use-out-of-date";

/** Panel: what core computes of the state itself, independent of the element's frame. */
export function PrincipalPanel() {
  const outOfDate = useOutOfDate();
  const unit = useBenchStore((s) => s.unit);
  const { principal, tauMax, vonMises } = useSummary();
  const [s1, s2, s3] = principal.values;
  const plane = principal.plane;
  const d = decimalsFor(Math.max(Math.abs(s1), Math.abs(s3)));
  // The in-plane circle is the outer one (its radius is τmax) when σz lies between the in-plane pair.
  const inPlaneGoverns =
    plane !== null &&
    plane.values[plane.inPlaneMinor] <= plane.values[plane.outOfPlane] &&
    plane.values[plane.outOfPlane] <= plane.values[plane.inPlaneMajor];
  const rows = [
    { sym: <Sym base="σ" sub="1" />, label: "sigma 1", value: s1, dir: principal.directions[0] },
    { sym: <Sym base="σ" sub="2" />, label: "sigma 2", value: s2, dir: principal.directions[1] },
    { sym: <Sym base="σ" sub="3" />, label: "sigma 3", value: s3, dir: principal.directions[2] },
  ];
  return (
    <Panel
      outOfDate={outOfDate}
      id="principal"
      index="2"
      title="Principal stresses"
      subtitle={unit}
      bodyClassName="px-3 py-2"
    >
      <table className="w-full text-[13px]" data-testid="principal-table">
        <thead>
          <tr className="text-left text-[12px] text-graphite-soft">
            <th scope="col" className="font-normal" />
            <th scope="col" className="pr-2 text-right font-normal">
              value
            </th>
            <th scope="col" className="text-right font-normal">
              direction (x, y, z)
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.label} className="border-t border-rule/60" data-testid={r.label}>
              <th scope="row" className="py-0.5 text-left font-normal">
                {r.sym}
              </th>
              <td className="pr-2 text-right">
                <Quantity
                  value={fixed(r.value, d)}
                  unit={unit}
                  tone={stressTone(r.value, Math.max(Math.abs(s1), Math.abs(s3)))}
                />
              </td>
              <td className="num text-right text-[12px] text-graphite-soft">
                {r.dir.map((v) => fixed(v, 3)).join("  ")}
              </td>
            </tr>
          ))}
          <tr className="border-t border-rule">
            <th scope="row" className="py-0.5 text-left font-normal">
              <Sym base="τ" sub="max" />
            </th>
            <td className="pr-2 text-right" data-testid="tau-max">
              <Quantity value={fixed(tauMax, d)} unit={unit} />
            </td>
            <td className="text-right text-[12px] text-graphite-soft">(σ₁ − σ₃)/2</td>
          </tr>
          <tr className="border-t border-rule/60">
            <th scope="row" className="py-0.5 text-left font-normal">
              <Sym base="σ" sub="vM" />
            </th>
            <td className="pr-2 text-right" data-testid="von-mises">
              <Quantity value={fixed(vonMises, d)} unit={unit} />
            </td>
            <td className="text-right text-[12px] text-graphite-soft">von Mises, √(3 J₂)</td>
          </tr>
        </tbody>
      </table>
      <div className="mt-1.5 space-y-1 border-t border-rule pt-1 text-[12px] leading-4 text-graphite-soft">
        {plane ? (
          <>
            <p data-testid="principal-in-plane">
              In plane x–y: {principalName(plane.inPlaneMajor)} and {principalName(plane.inPlaneMinor)}; along
              z: {principalName(plane.outOfPlane)} = σz.
            </p>
            <p className="flex flex-wrap gap-x-3 text-graphite">
              <span data-testid="theta-p" data-value={plane.thetaP}>
                <Sym base="θ" sub="p" /> = <Quantity value={fixed(plane.thetaP, 2)} unit="°" /> (x to{" "}
                {principalName(plane.inPlaneMajor)})
              </span>
              <span data-testid="theta-s" data-value={plane.thetaS}>
                in-plane max shear: <Sym base="θ" sub="p" /> ∓ 45° ={" "}
                <Quantity value={fixed(plane.thetaS, 2)} unit="°" />,{" "}
                <Quantity value={fixed(plane.thetaS + 90, 2)} unit="°" />
                {!inPlaneGoverns && " (τmax itself acts on planes at 45° to z)"}
              </span>
            </p>
            <p data-testid="angle-convention">
              Angles run from the x axis to a plane&rsquo;s normal, counter-clockwise positive seen from +z (x
              turning towards y); θp in (−90°, 90°], tan 2θp = 2τxy/(σx − σy). The plane at θp − 45° carries
              +τmax, the one at θp + 45° −τmax.
            </p>
          </>
        ) : (
          <p data-testid="principal-in-plane">
            θp and the in-plane pair apply when z is a principal direction (τyz = τzx = 0).
          </p>
        )}
        <p data-testid="principal-naming-rule">{PRINCIPAL_NAMING_RULE}</p>
      </div>
    </Panel>
  );
}
