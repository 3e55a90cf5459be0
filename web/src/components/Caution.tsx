import { useEffect, useSyncExternalStore } from "react";
import { RESULTS_CAUTION } from "../../../core/contract/cautions";

/*
 * The caution is said once per page. A page with results puts <Caution /> beside them; the
 * layout's footer keeps <FooterCaution />, which stands aside while a page's own caution is shown
 * (so the bench and the comparison say it once, beside their results) and speaks on pages without one.
 */
let onPage = 0;
const listeners = new Set<() => void>();
function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
function setOnPage(delta: number) {
  onPage += delta;
  for (const listener of listeners) listener();
}

function CautionLine({ className }: { className: string }) {
  return (
    <p className={`text-sm text-graphite-soft ${className}`} data-testid="results-caution">
      <span aria-hidden="true">⚠ </span>
      {RESULTS_CAUTION}
    </p>
  );
}

/**
 * The permanent caution that stands near every result and in every report.
 * Quiet by design: it is always there, so it must not shout.
 */
export function Caution({ className = "" }: { className?: string }) {
  useEffect(() => {
    setOnPage(1);
    return () => setOnPage(-1);
  }, []);
  return <CautionLine className={className} />;
}

/** The footer's caution, shown only while the page carries none of its own beside its results. */
export function FooterCaution({ className = "" }: { className?: string }) {
  const pageHasOne = useSyncExternalStore(
    subscribe,
    () => onPage > 0,
    () => false,
  );
  return pageHasOne ? null : <CautionLine className={className} />;
}
