import { meSchema, type Me } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { authKeys } from "./keys";

export function switchFirm(organizationId: string): Promise<Me> {
  return api.post("/auth/switch-firm", { organizationId }, meSchema);
}

/**
 * `leave` takes the person off the current page first (it may belong to the previous firm or
 * need a role they lack in the next one); then every cached list, all of the previous firm's,
 * is dropped and the new membership takes over.
 */
export function useSwitchFirm({ leave }: { leave: () => void | Promise<void> }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: switchFirm,
    onSuccess: async (me) => {
      await leave();
      await new Promise((resolve) => setTimeout(resolve, 0));
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
