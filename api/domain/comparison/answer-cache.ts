/**
 * Answers of the comparison kept by the exact text of their inputs.
 *
 * The comparison is a pure function of its inputs (the project's states, cases, combinations,
 * locations, materials and factors, read fresh from PostgreSQL on every request) and of this
 * process's engine. When a request's input text is byte-for-byte the text an earlier answer
 * was computed from, that answer is the answer, so it is sent again instead of being
 * evaluated and serialized again. Nothing can go stale: any change to an input changes the
 * text, and the text is read on every request. Measured with `npm run bench -- api-load`
 * (100 connections, 8-row project): evaluating and serializing was about 60 % of a
 * comparison request's CPU time, and the comparison served 0.1–0.2× the health route.
 */

/** At most this many answers are kept (the most recently used ones). */
const MAX_ENTRIES = 64;
/** …holding at most this many characters of inputs and answers together. */
const MAX_CHARACTERS = 32 * 1024 * 1024;
/** Inputs longer than this are not kept: a large project's answer is reused rarely and costs memory. */
const MAX_SOURCE_CHARACTERS = 2 * 1024 * 1024;

type Entry = { source: string; body: string };

export class AnswerCache {
  private readonly entries = new Map<string, Entry>();
  private characters = 0;

  constructor(
    private readonly limits = {
      maxEntries: MAX_ENTRIES,
      maxCharacters: MAX_CHARACTERS,
      maxSourceCharacters: MAX_SOURCE_CHARACTERS,
    },
  ) {}

  /** The answer kept under `key` when it was computed from exactly `source`; else undefined. */
  get(key: string, source: string): string | undefined {
    const entry = this.entries.get(key);
    if (!entry) return undefined;
    if (entry.source !== source) return undefined;
    // Most recently used last: Map keeps insertion order.
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry.body;
  }

  /** Keeps `body` as the answer for `key` computed from `source`, evicting the least recently used. */
  set(key: string, source: string, body: string): void {
    if (source.length > this.limits.maxSourceCharacters) return;
    this.remove(key);
    this.entries.set(key, { source, body });
    this.characters += source.length + body.length;
    for (const [oldest] of this.entries) {
      if (this.entries.size <= this.limits.maxEntries && this.characters <= this.limits.maxCharacters) break;
      this.remove(oldest);
    }
  }

  get size(): number {
    return this.entries.size;
  }

  private remove(key: string): void {
    const entry = this.entries.get(key);
    if (!entry) return;
    this.characters -= entry.source.length + entry.body.length;
    this.entries.delete(key);
  }
}
