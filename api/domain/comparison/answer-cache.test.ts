import { describe, expect, it } from "vitest";
import { AnswerCache, keptAnswer } from "./answer-cache";

const answerOf = (text: string) => keptAnswer(text);
const text = (answer: { body: Buffer } | undefined) => answer?.body.toString("utf8");

describe("AnswerCache", () => {
  it("when the stamp is the one an answer was kept for, then that answer comes back; any other stamp or key gets none", () => {
    const cache = new AnswerCache();
    cache.set("p|1|200", "3:1", answerOf("answer A"));
    expect(text(cache.get("p|1|200", "3:1"))).toBe("answer A");
    expect(cache.get("p|1|200", "4:1")).toBeUndefined();
    expect(cache.get("p|1|200", "3:2")).toBeUndefined();
    expect(cache.get("p|2|200", "3:1")).toBeUndefined();
  });

  it("when a key is answered again at a new stamp, then the new answer replaces the old one", () => {
    const cache = new AnswerCache();
    cache.set("p|1|200", "1:0", answerOf("old answer"));
    cache.set("p|1|200", "2:0", answerOf("new answer"));
    expect(cache.size).toBe(1);
    expect(cache.get("p|1|200", "1:0")).toBeUndefined();
    expect(text(cache.get("p|1|200", "2:0"))).toBe("new answer");
  });

  it("when more answers are kept than allowed, then the least recently used ones go first", () => {
    const cache = new AnswerCache({ maxEntries: 2, maxBytes: 1_000 });
    cache.set("a", "1:0", answerOf("out a"));
    cache.set("b", "1:0", answerOf("out b"));
    expect(text(cache.get("a", "1:0"))).toBe("out a"); // a is now the most recently used
    cache.set("c", "1:0", answerOf("out c"));
    expect(cache.get("b", "1:0")).toBeUndefined();
    expect(text(cache.get("a", "1:0"))).toBe("out a");
    expect(text(cache.get("c", "1:0"))).toBe("out c");
  });

  it("when the kept bytes pass the limit, then old answers are dropped until they fit", () => {
    const cache = new AnswerCache({ maxEntries: 10, maxBytes: 10 });
    cache.set("a", "1:0", answerOf("12345"));
    cache.set("b", "1:0", answerOf("12345")); // 10 bytes
    cache.set("c", "1:0", answerOf("12345")); // 15 > 10: a goes
    expect(cache.size).toBe(2);
    expect(cache.get("a", "1:0")).toBeUndefined();
    expect(text(cache.get("c", "1:0"))).toBe("12345");
  });

  it("when one answer is larger than the whole limit, then it is not kept and the older answer for its key goes too", () => {
    const cache = new AnswerCache({ maxEntries: 10, maxBytes: 4 });
    cache.set("a", "1:0", answerOf("ok"));
    cache.set("a", "2:0", answerOf("too long"));
    expect(cache.size).toBe(0);
    expect(cache.get("a", "1:0")).toBeUndefined();
    expect(cache.get("a", "2:0")).toBeUndefined();
  });

  it("when an answer is kept, then its ETag has Express's weak form: the byte length in hex and a SHA-1", () => {
    const answer = keptAnswer('{"σ":1}');
    expect(answer.body.length).toBe(8); // seven characters; σ takes two bytes in UTF-8
    expect(answer.etag).toMatch(/^W\/"8-[A-Za-z0-9+/]{27}"$/);
    expect(keptAnswer('{"σ":2}').etag).not.toBe(answer.etag);
  });
});
