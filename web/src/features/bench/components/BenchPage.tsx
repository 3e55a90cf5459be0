import { useEffect, useState } from "react";
import { useUrlSync } from "../hooks/use-url-sync";
import { useBenchStore } from "../model/store";
import { CriteriaPanel } from "./CriteriaPanel";
import { ElementPanel } from "./ElementPanel";
import { EnvelopePlot } from "./EnvelopePlot";
import { MohrPanel } from "./MohrPanel";
import { PrincipalPanel } from "./PrincipalPanel";
import { SavedStateBar, benchOrigin } from "./SavedStateBar";
import { ShareBar } from "./ShareBar";
import { StressInputPanel } from "./StressInputPanel";

/** What the heading says the bench holds. */
const HOLDS = {
  saved: "a saved stress state from a project (below)",
  combination: "a combination's superposed state, view only",
  unsaved: "an unsaved stress state",
} as const;

/**
 * The bench: the state the engineer has, the element they turn, the diagram that explains it and
 * the verdict that matters, linked through one store. Reads and writes its state in the URL.
 */
export function BenchPage() {
  useUrlSync();
  const act = useBenchStore((s) => s.act);
  // Read on arrival, as the saved-state bar does: the bench then rewrites its address.
  const [origin] = useState(() => benchOrigin(window.location.search));

  // Ctrl+Z / Ctrl+Shift+Z (or Ctrl+Y) undo and redo stress edits, except while typing in a field.
  useEffect(() => {
    function onKey(event: KeyboardEvent) {
      const target = event.target as HTMLElement | null;
      if (
        target &&
        (target.tagName === "INPUT" || target.tagName === "TEXTAREA" || target.tagName === "SELECT")
      )
        return;
      if (!(event.ctrlKey || event.metaKey)) return;
      const key = event.key.toLowerCase();
      if (key === "z" && !event.shiftKey) act.undo();
      else if ((key === "z" && event.shiftKey) || key === "y") act.redo();
      else return;
      event.preventDefault();
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [act]);

  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1">
        <h1 className="text-base font-semibold tracking-tight">
          Bench{" "}
          <span className="text-[13px] font-normal text-graphite-soft">
            — {HOLDS[origin]}; tension positive, shear as tensor components
          </span>
        </h1>
        <ShareBar />
      </div>
      <SavedStateBar />
      {/* At phone width the three columns dissolve (display: contents) into one column, and the
          order classes keep the reading order: state, element, diagrams, verdict. */}
      <div className="grid items-start gap-2 md:grid-cols-[17rem_minmax(0,1fr)] xl:grid-cols-[17.5rem_minmax(0,1fr)_minmax(0,1fr)]">
        <div className="contents md:flex md:min-w-0 md:flex-col md:gap-2">
          <div className="order-1 min-w-0 md:order-none">
            <StressInputPanel />
          </div>
          <div className="order-2 min-w-0 md:order-none">
            <PrincipalPanel />
          </div>
        </div>
        <div className="contents md:flex md:min-w-0 md:flex-col md:gap-2">
          <div className="order-3 min-w-0 md:order-none">
            <ElementPanel />
          </div>
          <div className="order-5 min-w-0 md:order-none">
            <EnvelopePlot />
          </div>
        </div>
        <div className="contents md:col-span-2 md:grid md:min-w-0 md:grid-cols-2 md:gap-2 xl:col-span-1 xl:flex xl:flex-col">
          <div className="order-4 min-w-0 md:order-none">
            <MohrPanel />
          </div>
          <div className="order-6 min-w-0 md:order-none">
            <CriteriaPanel />
          </div>
        </div>
      </div>
    </div>
  );
}
