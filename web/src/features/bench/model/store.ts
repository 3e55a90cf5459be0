/**
 * The bench's one Zustand store. It holds the editor state and offers the named pure actions
 * (./actions) bound to it; nothing else writes the state.
 */
import { create } from "zustand";
import * as actions from "./actions";
import { initialBenchState, type BenchState } from "./bench-state";

type PureActions = typeof actions;
type Bindable = {
  [K in keyof PureActions]: PureActions[K] extends (state: BenchState, ...args: infer A) => BenchState
    ? K
    : never;
}[keyof PureActions];

/** The actions, bound to the store: same names, without the state argument. */
export type BoundActions = {
  [K in Bindable]: PureActions[K] extends (state: BenchState, ...args: infer A) => BenchState
    ? (...args: A) => void
    : never;
};

/** The store's shape: the state plus its bound actions under `act`. */
export type BenchStore = BenchState & { act: BoundActions };

/** Builds a fresh store (tests make their own; the app uses {@link useBenchStore}). */
export function createBenchStore(initial: BenchState = initialBenchState()) {
  return create<BenchStore>()((set) => {
    const bound: Record<string, (...args: unknown[]) => void> = {};
    for (const [name, fn] of Object.entries(actions)) {
      if (name === "componentAt") continue;
      bound[name] = (...args: unknown[]) =>
        set((s) => (fn as (state: BenchState, ...a: unknown[]) => BenchState)(s, ...args));
    }
    return { ...initial, act: bound as unknown as BoundActions };
  });
}

/** The bench page's store. */
export const useBenchStore = createBenchStore();
