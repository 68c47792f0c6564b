import { fireEvent, screen, waitFor, within } from "@testing-library/react";
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

describe("the account menu on a phone", () => {
  it("carries the main links the top bar hides there, and following one closes it", async () => {
    const { fetchMock } = routeFetch((key) => {
      if (key === "GET /api/v1/auth/me") return { status: 200, body: meAs("owner") };
      if (key === "GET /api/v1/projects") return { status: 200, body: { projects: [] } };
      if (key === "GET /api/v1/organization/members") return { status: 200, body: { members: [], invitations: [] } };
      return undefined;
    });
    vi.stubGlobal("fetch", fetchMock);
    const { router } = renderApp("/projects");
    const button = await screen.findByRole("button", { name: "Account menu for Wren Adair" });
    expect(screen.getAllByRole("navigation", { name: "Main" })).toHaveLength(1);
    fireEvent.click(button);
    const menuNavs = screen.getAllByRole("navigation", { name: "Main" });
    expect(menuNavs).toHaveLength(2);
    const inMenu = within(menuNavs[1]!).getAllByRole("link").map((link) => link.textContent);
    expect(inMenu).toEqual(["Projects", "Price book", "People"]);
    fireEvent.click(within(menuNavs[1]!).getByRole("link", { name: "People" }));
    await waitFor(() => expect(router.state.location.pathname).toBe("/people"));
    expect(button.getAttribute("aria-expanded")).toBe("false");
  });
});
