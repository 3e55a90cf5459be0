import type { QueryClient, QueryKey } from "@tanstack/react-query";

/**
 * Marks every query under each key stale and refetches the ones on screen. Mutations return
 * this from `onSettled`, so they stay pending until the page shows the server's new data.
 */
export const invalidateKeys = (queryClient: QueryClient, keys: readonly QueryKey[]) =>
  Promise.all(keys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
