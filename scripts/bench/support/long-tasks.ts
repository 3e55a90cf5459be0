/**
 * What held the page's main thread: the browser bench installs {@link longTaskProbe} before the
 * page loads, and reads back every long task (PerformanceObserver "longtask") and every long
 * animation frame (PerformanceObserver "long-animation-frame", Chromium's LoAF API, whose
 * entries name the scripts that ran in the frame: what invoked them, their source file, function
 * and character position). {@link describeLongTasks} turns them into lines: the longest tasks,
 * each with its time since the click and the scripts of the frame it fell in, the minified
 * function named by the built code at its position.
 */
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";

/** One script of a long animation frame, as the page records it. */
export type FrameScript = {
  invoker: string;
  invokerType: string;
  sourceURL: string;
  sourceFunctionName: string;
  sourceCharPosition: number;
  /** ms */
  start: number;
  duration: number;
  forcedStyleAndLayoutDuration: number;
  pauseDuration: number;
};

/** One long animation frame; times in ms on the page's clock (performance.now()). */
export type LongFrame = {
  start: number;
  duration: number;
  blockingDuration: number;
  /** when the frame's rendering (rAF callbacks, style, layout, paint) began; 0 when none */
  renderStart: number;
  styleAndLayoutStart: number;
  scripts: FrameScript[];
};

/** One long task; times in ms on the page's clock. */
export type LongTask = { start: number; duration: number };

/** What the probe gathered since it was last cleared. */
export type LongTaskRecord = {
  /** when the engineer's click reached the page (its event's timeStamp), null before it */
  clickAt: number | null;
  tasks: LongTask[];
  frames: LongFrame[];
};

declare global {
  interface Window {
    __mainThreadLongTasks: LongTaskRecord;
  }
}

/**
 * The probe, as script text (tsx's keepNames helper does not exist in the page, so a function
 * passed from here would fail there without a word). `window.__mainThreadLongTasks` collects; the bench
 * empties it before the click with {@link clearLongTasks}.
 */
export const longTaskProbe = `
  window.__mainThreadLongTasks = { clickAt: null, tasks: [], frames: [] };
  document.addEventListener("click", function (e) {
    if (window.__mainThreadLongTasks.clickAt === null) window.__mainThreadLongTasks.clickAt = e.timeStamp;
  }, true);
  new PerformanceObserver(function (list) {
    for (const e of list.getEntries()) window.__mainThreadLongTasks.tasks.push({ start: e.startTime, duration: e.duration });
  }).observe({ type: "longtask", buffered: true });
  try {
    new PerformanceObserver(function (list) {
      for (const e of list.getEntries()) {
        window.__mainThreadLongTasks.frames.push({
          start: e.startTime,
          duration: e.duration,
          blockingDuration: e.blockingDuration,
          renderStart: e.renderStart,
          styleAndLayoutStart: e.styleAndLayoutStart,
          scripts: Array.from(e.scripts, function (s) {
            return {
              invoker: s.invoker,
              invokerType: s.invokerType,
              sourceURL: s.sourceURL,
              sourceFunctionName: s.sourceFunctionName,
              sourceCharPosition: s.sourceCharPosition,
              start: s.startTime,
              duration: s.duration,
              forcedStyleAndLayoutDuration: s.forcedStyleAndLayoutDuration,
              pauseDuration: s.pauseDuration,
            };
          }),
        });
      }
    }).observe({ type: "long-animation-frame", buffered: true });
  } catch (e) {
    // a browser without LoAF still reports the long tasks
  }
`;

/** Page-side: forget what was gathered so far (run just before the click). */
export const clearLongTasks = () => (window.__mainThreadLongTasks = { clickAt: null, tasks: [], frames: [] });

/** Page-side: what was gathered. */
export const readLongTasks = () => window.__mainThreadLongTasks;

