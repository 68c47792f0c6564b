import { matchQuery, QueryCache, QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { Toaster } from "sonner";
import { authKeys } from "../features/auth/api/keys";
import { isApiError } from "../lib/api-client";
import { createQueryClient } from "../lib/query-client";

/** The app's query client; tests pass `{ retry: false }` so a refusal shows at once. */
export function createAppQueryClient(queryDefaults: { retry?: false } = {}): QueryClient {
  const client: QueryClient = createQueryClient({
    defaultOptions: { queries: queryDefaults },
    queryCache: new QueryCache({
      onError: (error, query) => {
        // A 401 that survived the refresh means the session is over; re-asking "who am I"
        // lets the sign-in guard send the person to sign in again.
        if (isApiError(error) && error.isUnauthorized && !matchQuery({ queryKey: authKeys.me(), exact: true }, query)) {
          void client.invalidateQueries({ queryKey: authKeys.me() });
        }
      },
    }),
  });
  return client;
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createAppQueryClient());
  return (
    <QueryClientProvider client={client}>
      {children}
      <Toaster position="bottom-right" closeButton toastOptions={{ className: "font-sans" }} />
    </QueryClientProvider>
  );
}
