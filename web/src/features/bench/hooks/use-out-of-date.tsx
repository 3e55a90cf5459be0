import { OutOfDateNotice } from "../components/OutOfDateNotice";
import { selectInputValid } from "../model/bench-state";
import { useBenchStore } from "../model/store";

/**
 * For a results panel's `outOfDate` slot: the one {@link OutOfDateNotice} while any input cell of the
 * bench is not valid, else undefined (the panel shows its results).
 */
export function useOutOfDate() {
  const valid = useBenchStore(selectInputValid);
  return valid ? undefined : <OutOfDateNotice />;
}
