import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { getMailHandler, listMailHandler } from "./handlers";
import { mailboxQuerySchema, mailboxSchema, mailMessageParamsSchema, mailMessageSchema } from "./schema";

const tag = "dev-mailbox";

/**
 * The development mailbox: only registered when SMTP_URL is unset outside production
 * (see `devMailboxEnabled`), because then no mail really leaves and this is the only
 * way to read it. It answers loopback clients only: `loopbackOnly` (api/app.ts) turns
 * every other client away before these routes, because the mail holds reset links.
 */
export function mailboxRoutes(): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/dev/mailbox",
      tag,
      summary: "Mail caught by the fake SMTP server, newest first (development only)",
      access: { kind: "public" },
      request: { query: mailboxQuerySchema },
      responses: { 200: { description: "The caught messages.", schema: mailboxSchema } },
      handler: listMailHandler,
    }),
    defineRoute({
      method: "get",
      path: "/dev/mailbox/{messageId}",
      tag,
      summary: "One caught message with its plain-text and HTML parts (development only)",
      access: { kind: "public" },
      request: { params: mailMessageParamsSchema },
      responses: { 200: { description: "The message.", schema: mailMessageSchema } },
      errors: { 404: "No such message." },
      handler: getMailHandler,
    }),
  ];
}
