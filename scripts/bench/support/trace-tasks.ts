/**
 * Reads a Chromium trace (Playwright's browser.startTracing/stopTracing, Chrome's trace event
 * format) for what the page's main thread did in its long tasks, including the work no script
 * accounts for (a WebGL call waiting on the GPU process, a paint, a garbage collection): for each
 * top-level task on the renderer's main thread longer than the limit, the trace events inside it
 * by self time (their own time less that of the events nested in them).
 */

/** The trace events read here (complete events, "X", with a duration). */
type TraceEvent = {
  name: string;
  cat: string;
  ph: string;
  pid: number;
  tid: number;
  /** µs */
  ts: number;
  dur?: number;
  args?: { name?: string; data?: { functionName?: string; url?: string; type?: string } };
};

/** The categories {@link describeTraceTasks} needs. */
export const TRACE_CATEGORIES = [
  "toplevel",
  "devtools.timeline",
  "disabled-by-default-devtools.timeline",
  "blink",
  "gpu",
  "cc",
  "v8",
  "v8.execute",
];

/** The renderer main threads of the trace (thread_name "CrRendererMain"), as "pid:tid". */
function rendererMainThreads(events: readonly TraceEvent[]): Set<string> {
  const threads = new Set<string>();
  for (const e of events) {
    if (e.ph === "M" && e.name === "thread_name" && e.args?.name === "CrRendererMain") {
      threads.add(`${e.pid}:${e.tid}`);
    }
  }
  return threads;
}

/** An event's label: its name, with the function or script it ran when the trace says. */
function labelOf(e: TraceEvent): string {
  const d = e.args?.data;
  if (d?.functionName) return `${e.name} ${d.functionName} ${(d.url ?? "").split("/").pop()}`;
  if (d?.url) return `${e.name} ${d.url.split("/").pop()}`;
  return e.name;
}

/**
 * The top-level tasks over `overMs` on the renderer main thread from the first click on
 * (EventDispatch of type "click"; the trace's start when there is none), longest first (at most
 * `top`), each with its start after the click and its events by self time.
 */
export function describeTraceTasks(
  trace: { traceEvents: TraceEvent[] } | TraceEvent[],
  options: { overMs: number; top: number },
): string[] {
  const events = Array.isArray(trace) ? trace : trace.traceEvents;
  const mains = rendererMainThreads(events);
  const onMain = events
    .filter((e) => e.ph === "X" && e.dur !== undefined && mains.has(`${e.pid}:${e.tid}`))
    .sort((a, b) => a.ts - b.ts || b.dur! - a.dur!);
  const click = onMain.find((e) => e.name === "EventDispatch" && e.args?.data?.type === "click");
  const fromUs = click?.ts ?? onMain[0]?.ts ?? 0;
  const runs = onMain.filter(
    (e) => (e.name === "ThreadControllerImpl::RunTask" || e.name === "RunTask") && e.ts >= fromUs,
  );
  // the trace names a task twice (RunTask inside ThreadControllerImpl::RunTask): keep the outer one
  const tasks = runs.filter(
    (e) => !runs.some((o) => o !== e && o.ts <= e.ts && o.ts + o.dur! >= e.ts + e.dur! && o.dur! > e.dur!),
  );
  const long = tasks
    .filter((t) => t.dur! / 1000 > options.overMs)
    .sort((a, b) => b.dur! - a.dur!)
    .slice(0, options.top);
  const lines: string[] = [];
  for (const task of long) {
    const inside = onMain.filter(
      (e) =>
        e !== task &&
        e.pid === task.pid &&
        e.tid === task.tid &&
        e.ts >= task.ts &&
        e.ts + e.dur! <= task.ts + task.dur!,
    );
    // self time: an event's duration less that of its direct children (events are properly nested)
    const self = new Map<string, number>();
    const stack: TraceEvent[] = [];
    const selfOf = new Map<TraceEvent, number>();
    for (const e of inside) {
      while (stack.length > 0 && e.ts >= stack[stack.length - 1].ts + stack[stack.length - 1].dur!)
        stack.pop();
      const parent = stack[stack.length - 1];
      selfOf.set(e, e.dur!);
      if (parent !== undefined) selfOf.set(parent, selfOf.get(parent)! - e.dur!);
      stack.push(e);
    }
    for (const [e, us] of selfOf) self.set(labelOf(e), (self.get(labelOf(e)) ?? 0) + us);
    const covered = inside.filter(
      (e) =>
        !inside.some((p) => p !== e && p.ts <= e.ts && p.ts + p.dur! >= e.ts + e.dur! && p.dur! > e.dur!),
    );
    const untraced = task.dur! - covered.reduce((s, e) => s + e.dur!, 0);
    lines.push(
      `${(task.dur! / 1000).toFixed(0).padStart(5)} ms task at +${((task.ts - fromUs) / 1000).toFixed(0)} ms (trace); inside it by self time:`,
    );
    const top = [...self, ["(in the task, outside any traced event)", untraced] as [string, number]]
      .sort((a, b) => b[1] - a[1])
      .slice(0, 8);
    for (const [label, us] of top) {
      if (us >= 1000) lines.push(`        ${(us / 1000).toFixed(0).padStart(5)} ms  ${label}`);
    }
  }
  return lines;
}
