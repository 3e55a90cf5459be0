import { queryOptions, useQuery } from "@tanstack/react-query";
import { sessionResponseSchema } from "../../../core/contract/auth";
import { apiGet } from "./api-client";

/** The query key every feature uses for "who is signed in"; sign-in and sign-out write it. */
export const SESSION_KEY = ["session"] as const;

export const getSession = () => apiGet("/auth/session", sessionResponseSchema);

export const sessionQueryOptions = () =>
  queryOptions({ queryKey: SESSION_KEY, queryFn: getSession, staleTime: 60_000, retry: false });

/** Who is signed in (`data.user` null when nobody is). Shared by the guard, the header and pages. */
export const useSession = () => useQuery(sessionQueryOptions());

/** `next` from the address bar, if it is a path inside this app (never another site). */
export function safeNext(value: string | null, fallback = "/workspaces"): string {
  return value && value.startsWith("/") && !value.startsWith("//") ? value : fallback;
}
