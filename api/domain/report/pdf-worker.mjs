// The report's PDF worker thread. Worker threads do not inherit tsx's loader (not under vitest
// nor under `tsx`): register it here, then load the TypeScript worker.
import { register } from "tsx/esm/api";

register();
await import("./pdf-worker.ts");
