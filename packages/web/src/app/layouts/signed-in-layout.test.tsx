import { screen, waitFor, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { meAs, notSignedIn } from "../../test/fixtures";
import { renderApp, routeFetch } from "../../test/render-app";

afterEach(() => {
  vi.unstubAllGlobals();
});

const project = {
  id: "7d1c2b3a-0000-4000-8000-000000000001",
  title: "Podcast studio party wall",
  siteAddress: "4 Tanner Row",
  status: "survey",
  clients: [],
  planVersion: 3,
  createdAt: "2026-10-01T09:00:00.000Z",
  updatedAt: "2026-11-20T10:00:00.000Z",
};

describe("the signed-in layout", () => {
  it("sends a signed-out visitor to sign in, remembering where they were going", async () => {
    const { fetchMock, calls } = routeFetch((key) => (key.startsWith("GET /api/v1/auth/me") || key.startsWith("POST /api/v1/auth/refresh") ? notSignedIn : undefined));
    vi.stubGlobal("fetch", fetchMock);
    const { router } = renderApp("/people?tab=1");
    expect(await screen.findByRole("heading", { name: "Sign in" })).toBeTruthy();
    expect(router.state.location.pathname).toBe("/sign-in");
    expect(new URLSearchParams(router.state.location.search).get("next")).toBe("/people?tab=1");
    expect(calls).toEqual(["GET /api/v1/auth/me", "POST /api/v1/auth/refresh"]);
  });

  it("shows People to the owner and a New project button", async () => {
    const { fetchMock } = routeFetch((key) => {
      if (key === "GET /api/v1/auth/me") return { status: 200, body: meAs("owner") };
      if (key === "GET /api/v1/projects") return { status: 200, body: { projects: [project] } };
      return undefined;
    });
    vi.stubGlobal("fetch", fetchMock);
    renderApp("/projects");
    expect(await screen.findByRole("heading", { name: "Projects" })).toBeTruthy();
    const nav = screen.getByRole("navigation", { name: "Main" });
    expect(within(nav).getByRole("link", { name: "People" })).toBeTruthy();
    expect(await screen.findByRole("link", { name: "Podcast studio party wall" })).toBeTruthy();
    expect(screen.getByRole("button", { name: "New project" })).toBeTruthy();
  });

  it("hides People and project creation from a client, and shows them only the client's sections", async () => {
    const { fetchMock } = routeFetch((key) => {
      if (key === "GET /api/v1/auth/me") return { status: 200, body: meAs("client") };
      if (key === "GET /api/v1/projects") return { status: 200, body: { projects: [project] } };
      if (key === `GET /api/v1/projects/${project.id}`) return { status: 200, body: project };
      if (key === `GET /api/v1/projects/${project.id}/plan`) return { status: 200, body: { projectId: project.id, version: 3, document: {}, updatedAt: "2026-11-20T10:00:00.000Z", updatedBy: "Ada Surveyor" } };
      if (key === `GET /api/v1/projects/${project.id}/proposals`) return { status: 200, body: { proposals: [] } };
      return undefined;
    });
    vi.stubGlobal("fetch", fetchMock);
    const { router } = renderApp("/projects");
    expect(await screen.findByRole("link", { name: "Podcast studio party wall" })).toBeTruthy();
    expect(within(screen.getByRole("navigation", { name: "Main" })).queryByRole("link", { name: "People" })).toBeNull();
    expect(screen.queryByRole("button", { name: "New project" })).toBeNull();

    await router.navigate(`/projects/${project.id}`);
    const tabs = await screen.findByRole("navigation", { name: "Project sections" });
    expect(within(tabs).getAllByRole("link").map((link) => link.textContent)).toEqual(["Sketch", "Paths", "Proposal", "Verify"]);
    await waitFor(() => expect(router.state.location.pathname).toBe(`/projects/${project.id}/sketch`));

    // A staff-only section typed into the address bar explains itself instead of showing.
    await router.navigate(`/projects/${project.id}/options`);
    expect(await screen.findByText("Options is for the firm's team")).toBeTruthy();
    await router.navigate(`/projects/${project.id}/proposal`);
    expect(await screen.findByText("Your contractor has not sent a proposal for this project yet.", undefined, { timeout: 5000 })).toBeTruthy();
  });

  it("offers a retry when the session check fails for another reason than signing out", async () => {
    const { fetchMock } = routeFetch((key) => (key === "GET /api/v1/auth/me" ? { status: 503, body: { error: { code: "unavailable", message: "The database is not answering." } } } : undefined));
    vi.stubGlobal("fetch", fetchMock);
    renderApp("/projects");
    expect(await screen.findByText("The database is not answering.")).toBeTruthy();
    expect(screen.getByRole("button", { name: "Try again" })).toBeTruthy();
  });

  it("sends the person to sign in when a page's data answers 401 after the refresh", async () => {
    let sessionAlive = true;
    const { fetchMock } = routeFetch((key) => {
      if (key === "GET /api/v1/auth/me") return sessionAlive ? { status: 200, body: meAs("surveyor") } : notSignedIn;
      if (key === "POST /api/v1/auth/refresh") return notSignedIn;
      if (key === "GET /api/v1/projects") {
        // The session ends on the server while the page loads.
        sessionAlive = false;
        return notSignedIn;
      }
      return undefined;
    });
    vi.stubGlobal("fetch", fetchMock);
    const { router } = renderApp("/projects");
    expect(await screen.findByRole("heading", { name: "Sign in" })).toBeTruthy();
    expect(router.state.location.pathname).toBe("/sign-in");
    expect(new URLSearchParams(router.state.location.search).get("next")).toBe("/projects");
  });
});
