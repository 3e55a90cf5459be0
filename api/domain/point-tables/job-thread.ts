import { parentPort, Worker } from "node:worker_threads";

/** What a job thread's worker answers to one message: its answer, or what went wrong. */
type JobAnswer<Answer> =
  { job: number; ok: true; answer: Answer } | { job: number; ok: false; message: string };

type Pending<Answer> = { resolve: (answer: Answer) => void; reject: (error: Error) => void };

/**
 * A worker thread that answers messages one at a time, in the order sent, each with a promise:
 * started on first use, kept for the life of the process, and not keeping the process alive
 * while idle. A worker that dies rejects the jobs it had; the next message starts a new one.
 * @param url the worker's entry: a .mjs file that registers the TypeScript loader, then loads a
 *   worker that calls {@link serveJobs}
 */
export class JobThread<Message, Answer> {
  private worker: Worker | null = null;
  private readonly pending = new Map<number, Pending<Answer>>();
  private nextJob = 1;

  constructor(
    private readonly url: URL,
    private readonly name: string,
  ) {}

  /** Sends `message` (moving the buffers in `transfer` rather than copying them) and answers its answer. */
  run(message: Message, transfer: ArrayBuffer[] = []): Promise<Answer> {
    const worker = (this.worker ??= this.start());
    const job = this.nextJob++;
    return new Promise<Answer>((resolve, reject) => {
      this.pending.set(job, { resolve, reject });
      worker.ref();
      worker.postMessage({ job, message }, transfer);
    });
  }

  private start(): Worker {
    const worker = new Worker(this.url);
    worker.on("message", (answer: JobAnswer<Answer>) => {
      const p = this.pending.get(answer.job);
      if (!p) return;
      this.pending.delete(answer.job);
      if (this.pending.size === 0) worker.unref();
      if (answer.ok) p.resolve(answer.answer);
      else p.reject(new Error(`${this.name}: ${answer.message}`));
    });
    worker.on("error", (error) => this.abandon(worker, error));
    worker.on("exit", (code) => this.abandon(worker, new Error(`${this.name} stopped (exit code ${code})`)));
    worker.unref();
    return worker;
  }

  /** Rejects every job of a worker that died and forgets it. */
  private abandon(worker: Worker, error: Error): void {
    if (this.worker !== worker) return;
    this.worker = null;
    for (const p of this.pending.values()) p.reject(error);
    this.pending.clear();
  }
}

/**
 * The worker's side of a {@link JobThread}: answers each message with `handle`'s result, moving
 * the buffers it lists back instead of copying them; a thrown error is answered as a failed job.
 */
export function serveJobs<Message, Answer>(
  handle: (message: Message) => { answer: Answer; transfer?: ArrayBuffer[] },
): void {
  const port = parentPort;
  if (port === null) throw new Error("serveJobs runs in a worker thread");
  port.on("message", ({ job, message }: { job: number; message: Message }) => {
    let reply: JobAnswer<Answer>;
    let transfer: ArrayBuffer[] = [];
    try {
      const done = handle(message);
      reply = { job, ok: true, answer: done.answer };
      transfer = done.transfer ?? [];
    } catch (error) {
      reply = { job, ok: false, message: error instanceof Error ? error.message : String(error) };
    }
    port.postMessage(reply, transfer);
  });
}
