/**
 * The Web Worker that reads and rates one run of lines of a point table (model/part-task.ts), and
 * in worker 0 joins every part afterwards (model/merge-task.ts); this file only connects them to
 * the worker's messages. The page starts one per core.
 */
import { handleWorkerRequest, type WorkerMessage, type WorkerRequest } from "../model/merge-task";

// The DOM typings describe `self` as a window; in a dedicated worker it is this much.
const scope = self as unknown as {
  onmessage: ((event: MessageEvent<WorkerRequest>) => void) | null;
  postMessage: (message: WorkerMessage, transfer: Transferable[]) => void;
};

scope.onmessage = (event) => {
  void handleWorkerRequest(event.data, (message, transfer) => scope.postMessage(message, transfer));
};
