// `npm start` on a fresh clone: installs what is missing, then hands over to scripts/serve.ts.
// Plain JavaScript with no dependencies, because it runs before `npm ci` has.
import { spawn } from "node:child_process";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { ensureSetup } from "./setup.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

// npm dependencies, and Debian's postgresql unless DATABASE_URL names another server.
ensureSetup("start");

// Ctrl-C reaches both processes (same process group); the child shuts down cleanly and we wait for it.
// The IPC channel lets the child notice if this process dies without passing a signal on.
const child = spawn(process.execPath, ["--import", "tsx", path.join(root, "scripts", "serve.ts")], {
  cwd: root,
  stdio: ["inherit", "inherit", "inherit", "ipc"],
});
for (const signal of ["SIGINT", "SIGTERM"]) process.on(signal, () => child.kill(signal));
child.on("exit", (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
