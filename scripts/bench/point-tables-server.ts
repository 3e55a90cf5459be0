import { evaluatePointTable, parsePointTable } from "../../core/index";
import { chunksOf } from "../../db/repositories/point-table-chunks";
import { evaluateStoredTable } from "../../api/domain/point-tables/evaluate";
import type { PointTableRating } from "../../api/domain/point-tables/spec";
import { LoadCase } from "../../db/models/load-case";
import { Project } from "../../db/models/project";
import { Workspace } from "../../db/models/workspace";
import { createPointTable, storePointTableContent } from "../../db/repositories/point-tables";
import { BENCH_SPEC, GENERATED_LAYOUT, generatePointTableText } from "./support/point-table-text";
import { startThrowawayServer } from "./support/throwaway-server";

const ROWS = 1_000_000;
const REPEATS = 3;

/**
 * The server's evaluation of a stored 1,000,000-point table (api/domain/point-tables/evaluate.ts:
 * reads the binary chunks back from PostgreSQL, evaluates them with core's PointTableEvaluator in
 * slices that yield the event loop, merges the summaries), against core's evaluatePointTable on
 * the same points in memory, in one call, in the same run — the ratio is the price of the storage
 * round trip and of yielding. Also: how long storing the parsed table took, and the slowest
 * `GET /api/health` answer while the server evaluated (the API must keep answering).
 */
export async function run(): Promise<void> {
  const text = generatePointTableText(ROWS);
  const table = parsePointTable(text, GENERATED_LAYOUT);
  const rating: PointTableRating = {
    spec: BENCH_SPEC,
    includeUnsuited: true,
    material: { strengths: BENCH_SPEC.material, label: "bench material", kind: "none", note: "" },
    basis: "bench",
  };
  const { server, stop } = await startThrowawayServer();
  try {
    const workspace = await Workspace.create({ name: "Bench" });
    const project = await Project.create({
      workspaceId: workspace.id,
      name: "Bench",
      requirements: BENCH_SPEC.requirements,
    });
    const loadCase = await LoadCase.create({ projectId: project.id, name: "Bench", category: "design" });
    const row = await createPointTable({
      projectId: project.id,
      loadCaseId: loadCase.id,
      fileName: "bench.csv",
      sizeBytes: text.length,
      sha256: "0".repeat(64),
      layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
      columns: GENERATED_LAYOUT.columns,
      unit: "MPa",
      idKind: "number",
      createdBy: null,
    });
    let t = performance.now();
    const stored = await server.context.sequelize.transaction((transaction) =>
      storePointTableContent(
        row.id,
        { chunks: chunksOf(table), pointCount: table.count, hasCoordinates: true, badRows: table.badRows },
        transaction,
      ),
    );
    const storeMs = performance.now() - t;

    let memoryMs = Number.POSITIVE_INFINITY;
    let serverMs = Number.POSITIVE_INFINITY;
    let slowestHealth = 0;
    let healthAnswers = 0;
    let agree = true;
    for (let r = 0; r < REPEATS; r++) {
      t = performance.now();
      const inMemory = evaluatePointTable(table.components, BENCH_SPEC, { includeUnsuited: true });
      memoryMs = Math.min(memoryMs, performance.now() - t);

      let done = false;
      t = performance.now();
      const evaluation = evaluateStoredTable(stored, rating).finally(() => (done = true));
      const probe = (async () => {
        while (!done) {
          const began = performance.now();
          await fetch(`${server.url}/api/health`).then((res) => res.arrayBuffer());
          slowestHealth = Math.max(slowestHealth, performance.now() - began);
          healthAnswers++;
        }
      })();
      const result = await evaluation;
      serverMs = Math.min(serverMs, performance.now() - t);
      await probe;
      agree &&=
        result.countFail === inMemory.failing &&
        result.perCriterion.every((c, i) => c.countFail === inMemory.criteria[i].failing);
    }
    const perMillion = (ms: number) => ((ms / 1000) * 1e6) / ROWS;
    console.log(
      `${ROWS.toLocaleString("en-US")} points stored as ${Math.ceil(ROWS / 65_536)} chunks in ${(storeMs / 1000).toFixed(2)} s`,
    );
    console.log(
      `${"core evaluatePointTable in memory, baseline".padEnd(48)} ${perMillion(memoryMs).toFixed(2)} s per million points`,
    );
    console.log(
      `${"server evaluation of the stored table".padEnd(48)} ${perMillion(serverMs).toFixed(2)} s per million points`,
    );
    console.log(`point table server evaluation / in memory: ${(serverMs / memoryMs).toFixed(2)}× the time`);
    console.log(
      `GET /api/health during the server evaluations: ${healthAnswers} answers, slowest ${slowestHealth.toFixed(0)} ms`,
    );
    if (!agree)
      console.log("UNEXPECTED: the server's and the in-memory evaluation count different failing points");
    console.log(
      `target: a few seconds per million points (${perMillion(serverMs) <= 5 ? "met" : "NOT met"}: ≤ 5 s taken as the bound)`,
    );
  } finally {
    await stop();
  }
}
