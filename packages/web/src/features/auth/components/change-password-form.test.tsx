import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { ChangePasswordForm } from "./change-password-form";

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("ChangePasswordForm", () => {
  it("refuses a short new password before asking the server", async () => {
    const { fetchMock, calls } = queueFetch();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<ChangePasswordForm />);
    fireEvent.change(screen.getByLabelText("Current password"), { target: { value: "whatever it was" } });
    fireEvent.change(screen.getByLabelText("New password"), { target: { value: "short" } });
    fireEvent.click(screen.getByRole("button", { name: "Change password" }));
    expect(await screen.findByText("Use at least 12 characters.")).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it("shows a wrong current password on that field", async () => {
    const { fetchMock, calls } = queueFetch({
      status: 400,
      body: { error: { code: "invalid_input", message: "Some fields need attention.", details: [{ path: "currentPassword", message: "That is not your current password." }] } },
    });
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<ChangePasswordForm />);
    fireEvent.change(screen.getByLabelText("Current password"), { target: { value: "not the one" } });
    fireEvent.change(screen.getByLabelText("New password"), { target: { value: "a brand new pass phrase" } });
    fireEvent.click(screen.getByRole("button", { name: "Change password" }));
    expect(await screen.findByText("That is not your current password.")).toBeTruthy();
    await waitFor(() => expect(screen.getByLabelText("Current password").getAttribute("aria-invalid")).toBe("true"));
    expect(calls[0]?.url).toBe("/api/v1/auth/password");
  });
});
