import { z } from "zod";

/** The development mailbox (only when no real mail server is configured). Imports only zod. */

export const mailSummarySchema = z.object({
  id: z.uuid(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  receivedAt: z.iso.datetime(),
});
export type MailSummary = z.infer<typeof mailSummarySchema>;

export const mailboxSchema = z.object({
  /** Always true while this page exists: nothing leaves the machine. */
  fake: z.literal(true),
  messages: z.array(mailSummarySchema),
});
export type Mailbox = z.infer<typeof mailboxSchema>;

export const mailMessageSchema = mailSummarySchema.extend({
  text: z.string(),
  html: z.string().nullable(),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;

export const mailMessageParamsSchema = z.object({ messageId: z.uuid({ error: "must be a message id" }) });
