import { queryOptions, useQuery } from "@tanstack/react-query";
import { mailboxSchema } from "../../../../../core/contract/mailbox";
import { apiGet } from "../../../lib/api-client";

export const listMail = () => apiGet("/dev/mailbox", mailboxSchema);

/**
 * 404 when a real SMTP_URL is configured (then there is no mailbox), and for every client
 * that is not on the server's own machine (the mailbox holds reset links).
 */
export const mailboxQueryOptions = () =>
  queryOptions({ queryKey: ["dev-mailbox"], queryFn: listMail, retry: false, refetchInterval: 5_000 });

export const useMailbox = () => useQuery(mailboxQueryOptions());
