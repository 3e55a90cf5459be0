import type { MailMessage, MailSummary } from "../../../core/contract/mailbox";
import type { DevMailMessage } from "../../../db/models/dev-mail-message";

export function presentMailSummary(message: DevMailMessage): MailSummary {
  return {
    id: message.id,
    from: message.fromAddress,
    to: message.toAddresses,
    subject: message.subject,
    receivedAt: message.receivedAt.toISOString(),
  };
}

export function presentMailMessage(message: DevMailMessage): MailMessage {
  return { ...presentMailSummary(message), text: message.textBody, html: message.htmlBody };
}
