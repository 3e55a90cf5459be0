import { findDevMail, listDevMail } from "../../../db/repositories/dev-mail";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { presentMailMessage, presentMailSummary } from "./presenter";
import { MAILBOX_PAGE_SIZE } from "./schema";

type NoInput = Record<string, never>;

export const listMailHandler: RouteHandler<NoInput, { to?: string }, NoInput> = async (_req, res) => {
  const { to } = res.locals.input.query;
  const rows = await listDevMail({ to, limit: MAILBOX_PAGE_SIZE });
  res.set("Cache-Control", "no-store").json({ fake: true, messages: rows.map(presentMailSummary) });
};

export const getMailHandler: RouteHandler<{ messageId: string }, NoInput, NoInput> = async (_req, res) => {
  const message = await findDevMail(res.locals.input.params.messageId);
  if (!message) throw errors.notFound("This message");
  res.set("Cache-Control", "no-store").json(presentMailMessage(message));
};