const builtText = new Map<string, string>();
/** A built asset's text (dist/web/assets/<file>), for naming a minified function. */
function builtAsset(webDist: string, url: string): string {
  const file = url.split("/").pop() ?? "";
  let text = builtText.get(file);
  if (text === undefined) {
    const at = path.join(webDist, "assets", file);
    text = file !== "" && existsSync(at) ? readFileSync(at, "utf8") : "";
    builtText.set(file, text);
  }
  return text;
}

/** A script as one line: its length, what invoked it, its file and function and the code where it starts. */
function scriptLine(s: FrameScript, webDist: string): string {
  const file = s.sourceURL.split("/").pop() ?? "";
  const code =
    s.sourceCharPosition >= 0
      ? builtAsset(webDist, s.sourceURL)
          .slice(s.sourceCharPosition, s.sourceCharPosition + 60)
          .replace(/\s+/g, " ")
      : "";
  const name = s.sourceFunctionName || "(anonymous)";
  const extra = [
    s.forcedStyleAndLayoutDuration >= 1
      ? `forced layout ${s.forcedStyleAndLayoutDuration.toFixed(0)} ms`
      : "",
    s.pauseDuration >= 1 ? `paused ${s.pauseDuration.toFixed(0)} ms` : "",
  ]
    .filter(Boolean)
    .join(", ");
  return `${s.duration.toFixed(0).padStart(5)} ms  ${s.invokerType} ${s.invoker}  → ${name} ${file}@${s.sourceCharPosition}${extra ? ` (${extra})` : ""}  ${code}`;
}

/** The frame a task fell in: the long animation frame that overlaps it most. */
function frameOf(task: LongTask, frames: readonly LongFrame[]): LongFrame | null {
  let best: LongFrame | null = null;
  let bestOverlap = 0;
  for (const f of frames) {
    const overlap =
      Math.min(task.start + task.duration, f.start + f.duration) - Math.max(task.start, f.start);
    if (overlap > bestOverlap) {
      best = f;
      bestOverlap = overlap;
    }
  }
  return best;
}

/**
 * The `top` longest tasks over `overMs`, longest first, each with its time since the click and
 * what ran in it: the scripts of its long animation frame (longest first) and the time of the
 * frame spent outside any script (rendering: style, layout, paint, and — for a WebGL canvas —
 * waiting on the GPU process).
 */
export function describeLongTasks(
  record: LongTaskRecord,
  options: { top: number; overMs: number; webDist: string },
): string[] {
  const click = record.clickAt ?? 0;
  const lines: string[] = [];
  const longest = [...record.tasks]
    .filter((t) => t.duration > options.overMs)
    .sort((a, b) => b.duration - a.duration)
    .slice(0, options.top);
  for (const task of longest) {
    lines.push(
      `${task.duration.toFixed(0).padStart(5)} ms task at +${(task.start - click).toFixed(0)} ms after the click`,
    );
    const frame = frameOf(task, record.frames);
    if (frame === null) {
      lines.push("        (no long animation frame overlaps it)");
      continue;
    }
    const inScripts = frame.scripts.reduce((s, x) => s + x.duration, 0);
    const rendering = frame.renderStart > 0 ? frame.start + frame.duration - frame.renderStart : 0;
    const styleAndLayout =
      frame.styleAndLayoutStart > 0 ? frame.start + frame.duration - frame.styleAndLayoutStart : 0;
    lines.push(
      `        its frame: +${(frame.start - click).toFixed(0)} ms, ${frame.duration.toFixed(0)} ms (blocking ${frame.blockingDuration.toFixed(0)} ms), scripts ${inScripts.toFixed(0)} ms, rendering phase ${rendering.toFixed(0)} ms (of which style, layout, paint and commit ${styleAndLayout.toFixed(0)} ms)`,
    );
    for (const s of [...frame.scripts].sort((a, b) => b.duration - a.duration).slice(0, 5)) {
      lines.push(`        ${scriptLine(s, options.webDist)}`);
    }
  }
  return lines;
}
