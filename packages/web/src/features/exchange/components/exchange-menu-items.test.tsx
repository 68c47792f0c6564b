import { fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { fernhollowStudioPlan } from "@hushmark/floorplan";
import type { Project } from "@hushmark/schemas";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { projectKeys } from "../../projects/api/keys";
import { ExportMenu } from "../../editor/components/export-menu";
import { ExchangeMenuItems } from "./exchange-menu-items";

afterEach(() => vi.restoreAllMocks());

/** Records what the page would download: the blob's text and the file name of the clicked link. */
function captureDownloads() {
  const saved: Array<{ name: string; blob: Blob }> = [];
  const blobs = new Map<string, Blob>();
  let n = 0;
  vi.spyOn(URL, "createObjectURL").mockImplementation((b) => { const url = `blob:test/${++n}`; blobs.set(url, b as Blob); return url; });
  vi.spyOn(URL, "revokeObjectURL").mockImplementation(() => {});
  vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) { saved.push({ name: this.download, blob: blobs.get(this.href)! }); });
  return saved;
}

describe("exchange entries in the Export menu", () => {
  it("appear in the Sketch section's menu but not on the Paths view's", () => {
    const plan = fernhollowStudioPlan();
    const { unmount } = render(<ExportMenu plan={plan} levelId="ground" title="Fernhollow" />);
    fireEvent.click(screen.getByRole("button", { name: "Export" }));
    expect(screen.getByRole("button", { name: "CAD drawing of this level (DXF)" })).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Import DXF…" })).toBeNull();
    unmount();
    render(<ExportMenu plan={plan} levelId="ground" title="Fernhollow" markup={{} as never} />);
    fireEvent.click(screen.getByRole("button", { name: "Export" }));
    expect(screen.queryByRole("button", { name: "CAD drawing of this level (DXF)" })).toBeNull();
  });

  it("download the level's DXF, its GeoJSON with the local-frame note, the schedule and the plan document", async () => {
    const saved = captureDownloads();
    render(<ExchangeMenuItems plan={fernhollowStudioPlan()} levelId="ground" title="Fernhollow Audio" onCommand={() => {}} />);
    fireEvent.click(screen.getByRole("button", { name: "CAD drawing of this level (DXF)" }));
    fireEvent.click(screen.getByRole("button", { name: "Map data of this level (GeoJSON)" }));
    fireEvent.click(screen.getByRole("button", { name: "Element schedule (CSV)" }));
    fireEvent.click(screen.getByRole("button", { name: "Plan document (JSON)" }));
    expect(saved.map((s) => s.name)).toEqual(["fernhollow-audio-ground-floor.dxf", "fernhollow-audio-ground-floor.geojson", "fernhollow-audio-schedule.csv", "fernhollow-audio.plan.json"]);
    expect(await saved[0]!.blob.text()).toContain("ENTITIES");
    expect(JSON.parse(await saved[1]!.blob.text()).type).toBe("FeatureCollection");
    expect(screen.getByText(/local frame/)).toBeTruthy();
    expect(screen.getByRole("button", { name: "Import DXF…" })).toBeTruthy();
    expect(screen.getByRole("button", { name: "Import IFC…" })).toBeTruthy();
  });

  it("place the GeoJSON at the project's site location when it has one, without the local-frame note", async () => {
    const saved = captureDownloads();
    const project: Project = {
      id: "0b8f7a4e-8a51-4c1e-9d1e-2b7f6d0c9a11", title: "Fernhollow Audio", siteAddress: "1 Invented Row", status: "survey", clients: [], planVersion: 3,
      createdAt: "2026-01-01T00:00:00.000Z", updatedAt: "2026-01-01T00:00:00.000Z", site: { latDeg: 47.5, lonDeg: 8.25, planNorthBearingDeg: 0 },
    };
    const client = new QueryClient({ defaultOptions: { queries: { staleTime: Infinity, retry: false } } });
    client.setQueryData(projectKeys.detail(project.id), project);
    render(<QueryClientProvider client={client}><ExchangeMenuItems projectId={project.id} plan={fernhollowStudioPlan()} levelId="ground" title="Fernhollow Audio" onCommand={() => {}} /></QueryClientProvider>);
    expect(screen.getByRole("button", { name: "Site location…" })).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Map data of this level (GeoJSON)" }));
    const fc = JSON.parse(await saved[0]!.blob.text());
    expect(fc.hushmark.frame).toBe("site");
    const [lon, lat] = fc.features.find((f: { geometry: { type: string } }) => f.geometry.type === "Polygon").geometry.coordinates[0][0];
    // A plan a few metres across lies within 0.001° of its site point.
    expect(Math.abs(lon - 8.25)).toBeLessThan(1e-3);
    expect(Math.abs(lat - 47.5)).toBeLessThan(1e-3);
    expect(screen.queryByText(/local frame/)).toBeNull();
  });
});
