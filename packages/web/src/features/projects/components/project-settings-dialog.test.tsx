import { fireEvent, screen, waitFor } from "@testing-library/react";
import type { Project } from "@hushmark/schemas";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { ProjectSettingsDialog } from "./project-settings-dialog";

afterEach(() => {
  vi.unstubAllGlobals();
});

const project: Project = {
  id: "7d1c2b3a-0000-4000-8000-000000000011", title: "Drum school, back wing", siteAddress: "3 Invented Yard", status: "survey",
  clients: [], planVersion: 2, createdAt: "2026-12-01T10:00:00.000Z", updatedAt: "2026-12-01T10:00:00.000Z", site: null,
};

describe("ProjectSettingsDialog", () => {
  it("refuses a latitude off the globe and a missing longitude before asking the server", async () => {
    const { fetchMock, calls } = queueFetch();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<ProjectSettingsDialog open onClose={() => {}} project={project} />);
    fireEvent.change(screen.getByLabelText("Latitude, degrees north"), { target: { value: "95" } });
    fireEvent.click(screen.getByRole("button", { name: "Save settings" }));
    expect(await screen.findByText("A latitude lies between −90° and 90°.")).toBeTruthy();
    expect(screen.getByText("Give the longitude in degrees.")).toBeTruthy();
    expect(calls).toHaveLength(0);
    fireEvent.change(screen.getByLabelText("Latitude, degrees north"), { target: { value: "45" } });
    expect(screen.queryByText("A latitude lies between −90° and 90°.")).toBeNull();
    expect(screen.getByText("Give the longitude in degrees.")).toBeTruthy();
  });

  it("sends the site with a decimal comma read as a point, and the bearing", async () => {
    const { fetchMock, calls } = queueFetch({ status: 200, body: { ...project, site: { latDeg: 51.4545, lonDeg: -2.5879, planNorthBearingDeg: 30 } } });
    vi.stubGlobal("fetch", fetchMock);
    const onClose = vi.fn();
    renderWithProviders(<ProjectSettingsDialog open onClose={onClose} project={project} />);
    fireEvent.change(screen.getByLabelText("Latitude, degrees north"), { target: { value: "51,4545" } });
    fireEvent.change(screen.getByLabelText("Longitude, degrees east"), { target: { value: "-2.5879" } });
    fireEvent.change(screen.getByLabelText(/Top of the Sketch faces/), { target: { value: "30" } });
    fireEvent.click(screen.getByRole("button", { name: "Save settings" }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(calls).toHaveLength(1);
    expect(calls[0]!.init?.method).toBe("PATCH");
    expect(JSON.parse(calls[0]!.init?.body as string)).toEqual({ title: project.title, siteAddress: project.siteAddress, site: { latDeg: 51.4545, lonDeg: -2.5879, planNorthBearingDeg: 30 } });
  });
});
