/**
 * A small built-in list of material strengths: published minimum values (and, for grey cast iron's
 * compressive strength, a typical handbook value, said so), each with the standard it comes from.
 * Data only. Every value here was recalled from memory, not read from the standard while writing
 * it, so each entry carries `fromMemory: true` and the note below, and the UI shows that note.
 * Strengths are in MPa and positive (a compressive strength is a magnitude).
 */

/** The note shown beside every value recalled from memory. */
export const FROM_MEMORY_NOTE =
  "recalled from memory — verify against the standard and your material certificate";

/** One published material grade. */
export type PublishedMaterial = {
  /** stable id for links and saved projects */
  id: string;
  /** grade as engineers write it */
  name: string;
  /** the standard the values come from */
  standard: string;
  /** product form and thickness range the values apply to */
  scope: string;
  /** minimum yield (or 0.2 % proof) strength, MPa; absent for brittle materials */
  yield?: number;
  /** minimum tensile strength, MPa */
  ultimateTension: number;
  /** compressive strength, MPa (a magnitude) */
  ultimateCompression: number;
  /** where the compressive strength comes from */
  compressionBasis: string;
  /** true when the material is brittle (the brittle criteria apply, von Mises and Tresca do not) */
  brittle: boolean;
  /** every value was recalled from memory and must be checked */
  fromMemory: true;
  note: typeof FROM_MEMORY_NOTE;
};

const EQUAL_TO_TENSION = "taken equal to the tensile strength for a wrought metal (common practice)";

/** The built-in list, in display order. */
export const PUBLISHED_MATERIALS: readonly PublishedMaterial[] = [
  {
    id: "s355",
    name: "S355",
    standard: "EN 10025-2",
    scope: "plate, nominal thickness ≤ 16 mm",
    yield: 355,
    ultimateTension: 470,
    ultimateCompression: 470,
    compressionBasis: EQUAL_TO_TENSION,
    brittle: false,
    fromMemory: true,
    note: FROM_MEMORY_NOTE,
  },
  {
    id: "s235",
    name: "S235",
    standard: "EN 10025-2",
    scope: "plate, nominal thickness ≤ 16 mm",
    yield: 235,
    ultimateTension: 360,
    ultimateCompression: 360,
    compressionBasis: EQUAL_TO_TENSION,
    brittle: false,
    fromMemory: true,
    note: FROM_MEMORY_NOTE,
  },
  {
    id: "a36",
    name: "A36",
    standard: "ASTM A36",
    scope: "plates, shapes and bars",
    yield: 250,
    ultimateTension: 400,
    ultimateCompression: 400,
    compressionBasis: EQUAL_TO_TENSION,
    brittle: false,
    fromMemory: true,
    note: FROM_MEMORY_NOTE,
  },
  {
    id: "sa516-70",
    name: "SA-516 Grade 70",
    standard: "ASME SA-516",
    scope: "pressure-vessel plate",
    yield: 260,
    ultimateTension: 485,
    ultimateCompression: 485,
    compressionBasis: EQUAL_TO_TENSION,
    brittle: false,
    fromMemory: true,
    note: FROM_MEMORY_NOTE,
  },
  {
    id: "a240-304",
    name: "Type 304",
    standard: "ASTM A240",
    scope: "stainless plate, sheet and strip",
    yield: 205,
    ultimateTension: 515,
    ultimateCompression: 515,
    compressionBasis: EQUAL_TO_TENSION,
    brittle: false,
    fromMemory: true,
    note: FROM_MEMORY_NOTE,
  },
  {
    id: "6061-t6",
    name: "6061-T6",
    standard: "ASTM B209",
    scope: "aluminium sheet and plate",
    yield: 240,
    ultimateTension: 290,
    ultimateCompression: 290,
    compressionBasis: EQUAL_TO_TENSION,
    brittle: false,
    fromMemory: true,
    note: FROM_MEMORY_NOTE,
  },
  {
    id: "a48-30",
    name: "Class 30 grey iron",
    standard: "ASTM A48",
    scope: "grey iron castings",
    ultimateTension: 207,
    ultimateCompression: 752,
    compressionBasis: "typical handbook value, not a specified minimum",
    brittle: true,
    fromMemory: true,
    note: FROM_MEMORY_NOTE,
  },
];

/** The built-in material with this id, or null. @param id a {@link PublishedMaterial} id */
export function publishedMaterial(id: string): PublishedMaterial | null {
  return PUBLISHED_MATERIALS.find((m) => m.id === id) ?? null;
}
