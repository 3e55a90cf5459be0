import type { AddressInfo } from "node:net";
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer } from "smtp-server";
import { DevMailMessage } from "../../db/models/dev-mail-message";

export type FakeSmtpServer = { port: number; close(): Promise<void> };

/**
 * An SMTP server on 127.0.0.1 (a free port) that accepts every message and stores it in
 * PostgreSQL (`dev_mail_messages`) instead of delivering it. Each API process without
 * SMTP_URL runs its own, but they all write to the same table, so every process shows
 * the same mailbox and nothing lives only in one process's memory. A message is stored
 * before the SMTP transaction ends, so when sending resolves the mail can be read.
 */
export async function startFakeSmtpServer(onError: (error: unknown) => void): Promise<FakeSmtpServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          await DevMailMessage.create({
            fromAddress: addressText(parsed.from),
            toAddresses: addressList(parsed.to),
            subject: parsed.subject ?? "(no subject)",
            textBody: parsed.text ?? "",
            htmlBody: typeof parsed.html === "string" ? parsed.html : null,
          });
          callback();
        })
        .catch((error: unknown) => {
          onError(error);
          callback(error instanceof Error ? error : new Error(String(error)));
        });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => resolve());
  });
  server.on("error", onError);
  const port = (server.server.address() as AddressInfo).port;
  return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

function addressText(address: AddressObject | AddressObject[] | undefined): string {
  if (!address) return "";
  return (Array.isArray(address) ? address : [address]).map((a) => a.text).join(", ");
}

function addressList(address: AddressObject | AddressObject[] | undefined): string[] {
  if (!address) return [];
  return (Array.isArray(address) ? address : [address])
    .flatMap((a) => a.value)
    .map((a) => (a.address ?? "").toLowerCase())
    .filter(Boolean);
}
