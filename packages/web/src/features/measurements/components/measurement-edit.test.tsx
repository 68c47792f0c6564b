import { fireEvent, screen, waitFor } from "@testing-library/react";
import type { MeasurementDetail } from "@hushmark/schemas";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { MeasurementEdit } from "./measurement-edit";

afterEach(() => vi.unstubAllGlobals());

const m: MeasurementDetail = {
  id: "7d1c2b3a-0000-4000-8000-000000000001", projectId: "7d1c2b3a-0000-4000-8000-000000000002", label: "Night", kind: "background", source: "recording", status: "ready", progress: 1, error: null,
  takenAt: "2026-05-01T22:00:00.000Z", roomId: null, point: null, device: "", calibrationDb: 100, leqDb: Array.from({ length: 21 }, () => 40), lmaxDb: null, l10Db: null, l90Db: null,
  summary: null, events: [], hasRecording: true, createdAt: "2026-05-01T22:00:00.000Z", history: null,
};

describe("MeasurementEdit", () => {
  it("says how far every level moves and sends the new offset", async () => {
    const { fetchMock, calls } = queueFetch({ status: 200, body: { ...m, calibrationDb: 94.5 } });
    vi.stubGlobal("fetch", fetchMock);
    const done = vi.fn();
    renderWithProviders(<MeasurementEdit projectId={m.projectId} measurement={m} onDone={done} />);
    fireEvent.change(screen.getByLabelText("Calibration offset (dB)"), { target: { value: "94.5" } });
    expect(screen.getByText("Every level moves by -5.5 dB.")).toBeTruthy();
    fireEvent.change(screen.getByLabelText("What it measures"), { target: { value: "before_work" } });
    fireEvent.click(screen.getByRole("button", { name: "Save changes" }));
    await waitFor(() => expect(done).toHaveBeenCalled());
    expect(calls[0]!.init?.method).toBe("PATCH");
    expect(JSON.parse(String(calls[0]!.init?.body))).toEqual({ label: "Night", kind: "before_work", calibrationDb: 94.5 });
  });
});
