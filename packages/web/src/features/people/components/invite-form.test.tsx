import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { InviteForm } from "./invite-form";

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("InviteForm", () => {
  it("sends the e-mail and the chosen role, leaving out an empty name", async () => {
    const { fetchMock, calls } = queueFetch({
      status: 201,
      body: { id: "1c0ffee0-0000-4000-8000-000000000001", email: "sam@quietline.example", role: "planner", invitedBy: "Wren Adair", createdAt: "2026-12-01T10:00:00.000Z", expiresAt: "2026-12-08T10:00:00.000Z", acceptedAt: null },
    });
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<InviteForm />);
    fireEvent.change(screen.getByLabelText("E-mail"), { target: { value: "Sam@Quietline.example" } });
    fireEvent.change(screen.getByLabelText("Role"), { target: { value: "planner" } });
    fireEvent.click(screen.getByRole("button", { name: "Send invitation" }));
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]?.url).toBe("/api/v1/people/invitations");
    expect(JSON.parse(String(calls[0]?.init?.body))).toEqual({ email: "sam@quietline.example", role: "planner" });
    // The form clears for the next person.
    await waitFor(() => expect((screen.getByLabelText("E-mail") as HTMLInputElement).value).toBe(""));
  });

  it("shows the server's refusal on the e-mail field", async () => {
    const { fetchMock } = queueFetch({
      status: 400,
      body: { error: { code: "invalid_input", message: "Some fields need attention.", details: [{ path: "email", message: "This person is already a member." }] } },
    });
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<InviteForm />);
    fireEvent.change(screen.getByLabelText("E-mail"), { target: { value: "wren@quietline.example" } });
    fireEvent.click(screen.getByRole("button", { name: "Send invitation" }));
    expect(await screen.findByText("This person is already a member.")).toBeTruthy();
    expect(screen.getByLabelText("E-mail").getAttribute("aria-invalid")).toBe("true");
    expect(screen.queryByRole("alert")).toBeNull();
  });
});
