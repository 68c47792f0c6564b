import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { meAs } from "../../test/fixtures";
import { renderApp, routeFetch } from "../../test/render-app";

afterEach(() => {
  vi.unstubAllGlobals();
});

const token = "tok_0123456789abcdefghijklmnop";

describe("the invitation page", () => {
  it("shows the firm and role, then accepts with the token from the link", async () => {
    let acceptBody: unknown = null;
    const { fetchMock } = routeFetch((key, init) => {
      if (key === `GET /api/v1/invitations/${token}`) return { status: 200, body: { email: "sam@quietline.example", role: "surveyor", organizationName: "Quietline Acoustics", existingUser: false } };
      if (key === "POST /api/v1/invitations/accept") {
        acceptBody = JSON.parse(String(init?.body));
        return { status: 200, body: meAs("surveyor") };
      }
      if (key === "GET /api/v1/projects") return { status: 200, body: { projects: [] } };
      return undefined;
    });
    vi.stubGlobal("fetch", fetchMock);
    const { router } = renderApp(`/invitations/${token}`);
    expect(await screen.findByRole("heading", { name: "Join Quietline Acoustics" })).toBeTruthy();
    expect(screen.getByText("surveyor")).toBeTruthy();
    fireEvent.change(screen.getByLabelText("Your name"), { target: { value: "Sam Okafor" } });
    fireEvent.change(screen.getByLabelText("Password"), { target: { value: "another long pass phrase" } });
    fireEvent.click(screen.getByRole("button", { name: "Accept and continue" }));
    await waitFor(() => expect(router.state.location.pathname).toBe("/projects"));
    expect(acceptBody).toEqual({ token, displayName: "Sam Okafor", password: "another long pass phrase" });
    expect(await screen.findByRole("heading", { name: "Projects" })).toBeTruthy();
  });

  it("explains a dead link instead of showing the form", async () => {
    const { fetchMock } = routeFetch((key) =>
      key === `GET /api/v1/invitations/${token}` ? { status: 404, body: { error: { code: "invitation_not_found", message: "This invitation has expired." } } } : undefined,
    );
    vi.stubGlobal("fetch", fetchMock);
    renderApp(`/invitations/${token}`);
    expect(await screen.findByRole("heading", { name: "This invitation does not work" })).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Accept and continue" })).toBeNull();
  });
});
