import { Combination } from "../../../db/models/combination";
import { CombinationTerm } from "../../../db/models/combination-term";
import { LoadCase } from "../../../db/models/load-case";
import { Location } from "../../../db/models/location";
import { Project } from "../../../db/models/project";
import { StressState } from "../../../db/models/stress-state";

export type SeedSize = {
  locations: number;
  loadCases: number;
  combinations: number;
  termsPerCombination: number;
};

export type SeededProject = {
  projectId: string;
  locationIds: string[];
  caseIds: string[];
  combinationIds: string[];
};

/** A small seeded generator (a 32-bit linear congruential one) so every run seeds the same stresses. */
function seeded(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

/**
 * Writes a project of `size` straight into the database (bulk inserts, not the API: the API
 * would take minutes for the largest project the limits allow), with a state for every case
 * at every location and combinations of `termsPerCombination` cases each. Stresses are
 * seeded random values between −200 and 200 MPa; the material is SA-516 Grade 70 from
 * core's built-in list. For the scale test and the load benchmark only.
 */
export async function seedProject(
  workspaceId: string,
  userId: string,
  size: SeedSize,
  seed = 1,
): Promise<SeededProject> {
  const random = seeded(seed);
  const mpa = () => Math.round((random() * 400 - 200) * 10) * 1e5;
  const people = { createdBy: userId, updatedBy: userId };
  const project = await Project.create({
    workspaceId,
    name: `Seeded ${size.locations} × ${size.loadCases} + ${size.combinations}`,
    description: "",
    unitSystem: "SI",
    requirements: [
      { criterion: "von-mises", requiredFactor: 1.5 },
      { criterion: "tresca", requiredFactor: 1.5 },
      { criterion: "max-principal", requiredFactor: 2 },
    ],
    defaultPublishedMaterial: "sa516-70",
    ...people,
  });
  const locations = await Location.bulkCreate(
    Array.from({ length: size.locations }, (_, i) => ({
      projectId: project.id,
      name: `point ${i + 1}`,
      note: "",
      position: i,
      ...people,
    })),
  );
  const cases = await LoadCase.bulkCreate(
    Array.from({ length: size.loadCases }, (_, i) => ({
      projectId: project.id,
      name: `case ${i + 1}`,
      category: "design",
      description: "",
      position: i,
      ...people,
    })),
  );
  const states = cases.flatMap((c) =>
    locations.map((l) => ({
      loadCaseId: c.id,
      locationId: l.id,
      revision: 1,
      isCurrent: true,
      xxPa: mpa(),
      yyPa: mpa(),
      zzPa: mpa(),
      xyPa: mpa(),
      yzPa: mpa(),
      zxPa: mpa(),
      unit: "MPa",
      source: "typed",
      note: "",
      createdBy: userId,
    })),
  );
  // Batches keep each INSERT's parameter list well under PostgreSQL's 65 535.
  for (let i = 0; i < states.length; i += 2_000) await StressState.bulkCreate(states.slice(i, i + 2_000));
  const combinations = await Combination.bulkCreate(
    Array.from({ length: size.combinations }, (_, i) => ({
      projectId: project.id,
      name: `combination ${i + 1}`,
      description: "",
      position: i,
      ...people,
    })),
  );
  const terms = combinations.flatMap((combination, i) =>
    Array.from({ length: Math.min(size.termsPerCombination, cases.length) }, (_, t) => ({
      combinationId: combination.id,
      loadCaseId: cases[(i + t) % cases.length].id,
      factor: t === 0 ? 1 : 0.5,
      position: t,
    })),
  );
  for (let i = 0; i < terms.length; i += 2_000) await CombinationTerm.bulkCreate(terms.slice(i, i + 2_000));
  return {
    projectId: project.id,
    locationIds: locations.map((l) => l.id),
    caseIds: cases.map((c) => c.id),
    combinationIds: combinations.map((c) => c.id),
  };
}
