import { fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { fernhollowStudioPlan } from "@hushmark/floorplan";
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
    expect(screen.queryByRole("button", { name: /Bring in a CAD drawing/ })).toBeNull();
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
    expect(screen.getByRole("button", { name: "Bring in a CAD drawing (DXF)…" })).toBeTruthy();
  });
});
