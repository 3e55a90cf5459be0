/**
 * How big one project may grow. The numbers sit well above real checking work — a pressure
 * vessel, a lifting lug or a shaft is checked at a handful to a few dozen critical locations,
 * under a few to a few dozen load cases and code combinations, each combination summing a
 * handful of cases (common practice, no source) — so an engineer never meets them, while
 * they cap what one request can make the server compute: the comparison of the largest
 * project is (cases + combinations) × locations = 200 × 100 = 20 000 rows, which the server
 * must answer within 2 s on this 2-core machine (test/api/comparison-scale.test.ts). Twice
 * these counts (80 000 rows) took 8–13 s to compute here, nearly all of it per-row work in
 * the comparison's builder, so raise them only with a faster builder and that test passing.
 * Finite-element point tables, which do have thousands of points, have their own limits
 * (POINT_TABLE_LIMITS below) and a section of their own in the comparison, not rows.
 *
 * The API refuses to go past them on create and on import with a 400 that names the limit;
 * the API and the browser import them from here. Plain constants: imports nothing.
 */
export const PROJECT_LIMITS = {
  /** Live locations in one project. */
  locations: 100,
  /** Live load cases in one project. */
  loadCases: 100,
  /** Live combinations in one project. */
  combinations: 100,
  /** Terms (factor × load case) in one combination. */
  termsPerCombination: 50,
} as const;

export type ProjectLimitName = keyof typeof PROJECT_LIMITS;

/** How the 400 names a limit, e.g. "A project holds at most 100 locations (limit "locations")." */
export const LIMIT_NOUNS: Record<ProjectLimitName, string> = {
  locations: "locations",
  loadCases: "load cases",
  combinations: "combinations",
  termsPerCombination: "terms",
};

/** The sentence a refusal carries: the limit, its number, and what to do. */
export function limitMessage(limit: ProjectLimitName): string {
  const where = limit === "termsPerCombination" ? "A combination" : "A project";
  return `${where} holds at most ${PROJECT_LIMITS[limit]} ${LIMIT_NOUNS[limit]} (limit "${limit}"). Split the work into several projects, or remove some first.`;
}

/**
 * Stress classification lines (linearizations) saved per load case. A line through a wall is
 * read at a handful to a few dozen points (at least 11 recommended, core/linearization/path.ts)
 * and a case is checked along a few lines at its discontinuities (common practice, no source);
 * 1000 points and 20 lines bound what one request stores and what the comparison reads
 * (100 cases × 20 lines, each a summary of a few checks, not its points).
 */
export const LINEARIZATION_LIMITS = {
  /** Points along one line. */
  pointsPerLine: 1000,
  /** Saved lines per load case. */
  linesPerLoadCase: 20,
} as const;

/** Rows per page of the comparison when the client does not say, and the most it may ask for. */
export const COMPARISON_PAGE = { defaultLimit: 200, maxLimit: 1000 } as const;

/**
 * How big finite-element point tables may grow. A load case's table is the stress output of one
 * region of interest (a nozzle, a weld, a lug) or of a whole model's surface: tens of thousands
 * to a couple of million nodal or integration points (common practice, no source). The limits sit
 * above that while they bound what one upload makes the server hold: a table at the row limit
 * takes about 160 MB of Float64Arrays while it is parsed (6 components, 3 coordinates and an id
 * per point), and a 2,000,000-row file with ids, coordinates and six components in full
 * precision is about 180–200 MB of text.
 */
export const POINT_TABLE_LIMITS = {
  /** Lines of data in one file (header and skipped lines aside); bad rows count too. */
  rowsPerTable: 2_000_000,
  /** Bytes of one uploaded file. */
  bytesPerTable: 256 * 1024 * 1024,
  /** Point tables in one load case. */
  tablesPerLoadCase: 10,
  /** Point tables in one project (every load case together). */
  tablesPerProject: 50,
  /** Points promoted to locations in one "keep" request. */
  keepPerRequest: 50,
} as const;

export type PointTableLimitName = keyof typeof POINT_TABLE_LIMITS;

/** The sentence a point-table refusal carries: the limit, its number, and what to do. */
export function pointTableLimitMessage(limit: PointTableLimitName): string {
  const max = POINT_TABLE_LIMITS[limit].toLocaleString("en-GB");
  switch (limit) {
    case "rowsPerTable":
      return `A point table holds at most ${max} rows (limit "${limit}"). Split the file by region and upload the parts as separate tables.`;
    case "bytesPerTable":
      return `A point table file is at most ${max} bytes (limit "${limit}"). Leave out columns you do not map, or split the file by region.`;
    case "tablesPerLoadCase":
      return `A load case holds at most ${max} point tables (limit "${limit}"). Delete a table you no longer need first.`;
    case "tablesPerProject":
      return `A project holds at most ${max} point tables (limit "${limit}"). Delete a table you no longer need first.`;
    case "keepPerRequest":
      return `At most ${max} points can be kept as locations at once (limit "${limit}").`;
  }
}
