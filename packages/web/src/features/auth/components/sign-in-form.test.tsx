import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { SignInForm } from "./sign-in-form";

afterEach(() => {
  vi.unstubAllGlobals();
});

function fill(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}

describe("SignInForm", () => {
  it("shows the schema's messages inline and sends nothing while fields are wrong", async () => {
    const { fetchMock, calls } = queueFetch();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<SignInForm onSignedIn={() => {}} />);
    fill("E-mail", "not an address");
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText("Enter an e-mail address like name@example.com.")).toBeTruthy();
    expect(screen.getByText("Enter your password.")).toBeTruthy();
    expect(screen.getByLabelText("E-mail").getAttribute("aria-invalid")).toBe("true");
    expect(calls).toHaveLength(0);
  });

  it("puts a 400's field problems on the fields they name", async () => {
    const { fetchMock, calls } = queueFetch({
      status: 400,
      body: { error: { code: "invalid_input", message: "Some fields need attention.", details: [{ path: "password", message: "That password is longer than we accept." }] } },
    });
    vi.stubGlobal("fetch", fetchMock);
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    fill("E-mail", "Wren@Quietline.example");
    fill("Password", "correct horse battery");
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    const message = await screen.findByText("That password is longer than we accept.");
    const password = screen.getByLabelText("Password");
    expect(password.getAttribute("aria-invalid")).toBe("true");
    expect(password.getAttribute("aria-describedby")).toContain(message.id);
    expect(onSignedIn).not.toHaveBeenCalled();
    // The schema normalised the address before it was sent.
    expect(JSON.parse(String(calls[0]?.init?.body))).toEqual({ email: "wren@quietline.example", password: "correct horse battery" });
  });

  it("shows a wrong password as a message for the whole form, and does not try a refresh", async () => {
    const { fetchMock, calls } = queueFetch({ status: 401, body: { error: { code: "not_signed_in", message: "That e-mail and password do not match." } } });
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<SignInForm onSignedIn={() => {}} />);
    fill("E-mail", "wren@quietline.example");
    fill("Password", "wrong one entirely");
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect((await screen.findByRole("alert")).textContent).toBe("That e-mail and password do not match.");
    expect(calls).toHaveLength(1);
  });

  it("hands the signed-in person to the page", async () => {
    const me = {
      user: { id: "0b5f6f2e-4a1e-4c47-9d43-2f1f3c1a7a01", email: "wren@quietline.example", displayName: "Wren Adair" },
      membership: { organizationId: "6a1d2c3b-7e4f-4a5b-8c9d-0e1f2a3b4c5d", organizationName: "Quietline Acoustics", role: "owner" },
      memberships: [],
    };
    const { fetchMock } = queueFetch({ status: 200, body: me });
    vi.stubGlobal("fetch", fetchMock);
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    fill("E-mail", "wren@quietline.example");
    fill("Password", "correct horse battery");
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledTimes(1));
    expect(onSignedIn.mock.calls[0]?.[0]).toMatchObject({ user: { displayName: "Wren Adair" } });
  });
});
