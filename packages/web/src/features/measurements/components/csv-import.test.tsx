import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { CsvImport } from "./csv-import";

afterEach(() => vi.unstubAllGlobals());

const empty = Array.from({ length: 21 }, () => null);
const leq = empty.map((_, i) => (i === 4 ? 52.5 : i === 10 ? 47.1 : null));
const preview = {
  ok: true, separator: ";", decimalComma: true, columns: { frequency: "frequency", level: "leq", max: null },
  rows: [{ line: 2, bandHz: 125, levelDb: 52.5, maxDb: null }, { line: 4, bandHz: 500, levelDb: 47.1, maxDb: null }],
  problems: [{ line: 3, reason: "The level “loud” at 250 Hz is not a number.", text: "250;loud" }],
  leqDb: leq, lmaxDb: null, missingBandsHz: [50, 63], notes: [],
};

describe("CsvImport", () => {
  it("shows readable and unreadable rows and saves only when confirmed, with the previewed levels", async () => {
    const created = {
      id: "7d1c2b3a-0000-4000-8000-000000000001", projectId: "7d1c2b3a-0000-4000-8000-000000000002", label: "party-wall", kind: "background", source: "csv", status: "ready", progress: 1, error: null,
      takenAt: "2026-05-01T10:00:00.000Z", roomId: null, point: null, device: "", calibrationDb: 0, leqDb: leq, lmaxDb: null, l10Db: null, l90Db: null, summary: null, events: null, hasRecording: false, createdAt: "2026-05-01T10:00:00.000Z",
    };
    const plan = {
      projectId: "7d1c2b3a-0000-4000-8000-000000000002", version: 3, updatedAt: "2026-05-01T09:00:00.000Z", updatedBy: null,
      document: { elements: { booth: { id: "booth", type: "room", name: "Recording booth", outline: [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 2 }, { x: 0, y: 2 }] } } },
    };
    const { fetchMock, calls } = queueFetch({ status: 200, body: plan }, { status: 200, body: preview }, { status: 201, body: created });
    vi.stubGlobal("fetch", fetchMock);
    const saved = vi.fn();
    renderWithProviders(<CsvImport projectId="p1" onSaved={saved} onClose={() => {}} />);
    const file = new File(["Frequency [Hz];Leq [dB]\n125;52,5\n250;loud\n500;47,1\n"], "party-wall.csv", { type: "text/csv" });
    fireEvent.change(screen.getByTestId("csv-file"), { target: { files: [file] } });
    expect(await screen.findByText(/Line 3:/)).toBeTruthy();
    expect(screen.getByText(/level “loud” at 250 Hz/)).toBeTruthy();
    expect(screen.getByText("Readable rows (2)")).toBeTruthy();
    expect(calls).toHaveLength(2);
    expect(JSON.parse(String(calls[1]!.init?.body)).text).toContain("250;loud");
    fireEvent.change(await screen.findByLabelText("Room on the plan"), { target: { value: "booth" } });
    fireEvent.click(screen.getByRole("button", { name: "Save 2 bands as a measurement" }));
    await waitFor(() => expect(saved).toHaveBeenCalledWith(created.id));
    const body = JSON.parse(String(calls[2]!.init?.body));
    expect(body).toMatchObject({ label: "party-wall", source: "csv", leqDb: leq, roomId: "booth", point: { x: 2, y: 1 } });
  });
});
