import autocannon from "autocannon";
import { LoadCase } from "../../db/models/load-case";
import { StressState } from "../../db/models/stress-state";
import { seedProject } from "./support/seed-project";
import { signedIn } from "./support/signed-in";
import { startThrowawayServer } from "./support/throwaway-server";

/** Connections autocannon keeps open (the figure the review measured at). */
const CONNECTIONS = 100;
/**
 * Connections for the saves: as many as the server's pool. A save is about sixteen queries
 * (session, membership, the transaction, the presenter), so at 100 connections most of them
 * would still be queued when a 5 s run ends and the run would count almost nothing.
 */
const SAVE_CONNECTIONS = 10;
/** Seconds each route is loaded for, after a one-second warm-up: the section stays under a minute. */
const SECONDS = 5;

type Figures = { label: string; rate: number; p50: number; p99: number; errors: number; statuses: string };

/** Loads one route for SECONDS on loopback and reads autocannon's figures. */
async function load(
  label: string,
  options: autocannon.Options,
  connections = CONNECTIONS,
  afterWarmUp: () => Promise<void> = async () => {},
): Promise<Figures> {
  await autocannon({ ...options, connections, duration: 1 }); // warm-up: JIT, pool, sockets
  await afterWarmUp();
  const r = await autocannon({ ...options, connections, duration: SECONDS });
  const statuses = Object.entries(r.statusCodeStats ?? {})
    .map(([status, s]) => `${status}×${(s as { count: number }).count}`)
    .join(" ");
  return {
    label: `${label} (${connections})`,
    rate: r.requests.average,
    p50: r.latency.p50,
    p99: r.latency.p99,
    // Anything but the answer the route should give: the 404 baseline expects 404s.
    errors: r.errors + r.timeouts + (label.includes("404") ? r["2xx"] : r.non2xx),
    statuses,
  };
}

/**
 * Load figures on loopback with autocannon: the bare JSON 404
 * (Express without database or session: the baseline), GET /api/health, a signed-in GET of
 * the comparison of an 8-row project (2 locations × 3 cases + 1 combination), and state
 * saves (PUT …/states/{locationId}, each connection saving its own case so versions never
 * conflict), at CONNECTIONS connections (saves at SAVE_CONNECTIONS). Every route is measured in this run beside the baseline; the comparison/health
 * ratio is the target (≥ 0.5×).
 */
export async function run(): Promise<void> {
  const { server, stop } = await startThrowawayServer();
  try {
    const origin = server.url;
    const { cookie, userId, workspaceId } = await signedIn(origin);
    const small = await seedProject(workspaceId, userId, {
      locations: 2,
      loadCases: 3,
      combinations: 1,
      termsPerCombination: 2,
    });
    const comparisonUrl = `${origin}/api/workspaces/${workspaceId}/projects/${small.projectId}/comparison`;
    // One case per connection for the saves, in a project of its own.
    const saves = await seedProject(workspaceId, userId, {
      locations: 1,
      loadCases: 2 * SAVE_CONNECTIONS,
      combinations: 0,
      termsPerCombination: 0,
    });
    const locationId = saves.locationIds[0];
    const casesBase = `/api/workspaces/${workspaceId}/projects/${saves.projectId}/load-cases`;
    // Versions live outside autocannon's per-connection context, which starts afresh each run.
    const versions = new Map(saves.caseIds.map((id) => [id, 1]));
    // Each request takes a case no other request in flight is saving, and gives it back on
    // the answer, so no two saves ever race on one version.
    const idle = [...saves.caseIds];
    type SaveContext = { caseId?: string };
    const saveRequest: autocannon.Request = {
      method: "PUT",
      setupRequest: (request, context) => {
        const c = context as SaveContext;
        c.caseId = idle.shift()!;
        const version = versions.get(c.caseId)!;
        return {
          ...request,
          path: `${casesBase}/${c.caseId}/states/${locationId}`,
          body: JSON.stringify({
            version,
            stress: {
              unit: "MPa",
              components: { xx: 100 + (version % 50), yy: 50, zz: 0, xy: 10, yz: 0, zx: 0 },
            },
          }),
        };
      },
      onResponse: (status, body, context) => {
        const caseId = (context as SaveContext).caseId!;
        idle.push(caseId);
        if (status === 200) {
          versions.set(caseId, (JSON.parse(body) as { loadCase: { version: number } }).loadCase.version);
        } else if (status === 409) {
          // Should not happen (no two saves share a case); if it does, catch up and count it as an error.
          const { error } = JSON.parse(body) as { error: { details: { currentVersion: number } } };
          versions.set(caseId, error.details.currentVersion);
        }
      },
    };

    const baseline = await load("JSON 404, no database (baseline)", { url: `${origin}/api/no-such-route` });
    const health = await load("GET /api/health", { url: `${origin}/api/health` });
    const comparison = await load("GET …/comparison, 8 rows, signed in", {
      url: comparisonUrl,
      headers: { cookie },
    });
    const save = await load(
      "PUT …/states/{location}, signed in",
      {
        url: origin,
        headers: { cookie, origin, "content-type": "application/json" },
        requests: [saveRequest],
      },
      SAVE_CONNECTIONS,
      async () => {
        // Saves the warm-up left in flight land unseen; let them, then take the versions from the database.
        await new Promise((resolve) => setTimeout(resolve, 2_000));
        for (const c of await LoadCase.findAll({
          attributes: ["id", "version"],
          where: { id: saves.caseIds },
        }))
          versions.set(c.id, c.version);
        idle.splice(0, idle.length, ...saves.caseIds);
      },
    );

    console.log(
      `${"route (connections)".padEnd(46)} ${"req/s".padStart(8)} ${"× 404".padStart(7)} ${"p50 ms".padStart(7)} ${"p99 ms".padStart(7)} ${"errors".padStart(7)}  statuses`,
    );
    for (const f of [baseline, health, comparison, save]) {
      console.log(
        `${f.label.padEnd(46)} ${f.rate.toFixed(0).padStart(8)} ${(f.rate / baseline.rate).toFixed(2).padStart(6)}× ${f.p50.toFixed(0).padStart(7)} ${f.p99.toFixed(0).padStart(7)} ${String(f.errors).padStart(7)}  ${f.statuses}`,
      );
    }
    const saved = await StressState.count({ where: { loadCaseId: saves.caseIds, isCurrent: false } });
    const savedVersions =
      (await LoadCase.sum("version", { where: { id: saves.caseIds } })) - saves.caseIds.length;
    console.log(
      `comparison / health: ${(comparison.rate / health.rate).toFixed(2)}× (target ≥ 0.5×)   ` +
        `saves stored: ${savedVersions} versions, ${saved} superseded revisions   ` +
        `(${SECONDS} s per route on loopback after a 1 s warm-up)`,
    );
  } finally {
    await stop();
  }
}
