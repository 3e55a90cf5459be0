import { queryOptions, useQuery } from "@tanstack/react-query";
import { trashListSchema } from "../../../../core/contract/projects";
import { apiGet } from "../../lib/api-client";
import { trashKeys } from "./keys";

export const listTrash = (workspaceId: string) => apiGet(`/workspaces/${workspaceId}/trash`, trashListSchema);

export const trashQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: trashKeys.list(workspaceId), queryFn: () => listTrash(workspaceId) });

/** The trash (editors and owners only). */
export const useTrash = (workspaceId: string, enabled: boolean) =>
  useQuery({ ...trashQueryOptions(workspaceId), enabled });
