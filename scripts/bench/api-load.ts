import autocannon from "autocannon";
import { LoadCase } from "../../db/models/load-case";
import { StressState } from "../../db/models/stress-state";
import { cpuMeter, type CpuTime } from "./support/cpu-time";
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

/**
 * Paired rounds of health and the comparison, back to back with the order alternating, each
 * ROUND_SECONDS long: other work on a shared machine changes from second to second, and two
 * 5-s runs taken one after the other can see very different machines. Each round's ratio
 * compares routes that saw about the same load; the median of the rounds is printed beside
 * the 5-s runs' ratio.
 */
const PAIRED_ROUNDS = 6;
const ROUND_SECONDS = 2;

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

/** The median of `values` (the mean of the middle two for an even count). */
function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

/** One route loaded for ROUND_SECONDS at CONNECTIONS: its rate (completed requests per second). */
async function roundRate(options: autocannon.Options): Promise<number> {
  const r = await autocannon({ ...options, connections: CONNECTIONS, duration: ROUND_SECONDS });
  if (r.non2xx + r.errors + r.timeouts > 0) {
    throw new Error(`${options.url}: ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts`);
  }
  return r.requests.total / ROUND_SECONDS;
}

/** Health and the comparison in PAIRED_ROUNDS alternating pairs: each round's two rates. */
async function pairedRounds(health: autocannon.Options, comparison: autocannon.Options) {
  const rounds: { health: number; comparison: number }[] = [];
  for (let n = 0; n < PAIRED_ROUNDS; n++) {
    if (n % 2 === 0) {
      const h = await roundRate(health);
      rounds.push({ health: h, comparison: await roundRate(comparison) });
    } else {
      const c = await roundRate(comparison);
      rounds.push({ health: await roundRate(health), comparison: c });
    }
  }
  return rounds;
}

/** Requests and connections of the CPU measurement: a fixed count, so none is left in flight. */
const CPU_REQUESTS = 2000;
const CPU_CONNECTIONS = 20;

/** CPU ms per request of one route over CPU_REQUESTS requests: this process, PostgreSQL, both. */
async function cpuPerRequest(options: autocannon.Options, meter: () => CpuTime) {
  const before = meter();
  const r = await autocannon({ ...options, connections: CPU_CONNECTIONS, amount: CPU_REQUESTS });
  const after = meter();
  const processMs = (after.processMs - before.processMs) / r.requests.total;
  const postgresMs = (after.postgresMs - before.postgresMs) / r.requests.total;
  return { processMs, postgresMs, totalMs: processMs + postgresMs };
}

/**
 * Load figures on loopback with autocannon: the bare JSON 404
 * (Express without database or session: the baseline), GET /api/health, a signed-in GET of
 * the comparison of an 8-row project (2 locations × 3 cases + 1 combination), and state
 * saves (PUT …/states/{locationId}, each connection saving its own case so versions never
 * conflict), at CONNECTIONS connections (saves at SAVE_CONNECTIONS). Every route is measured in this run beside the baseline; the comparison/health
 * ratio is the issue's target (≥ 0.5×).
 */
export async function run(): Promise<void> {
  const { server, postmasterPid, stop } = await startThrowawayServer();
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

    const healthRequest = { url: `${origin}/api/health` };
    // A normal signed-in GET, as the web client sends it (no If-None-Match: its answers are no-store).
    const comparisonRequest = { url: comparisonUrl, headers: { cookie } };
    const baseline = await load("JSON 404, no database (baseline)", { url: `${origin}/api/no-such-route` });
    const health = await load("GET /api/health", healthRequest);
    const comparison = await load("GET …/comparison, 8 rows, signed in", comparisonRequest);
    const rounds = await pairedRounds(healthRequest, comparisonRequest);
    const meter = cpuMeter(postmasterPid);
    const healthCpu = meter && (await cpuPerRequest(healthRequest, meter));
    const comparisonCpu = meter && (await cpuPerRequest(comparisonRequest, meter));
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
    // A round in which either route completed nothing (the machine stalled) gives no ratio.
    const counted = rounds.filter((r) => r.health > 0 && r.comparison > 0);
    const ratios = counted.map((r) => r.comparison / r.health);
    console.log(
      `comparison / health in ${PAIRED_ROUNDS} paired ${ROUND_SECONDS}-s rounds (order alternating): median ` +
        `${median(ratios).toFixed(2)}× (rounds ${ratios.map((r) => r.toFixed(2)).join(", ")}` +
        `${counted.length < rounds.length ? `; ${rounds.length - counted.length} stalled round(s) left out` : ""}; ` +
        `median rates: health ${median(counted.map((r) => r.health)).toFixed(0)} req/s, ` +
        `comparison ${median(counted.map((r) => r.comparison)).toFixed(0)} req/s)`,
    );
    if (healthCpu && comparisonCpu) {
      const show = (c: typeof healthCpu) =>
        `${c.processMs.toFixed(2)} + ${c.postgresMs.toFixed(2)} = ${c.totalMs.toFixed(2)} ms`;
      // The load generator runs in this process too, so "this process" includes its share.
      console.log(
        `CPU per request, ${CPU_REQUESTS} requests at ${CPU_CONNECTIONS} connections (this process incl. the load generator + PostgreSQL): ` +
          `health ${show(healthCpu)}, comparison ${show(comparisonCpu)}; ` +
          `health / comparison ${(healthCpu.totalMs / comparisonCpu.totalMs).toFixed(2)}× ` +
          `(what the ratio of rates tends to when CPU is the limit)`,
      );
    }
  } finally {
    await stop();
  }
}
