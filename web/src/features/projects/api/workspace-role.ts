import { useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { roleAtLeast, workspaceSchema } from "../../../../../core/contract/workspaces";
import { apiGet } from "../../../lib/api-client";
import { projectKeys } from "./keys";

const responseSchema = z.object({ workspace: workspaceSchema });

/** The workspace with the caller's role, and whether that role may change inputs. */
export function useWorkspaceRole(workspaceId: string) {
  const query = useQuery({
    queryKey: projectKeys.workspace(workspaceId),
    queryFn: () => apiGet(`/workspaces/${workspaceId}`, responseSchema).then((r) => r.workspace),
    retry: false,
  });
  const role = query.data?.role;
  return { ...query, canEdit: !!role && roleAtLeast(role, "editor"), role };
}
