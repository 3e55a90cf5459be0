import nodemailer, { type Transporter } from "nodemailer";
import type { Logger } from "pino";
import { startFakeSmtpServer, type FakeSmtpServer } from "./fake-smtp-server";

/** One outgoing message: always a plain-text and an HTML part. */
export type OutgoingMail = { to: string; subject: string; text: string; html: string };

export type Mailer = {
  /** True when mail goes to the in-process fake server (no SMTP_URL): the /dev/mailbox page exists. */
  readonly fake: boolean;
  /** Sends one message; resolves once the SMTP server has accepted (and, for the fake, stored) it. */
  send(mail: OutgoingMail): Promise<void>;
  /** Starts the fake server now rather than at the first message (server start-up does this). */
  start(): Promise<void>;
  close(): Promise<void>;
};

/**
 * nodemailer over `smtpUrl`, or — when it is unset — over a fake SMTP server started in
 * this process on first use, which keeps the messages in PostgreSQL for /dev/mailbox.
 */
export function createMailer(options: { smtpUrl?: string; from: () => string; logger: Logger }): Mailer {
  const { smtpUrl, logger } = options;
  let fakeServer: Promise<FakeSmtpServer> | null = null;
  let transport: Promise<Transporter> | null = null;

  const getTransport = () =>
    (transport ??= (async () => {
      if (smtpUrl) return nodemailer.createTransport(smtpUrl);
      fakeServer ??= startFakeSmtpServer((error) => logger.error({ err: error }, "fake SMTP server"));
      const { port } = await fakeServer;
      return nodemailer.createTransport({ host: "127.0.0.1", port, secure: false, ignoreTLS: true });
    })());

  return {
    fake: !smtpUrl,
    async send(mail) {
      const transporter = await getTransport();
      await transporter.sendMail({ from: options.from(), ...mail });
      logger.info({ to: mail.to, subject: mail.subject, fake: !smtpUrl }, "mail sent");
    },
    async start() {
      await getTransport();
    },
    async close() {
      if (transport) (await transport).close();
      if (fakeServer) await (await fakeServer).close();
      transport = null;
      fakeServer = null;
    },
  };
}
