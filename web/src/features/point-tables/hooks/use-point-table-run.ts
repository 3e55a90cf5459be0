import { startTransition, useCallback, useEffect, useRef, useState } from "react";
import {
  PipelineCancelled,
  runPipeline,
  workerCountFor,
  type PipelineInput,
  type PipelineProgress,
  type PipelineResult,
  type WorkerPort,
} from "../model/pipeline";

export type RunState =
  | { status: "idle" }
  | { status: "running"; progress: PipelineProgress; workers: number }
  | { status: "done"; result: PipelineResult; seconds: number }
  | { status: "cancelled" }
  | { status: "failed"; message: string };

const startWorker = (): WorkerPort =>
  new Worker(new URL("../workers/point-table.worker.ts", import.meta.url), {
    type: "module",
    name: "point-table",
  }) as unknown as WorkerPort;

/**
 * Runs the worker pipeline for one table and keeps its state for the page: progress while it
 * runs (at most one update per animation frame, so a million points do not re-render the page a
 * thousand times), the result (rendered as a transition), a cancellation or an error. Leaving the
 * page stops the workers.
 */
export function usePointTableRun() {
  const [state, setState] = useState<RunState>({ status: "idle" });
  const cancelRef = useRef<(() => void) | null>(null);
  const frame = useRef<number | null>(null);

  useEffect(() => () => cancelRef.current?.(), []);

  const start = useCallback((input: PipelineInput) => {
    cancelRef.current?.();
    const size = "file" in input.source ? input.source.file.size : input.source.text.length;
    const workers = workerCountFor(navigator.hardwareConcurrency, size);
    const began = performance.now();
    let latest: PipelineProgress = { phase: "parse", fraction: 0 };
    setState({ status: "running", progress: latest, workers });
    const run = runPipeline(input, {
      createWorker: startWorker,
      workers,
      onProgress: (p) => {
        latest = p;
        frame.current ??= requestAnimationFrame(() => {
          frame.current = null;
          setState((s) => (s.status === "running" ? { ...s, progress: latest } : s));
        });
      },
    });
    cancelRef.current = run.cancel;
    run.done.then(
      (result) => {
        cancelRef.current = null;
        const seconds = (performance.now() - began) / 1000;
        // a transition: React renders the results (histogram, governing points, the list, the 3D
        // view) in slices, yielding to the browser between components, instead of in one task
        startTransition(() => setState({ status: "done", result, seconds }));
      },
      (error: unknown) => {
        cancelRef.current = null;
        setState(
          error instanceof PipelineCancelled
            ? { status: "cancelled" }
            : { status: "failed", message: error instanceof Error ? error.message : String(error) },
        );
      },
    );
  }, []);

  const cancel = useCallback(() => cancelRef.current?.(), []);
  const reset = useCallback(() => (cancelRef.current?.(), setState({ status: "idle" })), []);

  return { state, start, cancel, reset };
}
