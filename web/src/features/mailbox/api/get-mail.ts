import { queryOptions, useQuery } from "@tanstack/react-query";
import { mailMessageSchema } from "../../../../../core/contract/mailbox";
import { apiGet } from "../../../lib/api-client";

export const getMail = (id: string) => apiGet(`/dev/mailbox/${id}`, mailMessageSchema);

export const mailQueryOptions = (id: string) =>
  queryOptions({ queryKey: ["dev-mailbox", id], queryFn: () => getMail(id) });

export const useMail = (id: string | undefined) =>
  useQuery({ ...mailQueryOptions(id ?? ""), enabled: Boolean(id) });
