import { describe, expect, it } from "vitest";
import {
  evaluatePointTable,
  parsePointTable,
  type PointTableOptions,
  type PointTableSpec,
} from "../../../../../core";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { byteLineCuts } from "./byte-cuts";
import { cloudView } from "./cloud-view";
import { handleWorkerRequest, type WorkerMessage, type WorkerRequest } from "./merge-task";
import { READ_PIECE_BYTES, runPart, type PartMessage } from "./part-task";
import { PipelineCancelled, WORST_KEPT, runPipeline, workerCountFor, type WorkerPort } from "./pipeline";

// The reference for every check here is core's own one-piece path (parsePointTable then
// evaluatePointTable on the whole text): the pipeline must give exactly what it gives.

const SPEC: PointTableSpec = {
  material: { yield: 250e6, ultimateTension: 400e6, ultimateCompression: 600e6 },
  requirements: [
    { criterion: "von-mises", requiredFactor: 1.5 },
    { criterion: "tresca", requiredFactor: 1.5 },
    { criterion: "max-principal", requiredFactor: 2 },
  ],
};
const OPTIONS: PointTableOptions = {
  separator: ",",
  header: true,
  skipRows: 1,
  columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
  unit: "MPa",
};
const NAMES = ["id", "x", "y", "z", "sxx", "syy", "szz", "sxy", "syz", "szx"];

/** A title line, a header and `rows` seeded rows; rows listed in `bad` get a word in σyy. */
function generated(rows: number, bad: ReadonlySet<number> = new Set()): string {
  const random = seededRandom(7);
  const lines = ["generated for the pipeline test", NAMES.join(",")];
  for (let i = 0; i < rows; i++) {
    const s = Array.from({ length: 6 }, () => ((random() - 0.5) * 400).toFixed(3));
    if (bad.has(i)) s[1] = "n/a";
    lines.push([i + 1, random().toFixed(4), random().toFixed(4), random().toFixed(4), ...s].join(","));
  }
  return lines.join("\r\n") + "\r\n";
}

/** A fake Worker: answers each request in this thread on the next turn, delivering what it posts. */
class FakeWorker implements WorkerPort {
  onmessage: ((event: { data: WorkerMessage }) => void) | null = null;
  onerror: ((event: { message?: string }) => void) | null = null;
  terminated = false;
  /** the first request (the part), and every request */
  received: WorkerRequest | null = null;
  requests: WorkerRequest[] = [];
  /** what the page moved here, and what this worker moved back */
  given: Transferable[] = [];
  transferred: Transferable[] = [];
  constructor(private readonly hold: (request: WorkerRequest) => boolean = () => false) {}
  postMessage(message: WorkerRequest, transfer: Transferable[] = []) {
    this.received ??= message;
    this.requests.push(message);
    this.given.push(...transfer);
    if (this.hold(message)) return;
    setTimeout(() => {
      void handleWorkerRequest(message, (m, transfer) => {
        this.transferred.push(...transfer);
        if (!this.terminated) this.onmessage?.({ data: m });
      });
    }, 0);
  }
  terminate() {
    this.terminated = true;
  }
}

function reference(text: string) {
  const table = parsePointTable(text, OPTIONS);
  return { table, evaluation: evaluatePointTable(table.components, SPEC, { worstCount: WORST_KEPT }) };
}

