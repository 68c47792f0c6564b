import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { meAs, notSignedIn } from "../../../test/fixtures";
import { renderApp, routeFetch } from "../../../test/render-app";

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("signing out", () => {
  it("ends on the sign-in page and forgets the firm's data", async () => {
    let signedIn = true;
    const { fetchMock, calls } = routeFetch((key) => {
      if (key === "GET /api/v1/auth/me") return signedIn ? { status: 200, body: meAs("owner") } : notSignedIn;
      if (key === "POST /api/v1/auth/refresh") return notSignedIn;
      if (key === "POST /api/v1/auth/sign-out") {
        signedIn = false;
        return { status: 204 };
      }
      if (key === "GET /api/v1/projects") return { status: 200, body: { projects: [] } };
      return undefined;
    });
    vi.stubGlobal("fetch", fetchMock);
    const { router, queryClient } = renderApp("/projects");
    fireEvent.click(await screen.findByRole("button", { name: "Account menu for Wren Adair" }));
    fireEvent.click(screen.getByRole("button", { name: "Sign out" }));
    expect(await screen.findByRole("heading", { name: "Sign in" })).toBeTruthy();
    await waitFor(() => expect(router.state.location.pathname).toBe("/sign-in"));
    expect(screen.queryByText("This page stopped working")).toBeNull();
    expect(calls).toContain("POST /api/v1/auth/sign-out");
    await waitFor(() => expect(queryClient.getQueryData(["projects", "list"])).toBeUndefined());
    // Nothing asked for the firm's projects again after the session ended.
    expect(calls.filter((call) => call === "GET /api/v1/projects")).toHaveLength(1);
  });
});
