import type { Express } from "express";
import request from "supertest";
import { mailboxSchema, mailMessageSchema, type MailMessage } from "../../core/contract/mailbox";

/**
 * Waits until the fake SMTP server has a message for `to` (matching `subject` if given)
 * and returns the newest one, read through GET /api/dev/mailbox like the mailbox page.
 * Polls because some mail (password reset) is sent after the answer on purpose.
 */
export async function waitForMail(
  app: Express,
  to: string,
  options: { subject?: RegExp; timeoutMs?: number; after?: Date } = {},
): Promise<MailMessage> {
  const deadline = Date.now() + (options.timeoutMs ?? 5_000);
  for (;;) {
    const list = mailboxSchema.parse(
      (await request(app).get("/api/dev/mailbox").query({ to }).expect(200)).body,
    );
    const found = list.messages.find(
      (m) =>
        (!options.subject || options.subject.test(m.subject)) &&
        (!options.after || new Date(m.receivedAt) > options.after),
    );
    if (found) {
      return mailMessageSchema.parse(
        (await request(app).get(`/api/dev/mailbox/${found.id}`).expect(200)).body,
      );
    }
    if (Date.now() > deadline)
      throw new Error(`no mail to ${to} ${options.subject ?? ""} within the timeout`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** The messages the mailbox holds for `to` right now. */
export async function mailCount(app: Express, to: string): Promise<number> {
  return mailboxSchema.parse((await request(app).get("/api/dev/mailbox").query({ to }).expect(200)).body)
    .messages.length;
}

/** The first link to the app in a mail's plain-text part whose path starts with `pathPrefix`. */
export function linkIn(message: MailMessage, pathPrefix: string): URL {
  const match = message.text.match(new RegExp(`https?://\\S+${pathPrefix.replace(/\//g, "\\/")}\\S*`));
  if (!match) throw new Error(`no ${pathPrefix} link in: ${message.text}`);
  return new URL(match[0]);
}