describe("runPipeline", () => {
  it("when a pasted text is read by three fake workers, then points, bad rows, governing points, histogram and worst points equal core's one-piece path", async () => {
    const text = generated(3000, new Set([10, 1500, 2999]));
    const ref = reference(text);
    const workers: FakeWorker[] = [];
    const run = runPipeline(
      { source: { text }, options: OPTIONS, spec: SPEC, includeUnsuited: false, columnNames: NAMES },
      {
        createWorker: () => (workers.push(new FakeWorker()), workers.at(-1)!),
        workers: 3,
        onProgress: () => {},
      },
    );
    const { table, evaluation } = await run.done;
    expect(workers).toHaveLength(3);
    expect(table.count).toBe(ref.table.count);
    expect(table.badRows).toEqual(ref.table.badRows);
    expect(Array.from(table.components)).toEqual(Array.from(ref.table.components));
    expect(Array.from(evaluation.utilisation)).toEqual(Array.from(ref.evaluation.utilisation));
    expect(evaluation.histogram.counts).toEqual(ref.evaluation.histogram.counts);
    expect(evaluation.worst).toEqual(ref.evaluation.worst);
    expect([evaluation.failing, evaluation.close]).toEqual([ref.evaluation.failing, ref.evaluation.close]);
    expect(evaluation.criteria.map((c) => [c.governing, c.failing, c.close])).toEqual(
      ref.evaluation.criteria.map((c) => [c.governing, c.failing, c.close]),
    );
    // parts after the first read neither the title line nor the header
    expect(workers[1].received).toMatchObject({
      options: { skipRows: 0, header: false, columnNames: NAMES },
    });
  });

  it("when a file is read by two fake workers, then a bad row in the second half is named by its line in the whole file", async () => {
    const text = generated(4000, new Set([3500]));
    const ref = reference(text);
    const run = runPipeline(
      {
        source: { file: new Blob([text]) },
        options: OPTIONS,
        spec: SPEC,
        includeUnsuited: false,
        columnNames: NAMES,
      },
      { createWorker: () => new FakeWorker(), workers: 2, onProgress: () => {} },
    );
    const { table, workers } = await run.done;
    expect(workers).toBe(2);
    // line 1 is the title, 2 the header, so row k (0-based) is line k + 3
    expect(table.badRows.first).toEqual([{ line: 3503, reason: expect.stringContaining("σyy") }]);
    expect(table.badRows).toEqual(ref.table.badRows);
    expect(Array.from(table.ids as Float64Array)).toEqual(Array.from(ref.table.ids as Float64Array));
  });

  it("when a worker finishes, then its arrays come back by transfer, not copied", async () => {
    const text = generated(200);
    const worker = new FakeWorker();
    const { table } = await runPipeline(
      { source: { text }, options: OPTIONS, spec: SPEC, includeUnsuited: false, columnNames: NAMES },
      { createWorker: () => worker, workers: 1, onProgress: () => {} },
    ).done;
    expect(worker.transferred).toContain(table.components.buffer);
    expect(worker.transferred).toContain(table.coordinates!.buffer);
  });

  it("when two workers finish, then worker 0 joins the parts: their arrays go to it by transfer and the whole comes back by transfer", async () => {
    const text = generated(3000, new Set([2500]));
    const ref = reference(text);
    const workers: FakeWorker[] = [];
    const { table, evaluation } = await runPipeline(
      { source: { text }, options: OPTIONS, spec: SPEC, includeUnsuited: false, columnNames: NAMES },
      {
        createWorker: () => (workers.push(new FakeWorker()), workers.at(-1)!),
        workers: 2,
        onProgress: () => {},
      },
    ).done;
    expect(workers[0].requests.map((r) => ("kind" in r ? r.kind : "part"))).toEqual(["part", "merge"]);
    expect(workers[1].requests).toHaveLength(1);
    // every array of both parts is handed over, none copied on the page
    const merge = workers[0].requests[1];
    if (!("kind" in merge)) throw new Error("the second request is not a merge");
    for (const part of merge.parts) {
      expect(workers[0].given).toContain(part.table.components.buffer);
      expect(workers[0].given).toContain(part.evaluation.utilisation.buffer);
    }
    expect(workers[0].transferred).toContain(table.components.buffer);
    expect(workers[0].transferred).toContain(evaluation.utilisation.buffer);
    expect(workers.every((w) => w.terminated)).toBe(true);
    expect(table.badRows).toEqual(ref.table.badRows);
    expect(Array.from(evaluation.utilisation)).toEqual(Array.from(ref.evaluation.utilisation));
  });

  it("when what the 3D view draws is asked for, then one worker or the joining worker makes it for the whole table, and without the ask there is none", async () => {
    const text = generated(3000);
    const ref = reference(text);
    const expected = cloudView(ref.table.coordinates!, ref.evaluation.utilisation);
    for (const workers of [1, 2]) {
      const made: FakeWorker[] = [];
      const input = {
        source: { text },
        options: OPTIONS,
        spec: SPEC,
        includeUnsuited: false,
        columnNames: NAMES,
      };
      const setup = {
        createWorker: () => (made.push(new FakeWorker()), made.at(-1)!),
        workers,
        onProgress: () => {},
      };
      const { cloud } = await runPipeline({ ...input, cloud: true }, setup).done;
      expect(cloud, `${workers} worker(s)`).toEqual(expected);
      expect(made[0].transferred).toContain(cloud!.positions.buffer);
      expect((await runPipeline(input, setup).done).cloud).toBeNull();
    }
  });

  it("when the run is cancelled while worker 0 joins the parts, then it rejects as cancelled and worker 0 is terminated", async () => {
    const workers: FakeWorker[] = [];
    const run = runPipeline(
      {
        source: { text: generated(3000) },
        options: OPTIONS,
        spec: SPEC,
        includeUnsuited: false,
        columnNames: NAMES,
      },
      {
        createWorker: () => (workers.push(new FakeWorker((r) => "kind" in r)), workers.at(-1)!),
        workers: 2,
        onProgress: () => {},
      },
    );
    await expect.poll(() => workers[0]?.requests.length).toBe(2);
    run.cancel();
    await expect(run.done).rejects.toBeInstanceOf(PipelineCancelled);
    expect(workers[0].terminated).toBe(true);
  });

  it("when the run is cancelled, then it rejects as cancelled and every worker is terminated", async () => {
    const workers: FakeWorker[] = [];
    const run = runPipeline(
      {
        source: { text: generated(3000) },
        options: OPTIONS,
        spec: SPEC,
        includeUnsuited: false,
        columnNames: NAMES,
      },
      {
        createWorker: () => (workers.push(new FakeWorker(() => true)), workers.at(-1)!),
        workers: 2,
        onProgress: () => {},
      },
    );
    await new Promise((r) => setTimeout(r, 0));
    run.cancel();
    await expect(run.done).rejects.toBeInstanceOf(PipelineCancelled);
    expect(workers.length).toBe(2);
    expect(workers.every((w) => w.terminated)).toBe(true);
  });

  it("when a worker reports an error, then the run rejects with its message and the other workers stop", async () => {
    const workers: FakeWorker[] = [];
    const run = runPipeline(
      {
        source: { text: generated(3000) },
        // a decimal comma with a comma separator: core's parser refuses the options
        options: { ...OPTIONS, decimal: "," },
        spec: SPEC,
        includeUnsuited: false,
        columnNames: NAMES,
      },
      {
        createWorker: () => (workers.push(new FakeWorker()), workers.at(-1)!),
        workers: 2,
        onProgress: () => {},
      },
    );
    await expect(run.done).rejects.toThrow(/decimal comma/);
    expect(workers.every((w) => w.terminated)).toBe(true);
  });

  it("when progress is reported, then it never goes back and ends at the whole", async () => {
    const fractions: number[] = [];
    await runPipeline(
      {
        source: { file: new Blob([generated(3000)]) },
        options: OPTIONS,
        spec: SPEC,
        includeUnsuited: false,
        columnNames: NAMES,
      },
      { createWorker: () => new FakeWorker(), workers: 2, onProgress: (p) => fractions.push(p.fraction) },
    ).done;
    expect(fractions.length).toBeGreaterThan(2);
    for (let i = 1; i < fractions.length; i++) expect(fractions[i]).toBeGreaterThanOrEqual(fractions[i - 1]);
    expect(fractions.at(-1)).toBe(1);
  });
});

