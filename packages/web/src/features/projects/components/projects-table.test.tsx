import type { Project } from "@hushmark/schemas";
import { fireEvent, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderWithProviders } from "../../../test/render";
import { ProjectsTable } from "./projects-table";

function project(overrides: Partial<Project> & Pick<Project, "id" | "title">): Project {
  return {
    siteAddress: "",
    status: "brief",
    clients: [],
    planVersion: 0,
    createdAt: "2026-10-01T09:00:00.000Z",
    updatedAt: "2026-10-01T09:00:00.000Z",
    ...overrides,
  };
}

const projects: Project[] = [
  project({ id: "7d1c2b3a-0000-4000-8000-000000000001", title: "Podcast studio party wall", siteAddress: "4 Tanner Row", status: "survey", updatedAt: "2026-11-20T10:00:00.000Z", clients: [{ membershipId: "7d1c2b3a-0000-4000-8000-0000000000c1", displayName: "Ivo Marsh", email: "ivo@example.com" }] }),
  project({ id: "7d1c2b3a-0000-4000-8000-000000000002", title: "Basement cinema under the nursery", siteAddress: "12 Linden Close", status: "proposal", updatedAt: "2026-11-28T10:00:00.000Z" }),
  project({ id: "7d1c2b3a-0000-4000-8000-000000000003", title: "Clinic waiting room", siteAddress: "Harbour Street", status: "brief", updatedAt: "2026-09-02T10:00:00.000Z" }),
];

function titlesInOrder(): string[] {
  const table = screen.getByRole("table");
  return within(table)
    .getAllByRole("row")
    .slice(1)
    .map((row) => within(row).getAllByRole("cell")[0]?.textContent ?? "");
}

describe("ProjectsTable", () => {
  it("starts with the most recently updated project first", () => {
    renderWithProviders(<ProjectsTable projects={projects} />);
    expect(titlesInOrder()).toEqual(["Basement cinema under the nursery", "Podcast studio party wall", "Clinic waiting room"]);
  });

  it("sorts by title when asked, then reverses", () => {
    renderWithProviders(<ProjectsTable projects={projects} />);
    fireEvent.click(screen.getByRole("button", { name: "Sort by title" }));
    expect(titlesInOrder()).toEqual(["Basement cinema under the nursery", "Clinic waiting room", "Podcast studio party wall"]);
    const header = screen.getByRole("columnheader", { name: /Title/ });
    expect(header.getAttribute("aria-sort")).toBe("ascending");
    fireEvent.click(screen.getByRole("button", { name: "Sort by title" }));
    expect(titlesInOrder()).toEqual(["Podcast studio party wall", "Clinic waiting room", "Basement cinema under the nursery"]);
  });

  it("sorts statuses in the order work goes, not alphabetically", () => {
    renderWithProviders(<ProjectsTable projects={projects} />);
    fireEvent.click(screen.getByRole("button", { name: "Sort by status" }));
    expect(titlesInOrder()).toEqual(["Clinic waiting room", "Podcast studio party wall", "Basement cinema under the nursery"]);
  });

  it("filters by text across title, site and client", () => {
    renderWithProviders(<ProjectsTable projects={projects} />);
    fireEvent.change(screen.getByLabelText("Search projects"), { target: { value: "linden" } });
    expect(titlesInOrder()).toEqual(["Basement cinema under the nursery"]);
    fireEvent.change(screen.getByLabelText("Search projects"), { target: { value: "ivo" } });
    expect(titlesInOrder()).toEqual(["Podcast studio party wall"]);
    expect(screen.getByText("1 of 3 projects shown")).toBeTruthy();
  });

  it("filters by status and says when nothing matches", () => {
    renderWithProviders(<ProjectsTable projects={projects} />);
    fireEvent.change(screen.getByLabelText("Status"), { target: { value: "proposal" } });
    expect(titlesInOrder()).toEqual(["Basement cinema under the nursery"]);
    fireEvent.change(screen.getByLabelText("Search projects"), { target: { value: "clinic" } });
    expect(screen.queryByRole("table")).toBeNull();
    expect(screen.getByText("No project matches")).toBeTruthy();
  });

  it("leaves out the clients column when asked", () => {
    renderWithProviders(<ProjectsTable projects={projects} showClients={false} />);
    expect(screen.queryByRole("columnheader", { name: "Clients" })).toBeNull();
    expect(screen.queryByText("Ivo Marsh")).toBeNull();
    expect(screen.getAllByRole("columnheader")).toHaveLength(4);
  });
});
