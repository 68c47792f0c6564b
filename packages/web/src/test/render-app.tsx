import { render } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { AppProvider, createAppQueryClient } from "../app/provider";
import { routes } from "../app/router";

/** The whole app at one address, with a fresh cache. */
export function renderApp(route: string) {
  const queryClient = createAppQueryClient({ retry: false });
  const router = createMemoryRouter(routes, { initialEntries: [route] });
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, router, queryClient };
}

type Handler = (url: string, init: RequestInit | undefined) => { status: number; body?: unknown } | undefined;

/** A fetch stand-in that routes by "METHOD /path" and records every request. */
export function routeFetch(handler: Handler) {
  const calls: string[] = [];
  const fetchMock = async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const url = String(input);
    const key = `${init?.method ?? "GET"} ${url}`;
    calls.push(key);
    const answer = handler(key, init);
    if (!answer) return new Response(JSON.stringify({ error: { code: "not_found", message: `No stand-in for ${key}` } }), { status: 404 });
    return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), { status: answer.status, headers: { "Content-Type": "application/json" } });
  };
  return { fetchMock, calls };
}