describe("runPart on a file slice", () => {
  it("when a worker's slice is longer than one read piece, then lines cut between pieces are read whole and progress is posted per piece", async () => {
    // about 5 MB: two pieces of READ_PIECE_BYTES (4 MB)
    const text = generated(60_000, new Set([59_000]));
    const bytes = new TextEncoder().encode(text);
    expect(bytes.length).toBeGreaterThan(READ_PIECE_BYTES);
    const messages: PartMessage[] = [];
    await runPart(
      {
        source: { blob: new Blob([bytes]) },
        options: OPTIONS,
        spec: SPEC,
        includeUnsuited: false,
        worstCount: 10,
      },
      (m) => messages.push(m),
    );
    const done = messages.find((m) => m.kind === "done");
    if (done?.kind !== "done") throw new Error(`no result: ${JSON.stringify(messages.at(-1))}`);
    const ref = parsePointTable(text, OPTIONS);
    expect(done.table.count).toBe(ref.count);
    expect(done.table.badRows).toEqual(ref.badRows);
    expect(Array.from(done.table.components)).toEqual(Array.from(ref.components));
    const reading = messages.filter((m) => m.kind === "progress" && m.phase === "parse");
    expect(reading.map((m) => (m.kind === "progress" ? m.done : 0))).toEqual([
      READ_PIECE_BYTES,
      bytes.length,
    ]);
  });
});

describe("workerCountFor and byteLineCuts", () => {
  it("when the browser reports cores, then one worker per core, capped at eight, and one for a small file", () => {
    expect(workerCountFor(2, 90e6)).toBe(2);
    expect(workerCountFor(64, 90e6)).toBe(8);
    expect(workerCountFor(undefined, 90e6)).toBe(2);
    expect(workerCountFor(16, 1000)).toBe(1);
  });

  it("when a file has multi-byte characters, then every cut falls just after a line feed", async () => {
    const text = Array.from({ length: 500 }, (_, i) => `σ-${i},1,2,3,4,5,6`).join("\n") + "\n";
    const bytes = new TextEncoder().encode(text);
    const cuts = await byteLineCuts(new Blob([bytes]), 4);
    expect(cuts).toHaveLength(3);
    for (const c of cuts) expect(bytes[c - 1]).toBe(10);
    expect([...cuts].sort((a, b) => a - b)).toEqual(cuts);
  });
});
