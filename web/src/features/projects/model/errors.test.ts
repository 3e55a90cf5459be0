import { describe, expect, it } from "vitest";
import { z } from "zod";
import { ApiError } from "../../../lib/api-client";
import {
  currentVersionOf,
  fieldErrorSummary,
  isNotThere,
  isVersionConflict,
  versionConflictOf,
} from "./errors";

// How the forms read the API's error answers (api/errors.ts shapes them); product rules, no outside source.

const record = z.object({ id: z.string(), version: z.int() });
const conflict = (details: unknown) => new ApiError(409, "version_conflict", "changed meanwhile", details);

describe("version conflicts", () => {
  it("when the API answers 409, then it is a conflict; another status or a plain error is not", () => {
    expect(isVersionConflict(conflict(undefined))).toBe(true);
    expect(isVersionConflict(new ApiError(400, "invalid_input", "bad"))).toBe(false);
    expect(isVersionConflict(new Error("409"))).toBe(false);
    expect(isVersionConflict(null)).toBe(false);
  });

  it("when a conflict names the version now stored, then that version is read; otherwise none", () => {
    expect(currentVersionOf(conflict({ currentVersion: 7 }))).toBe(7);
    expect(currentVersionOf(conflict({ currentVersion: "7" }))).toBeNull();
    expect(currentVersionOf(conflict(undefined))).toBeNull();
    expect(currentVersionOf(new ApiError(400, "invalid_input", "bad", { currentVersion: 7 }))).toBeNull();
  });

  it("when a conflict carries the stored record, then the version and the record read with its schema come back", () => {
    const current = { id: "a", version: 7 };
    expect(versionConflictOf(conflict({ currentVersion: 7, current }), record)).toEqual({
      currentVersion: 7,
      current,
    });
  });

  it("when the record in a conflict does not fit the schema or is missing, then there is no conflict to offer", () => {
    expect(versionConflictOf(conflict({ currentVersion: 7, current: { id: 1 } }), record)).toBeNull();
    expect(versionConflictOf(conflict({ currentVersion: 7 }), record)).toBeNull();
    expect(versionConflictOf(conflict(undefined), record)).toBeNull();
    expect(versionConflictOf(new Error("x"), record)).toBeNull();
  });
});

describe("records that are not there", () => {
  it("when the API answers 400 or 404, then the record is not there for this user; 403 or 500 are other errors", () => {
    expect(isNotThere(new ApiError(404, "not_found", "gone"))).toBe(true);
    expect(isNotThere(new ApiError(400, "invalid_input", "bad id"))).toBe(true);
    expect(isNotThere(new ApiError(403, "forbidden", "no"))).toBe(false);
    expect(isNotThere(new ApiError(500, "internal", "oops"))).toBe(false);
    expect(isNotThere(new Error("404"))).toBe(false);
  });
});

describe("field error summary", () => {
  it("when a 400 names several fields, then each appears once as 'path: message', joined with '; '", () => {
    const error = new ApiError(400, "invalid_input", "check the fields", [
      { path: "name", message: "Name the material." },
      { path: "yield", message: "must be positive" },
      { path: "name", message: "a second message for name" },
    ]);
    expect(fieldErrorSummary(error)).toBe("name: Name the material.; yield: must be positive");
  });

  it("when the error is not a field error, then the summary is empty", () => {
    expect(fieldErrorSummary(new ApiError(409, "version_conflict", "x", []))).toBe("");
    expect(fieldErrorSummary(new Error("network"))).toBe("");
  });
});
