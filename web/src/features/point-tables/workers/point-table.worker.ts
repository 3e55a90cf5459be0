/**
 * The Web Worker that reads and rates one run of lines of a point table (model/part-task.ts does
 * the work; this file only connects it to the worker's messages). The page starts one per core.
 */
import { runPart, type PartMessage, type PartRequest } from "../model/part-task";

// The DOM typings describe `self` as a window; in a dedicated worker it is this much.
const scope = self as unknown as {
  onmessage: ((event: MessageEvent<PartRequest>) => void) | null;
  postMessage: (message: PartMessage, transfer: Transferable[]) => void;
};

scope.onmessage = (event) => {
  void runPart(event.data, (message, transfer) => scope.postMessage(message, transfer));
};
