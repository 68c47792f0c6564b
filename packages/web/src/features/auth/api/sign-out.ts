import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

export function signOut(): Promise<void> {
  return api.post<void>("/auth/sign-out", {}, undefined, { skipRefresh: true });
}

/**
 * `leave` runs first (the screen navigates away from the signed-in pages), then the cache is
 * emptied — in that order, so no signed-in page renders without its data. The cache is emptied
 * even when the server could not be reached: this device is done with the session.
 */
export function useSignOut({ leave }: { leave: () => void | Promise<void> }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSettled: async () => {
      await leave();
      // Let the signed-in pages unmount first: a query still observed when the cache empties
      // would fetch again, now without a session.
      await new Promise((resolve) => setTimeout(resolve, 0));
      queryClient.clear();
    },
  });
}
