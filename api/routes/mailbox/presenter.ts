import type { MailMessage, MailSummary } from "../../../core/contract/mailbox";
import type { DevMailRow } from "../../../db/repositories/dev-mail";

export function presentMailSummary(message: DevMailRow): MailSummary {
  return {
    id: message.id,
    from: message.fromAddress,
    to: message.toAddresses,
    subject: message.subject,
    receivedAt: message.receivedAt.toISOString(),
  };
}

export function presentMailMessage(message: DevMailRow): MailMessage {
  return { ...presentMailSummary(message), text: message.textBody, html: message.htmlBody };
}
