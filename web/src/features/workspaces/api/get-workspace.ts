import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { workspaceSchema } from "../../../../../core/contract/workspaces";
import { apiGet } from "../../../lib/api-client";

const responseSchema = z.object({ workspace: workspaceSchema });

export const getWorkspace = (id: string) =>
  apiGet(`/workspaces/${id}`, responseSchema).then((r) => r.workspace);

export const workspaceQueryOptions = (id: string) =>
  queryOptions({ queryKey: ["workspaces", id], queryFn: () => getWorkspace(id), retry: false });

/** One workspace (404 when the caller is not a member). */
export const useWorkspace = (id: string) => useQuery(workspaceQueryOptions(id));
