/** What a calculator gives the page: its results, or a sentence that names the input at fault. */
export type Outcome<T> = { ok: true; result: T } | { ok: false; error: string };

/**
 * Runs a calculation, turning core's TypeError/RangeError (which name the argument) into a refusal
 * the page shows beside the inputs; any other error is a bug and is rethrown.
 */
export function attempt<T>(run: () => T): Outcome<T> {
  try {
    return { ok: true, result: run() };
  } catch (error) {
    if (error instanceof RangeError || error instanceof TypeError) return { ok: false, error: error.message };
    throw error;
  }
}

/** A refusal naming the field, e.g. refuse("Wall thickness t", "must be positive"). */
export function refuse(label: string, why: string): never {
  throw new RangeError(`${label} ${why}.`);
}
