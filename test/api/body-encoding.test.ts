import { gzipSync } from "node:zlib";
import { Writable } from "node:stream";
import { pino } from "pino";
import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { buildTestApp, TEST_ORIGIN } from "../support/app";

// Item 5 of issue 10: the JSON body parser refuses a non-UTF-8 charset (415) and a body its
// Content-Encoding does not describe (400/415); the error handler used to turn those into 500
// and log them at error level with a stack.
const lines: { level: number; msg?: string; err?: unknown }[] = [];
const sink = new Writable({
  write(chunk: Buffer, _encoding, done) {
    for (const line of chunk.toString().split("\n").filter(Boolean)) lines.push(JSON.parse(line));
    done();
  },
});
const { app, close } = buildTestApp({ logger: pino({ level: "info" }, sink) });
afterAll(close);

const ERROR_LEVEL = 50; // pino's numeric level for "error"

/** A sign-in attempt (public, so the body parser is reached without a session). */
const signIn = () => request(app).post("/api/auth/sign-in").set("Origin", TEST_ORIGIN);

describe("request bodies the JSON parser cannot read", () => {
  for (const charset of ["latin1", "iso-8859-1", "utf-16", "windows-1252", "no-such-charset"]) {
    it(`when the body is sent with charset=${charset}, then 415 unsupported_media_type names the charset`, async () => {
      lines.length = 0;
      const response = await signIn()
        .set("Content-Type", `application/json; charset=${charset}`)
        .send('{"email":"a@example.test","password":"x"}');
      expect(response.status, JSON.stringify(response.body)).toBe(415);
      expect(response.body.error.id).toBe("unsupported_media_type");
      expect(response.body.error.message).toMatch(/UTF-8/);
      expect(lines.filter((l) => l.level >= ERROR_LEVEL)).toEqual([]);
    });
  }

  it("when the body is sent with charset=utf-8, then it is read (the sign-in itself is refused with 401)", async () => {
    const response = await signIn()
      .set("Content-Type", "application/json; charset=utf-8")
      .send('{"email":"nobody-here@example.test","password":"correct horse battery"}');
    expect(response.status).toBe(401);
  });

  it("when the Content-Encoding is unknown, then 415 unsupported_media_type names it", async () => {
    lines.length = 0;
    const response = await signIn()
      .set("Content-Type", "application/json")
      .set("Content-Encoding", "x-squeeze")
      .send("{}");
    expect(response.status, JSON.stringify(response.body)).toBe(415);
    expect(response.body.error.id).toBe("unsupported_media_type");
    expect(response.body.error.message).toMatch(/x-squeeze/);
    expect(lines.filter((l) => l.level >= ERROR_LEVEL)).toEqual([]);
  });

  for (const encoding of ["gzip", "deflate", "br"]) {
    it(`when Content-Encoding is ${encoding} but the body is not, then 400 bad_request says it does not decode`, async () => {
      lines.length = 0;
      const response = await signIn()
        .set("Content-Type", "application/json")
        .set("Content-Encoding", encoding)
        .send('{"email":"a@example.test","password":"x"}');
      expect(response.status, JSON.stringify(response.body)).toBe(400);
      expect(response.body.error.id).toBe("bad_request");
      expect(response.body.error.message).toMatch(new RegExp(encoding));
      expect(lines.filter((l) => l.level >= ERROR_LEVEL)).toEqual([]);
    });
  }

  it("when the body really is gzip-compressed JSON, then it is read (the sign-in itself is refused with 401)", async () => {
    const body = gzipSync(
      Buffer.from('{"email":"nobody-here@example.test","password":"correct horse battery"}'),
    );
    const response = await signIn()
      .set("Content-Type", "application/json")
      .set("Content-Encoding", "gzip")
      // Sent as the raw bytes (superagent would otherwise serialise a Buffer as JSON).
      .serialize(() => body as unknown as string)
      .send(body);
    expect(response.status, JSON.stringify(response.body)).toBe(401);
  });

  it("when the JSON is malformed, then 400 as before and nothing is logged at error level", async () => {
    lines.length = 0;
    const response = await signIn().set("Content-Type", "application/json").send('{"email":');
    expect(response.status).toBe(400);
    expect(lines.filter((l) => l.level >= ERROR_LEVEL)).toEqual([]);
  });
});
