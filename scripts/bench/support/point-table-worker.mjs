// Worker threads do not inherit tsx's loader: register it here, then load the TypeScript worker.
import { register } from "tsx/esm/api";

register();
await import("./point-table-worker.ts");
