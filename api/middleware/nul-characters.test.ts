import { describe, expect, it } from "vitest";
import { nulCharacterPaths } from "./nul-characters";

describe("nulCharacterPaths", () => {
  it("when strings and keys at several depths hold a NUL, then each one's path is listed", () => {
    const paths = nulCharacterPaths({
      name: "ok",
      states: [{ note: "a\u0000b" }, { note: "fine" }],
      "bad\u0000key": 1,
    });
    expect(paths).toHaveLength(2);
    expect(paths).toContainEqual(["states", "0", "note"]);
    expect(paths).toContainEqual(["bad\\u0000key"]);
  });

  it("when nothing holds a NUL (numbers, null, empty text, other control characters), then nothing is listed", () => {
    expect(nulCharacterPaths({ a: 0, b: null, c: "", d: "\u0001\t\n", e: [true, 1.5] })).toEqual([]);
  });

  it("when the input nests 100,000 arrays deep, then it is searched without exhausting the call stack", () => {
    let deep: unknown = "\u0000";
    for (let i = 0; i < 100_000; i++) deep = [deep];
    const [path] = nulCharacterPaths(deep);
    expect(path).toHaveLength(100_000);
  });
});
