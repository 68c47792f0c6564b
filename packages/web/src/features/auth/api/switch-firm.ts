import { meSchema, type Me } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { authKeys } from "./keys";

export function switchFirm(organizationId: string): Promise<Me> {
  return api.post("/auth/switch-firm", { organizationId }, meSchema);
}

export function useSwitchFirm() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: switchFirm,
    onSuccess: (me) => {
      // Every cached list belongs to the previous firm.
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
