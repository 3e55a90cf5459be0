import { describe, expect, it } from "vitest";
import { ApiError } from "../../../lib/api-client";
import { importRefusalText, NOT_JSON_MESSAGE, readExportText } from "./project-import";

describe("reading an export file", () => {
  it("when the file is JSON, then its content is sent as it is, whatever its shape (the server judges it)", () => {
    expect(readExportText('{"format":"x","project":{"name":"Tank"}}')).toEqual({
      ok: true,
      body: { format: "x", project: { name: "Tank" } },
    });
    expect(readExportText("[1, 2]")).toEqual({ ok: true, body: [1, 2] });
  });

  it("when the file is not JSON (or empty, as an unreadable file is read), then nothing is sent and the message says to choose an export", () => {
    expect(readExportText("name;value\nTank;1")).toEqual({ ok: false, message: NOT_JSON_MESSAGE });
    expect(readExportText("")).toEqual({ ok: false, message: NOT_JSON_MESSAGE });
    expect(NOT_JSON_MESSAGE).toMatch(/not JSON/);
  });
});

describe("import refusals", () => {
  it("when the server lists reasons, then every one appears as 'path: message'", () => {
    const error = new ApiError(400, "invalid_import", "The file is not a valid export.", [
      { path: "project.name", message: "Name the project." },
      { path: "loadCases.0.states.1.stress", message: "must be finite" },
    ]);
    expect(importRefusalText(error)).toBe(
      "project.name: Name the project.; loadCases.0.states.1.stress: must be finite",
    );
  });

  it("when the server lists no reasons, or the error is not the server's, then its message is shown", () => {
    expect(importRefusalText(new ApiError(413, "too_large", "The file is too large.", []))).toBe(
      "The file is too large.",
    );
    expect(importRefusalText(new ApiError(403, "forbidden", "Editors only."))).toBe("Editors only.");
    expect(importRefusalText(new Error("Failed to fetch"))).toBe("Failed to fetch");
  });
});
