import { describe, expect, it } from "vitest";
import { AnswerCache } from "./answer-cache";

describe("AnswerCache", () => {
  it("when the input text is the one an answer was kept for, then that answer comes back; any other text gets none", () => {
    const cache = new AnswerCache();
    cache.set("p|1|200", '{"states":[[1]]}', "answer A");
    expect(cache.get("p|1|200", '{"states":[[1]]}')).toBe("answer A");
    expect(cache.get("p|1|200", '{"states":[[2]]}')).toBeUndefined();
    expect(cache.get("p|2|200", '{"states":[[1]]}')).toBeUndefined();
  });

  it("when a key is answered again from new text, then the new answer replaces the old one", () => {
    const cache = new AnswerCache();
    cache.set("p|1|200", "old input", "old answer");
    cache.set("p|1|200", "new input", "new answer");
    expect(cache.size).toBe(1);
    expect(cache.get("p|1|200", "old input")).toBeUndefined();
    expect(cache.get("p|1|200", "new input")).toBe("new answer");
  });

  it("when more answers are kept than allowed, then the least recently used ones go first", () => {
    const cache = new AnswerCache({ maxEntries: 2, maxCharacters: 1_000, maxSourceCharacters: 100 });
    cache.set("a", "in a", "out a");
    cache.set("b", "in b", "out b");
    expect(cache.get("a", "in a")).toBe("out a"); // a is now the most recently used
    cache.set("c", "in c", "out c");
    expect(cache.get("b", "in b")).toBeUndefined();
    expect(cache.get("a", "in a")).toBe("out a");
    expect(cache.get("c", "in c")).toBe("out c");
  });

  it("when the kept characters pass the limit, then old answers are dropped until they fit", () => {
    const cache = new AnswerCache({ maxEntries: 10, maxCharacters: 20, maxSourceCharacters: 100 });
    cache.set("a", "12345", "12345"); // 10 characters
    cache.set("b", "12345", "12345"); // 20
    cache.set("c", "12345", "12345"); // 30 > 20: a goes
    expect(cache.size).toBe(2);
    expect(cache.get("a", "12345")).toBeUndefined();
    expect(cache.get("c", "12345")).toBe("12345");
  });

  it("when an input is longer than the limit for one input, then its answer is not kept", () => {
    const cache = new AnswerCache({ maxEntries: 10, maxCharacters: 1_000, maxSourceCharacters: 4 });
    cache.set("a", "too long", "answer");
    expect(cache.size).toBe(0);
    expect(cache.get("a", "too long")).toBeUndefined();
  });
});
