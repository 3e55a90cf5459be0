import { useCallback, useSyncExternalStore } from "react";
import { useSession } from "./session";

/** How pasted numbers are read: ask when a comma is ambiguous, or the user's decimal mark. */
export type DecimalPreference = "ask" | "." | ",";

const CHOICES: readonly DecimalPreference[] = ["ask", ".", ","];
const EVENT = "sigmacube:decimal-preference";

/** The localStorage key of a user's decimal mark: per person, so colleagues sharing a browser keep their own. */
export const decimalPreferenceKey = (userId: string) => `sigmacube.decimal-mark.${userId}`;

/** Reads a stored preference; anything unknown (or no storage) is "ask". */
export function readDecimalPreference(userId: string | undefined): DecimalPreference {
  if (userId === undefined) return "ask";
  try {
    const v = window.localStorage.getItem(decimalPreferenceKey(userId));
    return (CHOICES as readonly (string | null)[]).includes(v) ? (v as DecimalPreference) : "ask";
  } catch {
    return "ask";
  }
}

function subscribe(onChange: () => void): () => void {
  window.addEventListener(EVENT, onChange);
  window.addEventListener("storage", onChange);
  return () => {
    window.removeEventListener(EVENT, onChange);
    window.removeEventListener("storage", onChange);
  };
}

/**
 * The signed-in user's decimal mark for pasted numbers, remembered in this browser per user id, and
 * a setter. Every paste box (bench, project state form) reads the same preference.
 */
export function useDecimalPreference(): [DecimalPreference, (next: DecimalPreference) => void] {
  const userId = useSession().data?.user?.id;
  const value = useSyncExternalStore(subscribe, () => readDecimalPreference(userId));
  const set = useCallback(
    (next: DecimalPreference) => {
      if (userId === undefined) return;
      try {
        window.localStorage.setItem(decimalPreferenceKey(userId), next);
      } catch {
        // Storage may be full or off; the choice then lasts for this page only.
      }
      window.dispatchEvent(new Event(EVENT));
    },
    [userId],
  );
  return [value, set];
}

/** How each choice is offered, in words an engineer reads at a glance. */
export const DECIMAL_CHOICE_LABELS: Readonly<Record<DecimalPreference, string>> = {
  ask: "ask when a comma is unclear",
  ".": "point — 1.5; commas separate values",
  ",": "comma — 1,5; values separated by spaces or tabs",
};
