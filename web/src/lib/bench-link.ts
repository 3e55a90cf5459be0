import { COMPONENTS, type StressTensor } from "../../../core";
import type { Components } from "../../../core/contract/load-cases";
import type { StressUnitName } from "../../../core/contract/materials";

/** Which saved state the bench edits: a load case's state at one location. */
export type BenchSource = { workspaceId: string; projectId: string; loadCaseId: string; locationId: string };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * The bench's `s` parameter: the six components in core's order (xx yy zz xy yz zx), each to 15
 * significant figures so a link gives back the very numbers shown. The bench's own address and
 * every link into it write it here.
 */
export const stressParam = (components: Components) =>
  COMPONENTS.map((c) => Number(components[c].toPrecision(15))).join(",");

/** Reads `s` back: six finite numbers in core's order, or null when absent or malformed. */
export function readStressParam(text: string | null): StressTensor | null {
  if (text === null) return null;
  const values = text.split(",").map(Number);
  if (values.length !== COMPONENTS.length || values.some((v) => !Number.isFinite(v))) return null;
  return Object.fromEntries(COMPONENTS.map((c, i) => [c, values[i]])) as StressTensor;
}

function stateParams(q: URLSearchParams, components: Components, unit: StressUnitName) {
  q.set("s", stressParam(components));
  q.set("u", unit);
}

const tidy = (q: URLSearchParams) => q.toString().replace(/%2F/g, "/").replace(/%2C/g, ",");

/**
 * The bench address for a saved state: `source` names workspace/project/case/location (the
 * bench loads the saved revision and its version from it and saves back to it); `s` and `u`
 * carry the same numbers in the bench's own URL encoding so the bench shows them at once.
 */
export function benchLinkForState(source: BenchSource, components: Components, unit: StressUnitName): string {
  const q = new URLSearchParams();
  q.set("source", [source.workspaceId, source.projectId, source.loadCaseId, source.locationId].join("/"));
  stateParams(q, components, unit);
  return `/bench?${tidy(q)}`;
}

/** The bench address for a state that is not saved anywhere (e.g. a combination's superposed state): view only. */
export function benchLinkForValues(components: Components, unit: StressUnitName): string {
  const q = new URLSearchParams();
  stateParams(q, components, unit);
  return `/bench?${tidy(q)}`;
}

/** Reads `source=workspace/project/case/location` from a query string; null when absent or malformed. */
export function parseBenchSource(search: string): BenchSource | null {
  const raw = new URLSearchParams(search).get("source");
  if (!raw) return null;
  const parts = raw.split("/");
  if (parts.length !== 4 || !parts.every((p) => UUID.test(p))) return null;
  const [workspaceId, projectId, loadCaseId, locationId] = parts;
  return { workspaceId, projectId, loadCaseId, locationId };
}

/** Where a combination's superposed state was computed: the project and location (its factors and material). */
export type CombinationSource = { workspaceId: string; projectId: string; locationId: string };

/** The bench address for a combination's superposed state: view only, checked as its project checks it there. */
export function benchLinkForCombination(
  name: string,
  from: CombinationSource,
  components: Components,
  unit: StressUnitName,
): string {
  const q = new URLSearchParams();
  stateParams(q, components, unit);
  q.set("combination", name);
  q.set("from", [from.workspaceId, from.projectId, from.locationId].join("/"));
  return `/bench?${tidy(q)}`;
}

/** Reads `from=workspace/project/location` from a query string; null when absent or malformed. */
export function parseCombinationSource(search: string): CombinationSource | null {
  const raw = new URLSearchParams(search).get("from");
  if (!raw) return null;
  const parts = raw.split("/");
  if (parts.length !== 3 || !parts.every((p) => UUID.test(p))) return null;
  const [workspaceId, projectId, locationId] = parts;
  return { workspaceId, projectId, locationId };
}
