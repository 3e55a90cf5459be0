import { z } from "zod";

export { mailboxSchema, mailMessageParamsSchema, mailMessageSchema } from "../../../core/contract/mailbox";

/** `?to=` narrows the list to one recipient (tests and the page's filter use it). */
export const mailboxQuerySchema = z.object({
  to: z.string().trim().max(254).optional(),
});

/** The newest messages shown; older ones stay in the table. */
export const MAILBOX_PAGE_SIZE = 200;
