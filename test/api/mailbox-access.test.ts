import { createServer, type IncomingMessage } from "node:http";
import type { Request } from "express";
import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { HttpError } from "../../api/errors";
import { loopbackOnly } from "../../api/routes/mailbox/loopback-only";
import { DevMailMessage } from "../../db/models/dev-mail-message";
import { buildTestApp } from "../support/app";
import { uniqueEmail } from "../support/accounts";

/** What `loopbackOnly` passes on for a request whose socket has `remoteAddress`. */
function guardOutcome(remoteAddress: string | undefined, headers: Record<string, string> = {}): unknown {
  let passed: unknown = "not called";
  const req = { socket: { remoteAddress }, headers, ip: headers["x-forwarded-for"] } as unknown as Request;
  loopbackOnly(req, {} as never, (error?: unknown) => {
    passed = error;
  });
  return passed;
}

describe("the development mailbox answers clients on this machine only", () => {
  it("when the socket's address is loopback (IPv4, IPv6 or IPv4-mapped), then the request goes on", () => {
    for (const address of ["127.0.0.1", "127.8.9.10", "::1", "::ffff:127.0.0.1"]) {
      expect(guardOutcome(address), address).toBeUndefined();
    }
  });

  it("when a loopback socket carries a proxy's forwarding header, then it is a 404 (a proxy on this machine relays others)", () => {
    for (const header of ["x-forwarded-for", "forwarded", "x-real-ip"]) {
      const outcome = guardOutcome("127.0.0.1", { [header]: "192.0.2.10" });
      expect(outcome, header).toBeInstanceOf(HttpError);
      expect((outcome as HttpError).status).toBe(404);
    }
  });

  it("when the socket's address is not loopback, then it is a 404, whatever X-Forwarded-For claims", () => {
    for (const address of ["192.0.2.10", "::ffff:192.0.2.10", "2001:db8::1", "10.0.0.1", undefined]) {
      const outcome = guardOutcome(address, { "x-forwarded-for": "127.0.0.1" });
      expect(outcome, String(address)).toBeInstanceOf(HttpError);
      expect((outcome as HttpError).status).toBe(404);
    }
  });

  describe("through the whole app", () => {
    const { app, close } = buildTestApp({ env: { TRUST_PROXY: "loopback" } });
    afterAll(close);
    // The same app behind a server that reports another machine's address for every socket
    // (a documentation address, RFC 5737: nothing is sent to it, the test stays on loopback).
    const remote = createServer((req: IncomingMessage, res) => {
      Object.defineProperty(req.socket, "remoteAddress", { value: "192.0.2.44", configurable: true });
      app(req, res);
    });

    it("when a client from another machine asks for the mailbox, its messages or its page, then each is a 404 while other routes answer", async () => {
      const message = await DevMailMessage.create({
        fromAddress: "Sigmacube <no-reply@sigmacube.test>",
        toAddresses: [uniqueEmail("victim")],
        subject: "Sigmacube: reset your password",
        textBody: "Choose a new password: http://sigmacube.test/reset-password/secret",
      });
      for (const path of [
        "/api/dev/mailbox",
        `/api/dev/mailbox/${message.id}`,
        "/dev/mailbox",
        "/DEV/Mailbox/",
      ]) {
        const answer = await request(remote).get(path).set("X-Forwarded-For", "127.0.0.1");
        expect(answer.status, path).toBe(404);
        expect(JSON.stringify(answer.body)).not.toContain("secret");
      }
      await request(remote).get("/api/health").expect(200);
      // The same requests from this machine are served.
      const list = await request(app).get("/api/dev/mailbox").expect(200);
      expect(list.body.messages.map((m: { id: string }) => m.id)).toContain(message.id);
      await request(app).get(`/api/dev/mailbox/${message.id}`).expect(200);
      // The page is the app's own index.html (global setup builds dist/web).
      await request(app).get("/dev/mailbox").expect(200);
    });
  });
});
