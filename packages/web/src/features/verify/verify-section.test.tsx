import { fireEvent, render, screen } from "@testing-library/react";
import { useState } from "react";
import { describe, expect, it } from "vitest";
import type { Measurement } from "@hushmark/schemas";
import { BandsField, fullSpectra, parseBands } from "./verify-section";

// An invented reading from the demo's control room.
const reading = (over: Partial<Measurement>): Measurement => ({
  id: "3f1d0c7a-8b2e-4d5f-9a6b-1c2d3e4f5a6b", projectId: "7a6b5c4d-3e2f-4a1b-9c8d-0e1f2a3b4c5d", label: "Control room, after", kind: "after_work", source: "csv",
  status: "ready", progress: 1, error: null, takenAt: "2026-11-30T14:00:00.000Z", roomId: "control", point: null, device: "", calibrationDb: 0,
  leqDb: Array.from({ length: 21 }, (_, i) => 50 - i), lmaxDb: null, l10Db: null, l90Db: null,
  summary: { laeqDb: 38.2, lafmaxDb: null, la10Db: null, la90Db: null, durationS: null, sampleRateHz: null, channels: null },
  events: null, hasRecording: false, createdAt: "2026-11-30T14:00:00.000Z", ...over,
}) as Measurement;

describe("Verify's band levels", () => {
  it("offers only finished measurements with a level in every band", () => {
    const full = reading({});
    const gap = reading({ id: "4f1d0c7a-8b2e-4d5f-9a6b-1c2d3e4f5a6b", leqDb: [...full.leqDb.slice(0, 20), null] });
    const busy = reading({ id: "5f1d0c7a-8b2e-4d5f-9a6b-1c2d3e4f5a6b", status: "processing" });
    const offered = fullSpectra([full, gap, busy]);
    expect(offered.map((o) => o.id)).toEqual([full.id]);
    expect(offered[0]!.label).toContain("38.2 dBA");
  });

  it("fills the levels from a picked measurement, which then parse as the 21 bands", () => {
    let seen = "";
    function Field() {
      const [v, setV] = useState("");
      seen = v;
      return <BandsField label="After" value={v} onChange={setV} spectra={fullSpectra([reading({})])} />;
    }
    render(<Field />);
    fireEvent.change(screen.getByLabelText("After: from a measurement"), { target: { value: reading({}).id } });
    expect(parseBands(seen)).toEqual(Array.from({ length: 21 }, (_, i) => 50 - i));
  });
});
