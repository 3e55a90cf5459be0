/**
 * Where a rosette's E and ν come from: a built-in grade (typical values, since the built-in list
 * holds strengths only), a workspace library material that gives both, or the numbers typed.
 */
import { FROM_MEMORY_NOTE, convertStress } from "../../../../../core";
import { UNITS_OF, type UnitSet } from "./units";

/** Elastic constants of a material, E in Pa. */
export type ElasticSource = {
  id: string;
  name: string;
  elasticModulusPa: number;
  poissonRatio: number;
  note: string;
};

/**
 * Typical room-temperature E and ν for each built-in grade, by its id. Recalled from memory (the
 * structural-steel pair E = 210 GPa, ν = 0.3 as the European steel design rules use it; the others
 * typical handbook values); they vary with temperature and, for grey iron, with section size.
 */
const TYPICAL: Readonly<Record<string, { e: number; nu: number }>> = {
  s355: { e: 210e9, nu: 0.3 },
  s235: { e: 210e9, nu: 0.3 },
  a36: { e: 200e9, nu: 0.3 },
  "sa516-70": { e: 200e9, nu: 0.3 },
  "a240-304": { e: 193e9, nu: 0.29 },
  "6061-t6": { e: 68.9e9, nu: 0.33 },
  "a48-30": { e: 100e9, nu: 0.26 },
};

/** The built-in grades with typical E and ν, in the list's order. */
export function builtInElasticSources(published: readonly { id: string; name: string }[]): ElasticSource[] {
  return published
    .filter((m) => TYPICAL[m.id] !== undefined)
    .map((m) => ({
      id: `published:${m.id}`,
      name: `${m.name} (typical)`,
      elasticModulusPa: TYPICAL[m.id].e,
      poissonRatio: TYPICAL[m.id].nu,
      note: `typical values, ${FROM_MEMORY_NOTE}`,
    }));
}

/** Library materials that give both E and ν (the others cannot fill the rosette's constants). */
export function libraryElasticSources(
  materials: readonly {
    id: string;
    name: string;
    elasticModulusPa: number | null;
    poissonRatio: number | null;
    reference: string;
  }[],
): ElasticSource[] {
  return materials.flatMap((m) =>
    m.elasticModulusPa !== null && m.poissonRatio !== null
      ? [
          {
            id: `workspace:${m.id}`,
            name: m.name,
            elasticModulusPa: m.elasticModulusPa,
            poissonRatio: m.poissonRatio,
            note: m.reference,
          },
        ]
      : [],
  );
}

/** E in the unit set's modulus unit (GPa in SI, psi or ksi in US) and ν, to fill the fields. */
export function elasticInputs(source: ElasticSource, units: UnitSet): { E: number; nu: number } {
  const E = convertStress(source.elasticModulusPa, "Pa", UNITS_OF[units].modulus);
  return { E: Number(E.toPrecision(12)), nu: source.poissonRatio };
}
