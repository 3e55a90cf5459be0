import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";

/** CPU time so far, in ms: this process (server and load generator) and a PostgreSQL cluster. */
export type CpuTime = { processMs: number; postgresMs: number };

/** Clock ticks per second of /proc's CPU times. */
function ticksPerSecond(): number {
  try {
    return Number(execFileSync("getconf", ["CLK_TCK"]).toString().trim()) || 100;
  } catch {
    return 100;
  }
}

/** user + system + waited-for children's CPU ticks of `pid` from /proc, 0 when it has gone. */
function ticksOf(pid: string): number {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    return Number(fields[11]) + Number(fields[12]) + Number(fields[13]) + Number(fields[14]);
  } catch {
    return 0;
  }
}

/**
 * A reader of the CPU time spent by this process and by the PostgreSQL cluster whose
 * postmaster is `postmasterPid` (its own and its children's, backends included: exited ones
 * count through the postmaster's waited-for time), or null where there is no /proc.
 *
 * CPU time per request does not depend on how busy the rest of the machine is, unlike
 * requests per second, which on a machine shared with other work can change several-fold
 * from one second to the next.
 */
export function cpuMeter(postmasterPid: number): (() => CpuTime) | null {
  try {
    readFileSync(`/proc/${postmasterPid}/stat`, "utf8");
  } catch {
    return null;
  }
  const msPerTick = 1000 / ticksPerSecond();
  return () => {
    const usage = process.cpuUsage();
    let children: string[] = [];
    try {
      children = execFileSync("pgrep", ["-P", String(postmasterPid)])
        .toString()
        .trim()
        .split("\n");
    } catch {
      // pgrep exits 1 when there are none
    }
    const ticks = [String(postmasterPid), ...children.filter(Boolean)].reduce(
      (sum, pid) => sum + ticksOf(pid),
      0,
    );
    return { processMs: (usage.user + usage.system) / 1000, postgresMs: ticks * msPerTick };
  };
}
