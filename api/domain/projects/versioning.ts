import { errors } from "../../errors";

/**
 * Optimistic concurrency: an update names the version it was based on. When the row has
 * moved on, the answer is 409 with the current version and the current record, so the
 * client can reload or keep its own copy; nothing is written.
 * Call it on a row read `FOR UPDATE` inside the writing transaction, so two updates from the
 * same version cannot both pass.
 */
export function assertVersion(
  row: { version: number },
  sentVersion: number,
  what: string,
  current: () => unknown,
) {
  if (row.version !== sentVersion) {
    throw errors.conflict(
      `${what} was changed by someone else (you started from version ${sentVersion}; it is now version ${row.version}). Reload it, or keep your copy and save again over version ${row.version}.`,
      { currentVersion: row.version, current: current() },
    );
  }
}
