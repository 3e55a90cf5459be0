import { useEffect } from "react";
import { benchAddress, decodeBenchState, encodeBenchState } from "../model/url-state";
import { useBenchStore } from "../model/store";

/** How long the state must rest before the address is rewritten (a drag would otherwise flood history). */
const WRITE_DELAY_MS = 250;

/**
 * Keeps the bench's shareable state in the address bar: reads a link once on arrival, then writes
 * the state back with `history.replaceState` (no new history entries, no router re-render).
 */
export function useUrlSync() {
  useEffect(() => {
    const shared = decodeBenchState(window.location.search);
    if (Object.keys(shared).length > 0) useBenchStore.getState().act.applyShared(shared);
    let timer: number | undefined;
    // A bench opened from a project keeps its `source` (workspace/project/case/location) in the address.
    const source = new URLSearchParams(window.location.search).get("source");
    const benchPath = window.location.pathname;
    const write = () => {
      const url = benchAddress(
        window.location,
        benchPath,
        source,
        encodeBenchState(useBenchStore.getState()),
      );
      if (url) window.history.replaceState(window.history.state, "", url);
    };
    write();
    const unsubscribe = useBenchStore.subscribe(() => {
      window.clearTimeout(timer);
      timer = window.setTimeout(write, WRITE_DELAY_MS);
    });
    return () => {
      window.clearTimeout(timer);
      unsubscribe();
    };
  }, []);
}

/** The link to the current state (computed fresh, not read from the possibly stale address bar). */
export function currentLink(): string {
  return `${window.location.origin}${window.location.pathname}?${encodeBenchState(useBenchStore.getState())}`;
}
