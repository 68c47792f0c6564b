import { render } from "@testing-library/react";
import type { ReactElement } from "react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { AppProvider, createAppQueryClient } from "../app/provider";

/** Renders a screen with a fresh query cache and a memory router, as the app would. */
export function renderWithProviders(element: ReactElement, { path = "/", route = "/" }: { path?: string; route?: string } = {}) {
  const queryClient = createAppQueryClient({ retry: false });
  const router = createMemoryRouter(
    [
      { path, element },
      { path: "*", element: <p>Navigated away</p> },
    ],
    { initialEntries: [route] },
  );
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, queryClient, router };
}

/** A fetch stand-in that answers queued responses in order and records what was asked. */
export function queueFetch(...answers: Array<{ status: number; body?: unknown; headers?: Record<string, string> }>) {
  const calls: Array<{ url: string; init: RequestInit | undefined }> = [];
  const fetchMock = async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    calls.push({ url: String(input), init });
    const answer = answers.shift();
    if (!answer) throw new Error(`Unexpected request to ${String(input)}`);
    const body = answer.body === undefined ? null : JSON.stringify(answer.body);
    return new Response(body, { status: answer.status, headers: { "Content-Type": "application/json", ...answer.headers } });
  };
  return { fetchMock, calls };
}
