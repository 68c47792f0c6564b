import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { NewProjectDialog } from "./new-project-dialog";

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("NewProjectDialog", () => {
  it("refuses a one-letter title before asking the server", async () => {
    const { fetchMock, calls } = queueFetch();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<NewProjectDialog open onClose={() => {}} onCreated={() => {}} />);
    fireEvent.change(screen.getByLabelText("Title"), { target: { value: "A" } });
    fireEvent.click(screen.getByRole("button", { name: "Create project" }));
    expect(await screen.findByText("Give the project a title of at least 2 characters.")).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it("shows the server's refusal on the site address, and hands over the created project", async () => {
    const created = {
      id: "7d1c2b3a-0000-4000-8000-000000000009",
      title: "Rehearsal room under the flats",
      siteAddress: "Basement, 9 Quarry Lane",
      status: "brief",
      clients: [],
      planVersion: 0,
      createdAt: "2026-12-01T10:00:00.000Z",
      updatedAt: "2026-12-01T10:00:00.000Z",
    };
    const { fetchMock, calls } = queueFetch(
      { status: 400, body: { error: { code: "invalid_input", message: "Some fields need attention.", details: [{ path: "siteAddress", message: "Add the floor or unit, please." }] } } },
      { status: 201, body: created },
    );
    vi.stubGlobal("fetch", fetchMock);
    const onCreated = vi.fn();
    renderWithProviders(<NewProjectDialog open onClose={() => {}} onCreated={onCreated} />);
    fireEvent.change(screen.getByLabelText("Title"), { target: { value: "  Rehearsal room under the flats " } });
    fireEvent.change(screen.getByLabelText("Site address"), { target: { value: "9 Quarry Lane" } });
    fireEvent.click(screen.getByRole("button", { name: "Create project" }));
    expect(await screen.findByText("Add the floor or unit, please.")).toBeTruthy();
    expect(JSON.parse(String(calls[0]?.init?.body))).toEqual({ title: "Rehearsal room under the flats", siteAddress: "9 Quarry Lane", status: "brief" });

    fireEvent.change(screen.getByLabelText("Site address"), { target: { value: "Basement, 9 Quarry Lane" } });
    fireEvent.click(screen.getByRole("button", { name: "Create project" }));
    await waitFor(() => expect(onCreated).toHaveBeenCalledTimes(1));
    expect(onCreated.mock.calls[0]?.[0]).toMatchObject({ id: created.id, title: created.title });
  });
});
