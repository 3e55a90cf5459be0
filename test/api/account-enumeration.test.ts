import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { Worker } from "node:worker_threads";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { User } from "../../db/models/user";
import { buildTestApp, TEST_ORIGIN } from "../support/app";
import { sessionCookieOf, signUp, TEST_PASSWORD, uniqueEmail } from "../support/accounts";
import { mailCount, waitForMail } from "../support/mailbox";

const { app, close } = buildTestApp();
let server: Server;
let base = "";
beforeAll(async () => {
  // One listening server for every try, so each request costs the same to reach.
  server = createServer(app);
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await close();
});

const post = (path: string, body: object) => request(base).post(path).set("Origin", TEST_ORIGIN).send(body);
const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length / 2;
  return sorted.length % 2 ? sorted[Math.floor(mid)] : (sorted[mid - 1] + sorted[mid]) / 2;
};

type Timing = { known: number[]; unknown: number[] };

/**
 * Times the requests from a worker thread, as a remote client would see them: a client on
 * the server's own event loop would also wait for the work the server does after answering.
 * Tries alternate their order and pause so that work settles before the next one.
 */
function timeInWorker(options: {
  url: string;
  origin: string;
  emails: { known: string; unknown: string };
  tries: number;
  pauseMs: number;
}): Promise<Timing> {
  const code = `
    const { parentPort, workerData: o } = require("node:worker_threads");
    const sleep = (ms) => new Promise((r) => setTimeout(r, ms));
    async function one(email) {
      const started = process.hrtime.bigint();
      const response = await fetch(o.url, {
        method: "POST",
        headers: { "content-type": "application/json", origin: o.origin },
        body: JSON.stringify({ email }),
      });
      await response.text();
      if (response.status !== 202) throw new Error("status " + response.status);
      return Number(process.hrtime.bigint() - started) / 1e6;
    }
    (async () => {
      const times = { known: [], unknown: [] };
      for (let i = 0; i < 3; i++) { await one(o.emails.known); await one(o.emails.unknown); await sleep(o.pauseMs); }
      for (let i = 0; i < o.tries; i++) {
        for (const which of i % 2 ? ["known", "unknown"] : ["unknown", "known"]) {
          times[which].push(await one(o.emails[which]));
          await sleep(o.pauseMs);
        }
      }
      parentPort.postMessage(times);
    })().catch((error) => parentPort.postMessage({ error: String(error) }));
  `;
  return new Promise((resolve, reject) => {
    const worker = new Worker(code, { eval: true, workerData: options });
    worker.once("message", (message: Timing | { error: string }) => {
      void worker.terminate();
      if ("error" in message) reject(new Error(message.error));
      else resolve(message);
    });
    worker.once("error", reject);
  });
}

describe("sign-up and forgot-password do not tell which addresses have accounts", () => {
  it("when sign-up is asked for a known and an unknown address, then the answers are identical and each address gets its own mail", async () => {
    const known = await signUp(app, { name: "Sam Pellworth" });
    const stranger = uniqueEmail("stranger");
    const answers = [];
    for (const email of [known.email, stranger]) {
      answers.push(await post("/api/auth/sign-up", { name: "Someone", email, password: TEST_PASSWORD }));
    }
    const [forKnown, forUnknown] = answers;
    expect(forKnown.status).toBe(202);
    expect(forUnknown.status).toBe(202);
    expect(forKnown.body).toEqual(forUnknown.body);
    expect(forKnown.body.message).toMatch(/sent a message to that address/);
    expect(sessionCookieOf(forKnown)).toBeNull();
    expect(sessionCookieOf(forUnknown)).toBeNull();
    expect(forKnown.headers["cache-control"]).toBe(forUnknown.headers["cache-control"]);
    // The known address is reminded; the new one is asked to confirm, and nobody else hears of it.
    await waitForMail(app, known.email, { subject: /already have an account/ });
    await waitForMail(app, stranger, { subject: /confirm your e-mail address/ });
    const created = await User.findOne({ where: { email: stranger } });
    expect(created?.emailVerifiedAt).toBeNull();
  });

  it("when forgot-password is asked 30 times each for a known and an unknown address, back to back, then the answer times differ by less than 5 ms (median)", async () => {
    const known = await signUp(app);
    const unknownEmail = uniqueEmail("nobody");
    const times = await timeInWorker({
      url: `${base}/api/auth/forgot-password`,
      origin: TEST_ORIGIN,
      emails: { known: known.email, unknown: unknownEmail },
      tries: 30,
      pauseMs: 40,
    });
    expect(times.known).toHaveLength(30);
    expect(times.unknown).toHaveLength(30);
    // Each try asks for both addresses back to back, so a change in the machine's load (other
    // test runs share its two cores) falls on both: the median of the 30 paired differences is
    // what the addresses themselves cost. With the token work done before answering it measured 7.7 and 9.8 ms here.
    const paired = median(times.known.map((known, i) => known - times.unknown[i]));
    console.log(
      `forgot-password over 30 tries: median known ${median(times.known).toFixed(2)} ms, unknown ${median(times.unknown).toFixed(2)} ms, median paired difference ${paired.toFixed(2)} ms`,
    );
    expect(Math.abs(paired)).toBeLessThan(5);
    await waitForMail(app, known.email, { subject: /reset your password/ });
    expect(await mailCount(app, unknownEmail)).toBe(0);
  });
});
