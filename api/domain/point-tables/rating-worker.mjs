// Worker threads do not inherit the TypeScript loader of the process (tsx under `npm start`,
// Vite's under vitest): register tsx here, then load the TypeScript worker.
import { register } from "tsx/esm/api";

register();
await import("./rating-worker.ts");
