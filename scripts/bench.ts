/**
 * `npm run bench`: runs every module in scripts/bench/ (or those named on the command
 * line, e.g. `npm run bench -- health`). Each module exports `run()` and prints its own
 * figures as ratios against a baseline measured in the same run, so the numbers compare
 * across machines. Speed targets live here, never in timed tests.
 */
import { readdirSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const benchDir = path.join(path.dirname(fileURLToPath(import.meta.url)), "bench");
const wanted = process.argv.slice(2);
const suites = readdirSync(benchDir)
  .filter((file) => file.endsWith(".ts")) // support/ holds shared helpers, not suites
  .filter((file) => wanted.length === 0 || wanted.some((name) => file.includes(name)))
  .sort();

console.log(
  `Sigmacube benchmarks · ${new Date().toISOString()} · Node ${process.version} · ${os.cpus()[0]?.model ?? "cpu"} × ${os.cpus().length}`,
);
if (suites.length === 0) {
  console.error(`no benchmark matches ${wanted.join(", ")}; available: ${readdirSync(benchDir).join(", ")}`);
  process.exit(1);
}
for (const file of suites) {
  console.log(`\n── ${file.replace(/\.ts$/, "")} ──`);
  const suite = (await import(pathToFileURL(path.join(benchDir, file)).href)) as { run: () => Promise<void> };
  await suite.run();
}
