import { Link } from "react-router-dom";

/** Where each calculator lives and what it turns into a stress state. */
export const CALCULATORS = [
  {
    path: "thin-wall",
    title: "Thin-walled cylinder and sphere",
    text: "Pressure, radius and wall to hoop, axial and radial stress; warns when the wall is too thick for membrane theory.",
  },
  {
    path: "thick-cylinder",
    title: "Thick-walled cylinder (Lamé)",
    text: "Inner and outer pressure on a thick wall, with closed, open or plane-strain ends; the stresses at any radius and through the wall.",
  },
  {
    path: "thick-sphere",
    title: "Thick-walled sphere (Lamé)",
    text: "Inner and outer pressure on a thick spherical wall; radial and tangential stress at any radius.",
  },
  {
    path: "shaft",
    title: "Shaft under combined load",
    text: "Bending, torque, axial force and transverse shear on a solid or hollow shaft; the state at a surface point and the critical point.",
  },
  {
    path: "rosette",
    title: "Strain-gauge rosette",
    text: "Rectangular, delta or any three gauges in microstrain to principal strains and the plane-stress state.",
  },
] as const;

/** The calculators' index: each one turns engineering inputs into a stress state for the bench. */
export function CalculatorsPage() {
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight text-graphite">Calculators</h1>
        <p className="mt-1 max-w-3xl text-graphite-soft">
          Start from a pressure and a wall, a torque and a diameter, or three gauge readings: each calculator
          shows the formula it uses with its source and sends the stress state it produces to the bench.
        </p>
      </div>
      <ul className="grid gap-4 md:grid-cols-2">
        {CALCULATORS.map((c) => (
          <li key={c.path} className="rounded-sm border border-rule bg-panel px-4 py-3">
            <h2 className="text-[17px] font-semibold">
              <Link to={`/calculators/${c.path}`}>{c.title}</Link>
            </h2>
            <p className="mt-1 text-[14px] text-graphite-soft">{c.text}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
