import { fireEvent, render, screen } from "@testing-library/react";
import { useState } from "react";
import { describe, expect, it } from "vitest";
import type { Measurement, Verification } from "@hushmark/schemas";
import { OctaveComparison, verificationSeries } from "./octave-comparison";
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

describe("the verification's octave comparison", () => {
  it("puts the measured, predicted and target levels in octave bands, 63 Hz from 50, 63 and 80 Hz", () => {
    const thirds = Array.from({ length: 21 }, (_, i) => 60 - i);
    const v = {
      id: "6f1d0c7a-8b2e-4d5f-9a6b-1c2d3e4f5a6b", proposalId: "7f1d0c7a-8b2e-4d5f-9a6b-1c2d3e4f5a6b",
      before: { dba: 50, nc: 45 }, after: { dba: 41, nc: 36 }, predicted: { beforeDba: 50, afterDba: 42 },
      bands: { beforeDb: thirds, afterDb: thirds.map((l) => l - 9), predictedAfterDb: thirds.map((l) => l - 8) },
      measuredGainDb: 9, predictedGainDb: 8, target: { kind: "nc", value: 30, met: false }, summary: "", note: "", createdAt: "2026-11-30T14:00:00.000Z",
    } as Verification;
    const series = verificationSeries(v);
    expect(series.map((s) => s.label)).toEqual(["Measured before", "Measured after", "Predicted after", "NC 30 target"]);
    // Energy sum of 60, 59 and 58 dB: 10·lg(10^6 + 10^5.9 + 10^5.8) = 63.0 dB (by definition).
    expect(series[0]!.values[0]).toBeCloseTo(10 * Math.log10(10 ** 6 + 10 ** 5.9 + 10 ** 5.8), 6);
    expect(series[1]!.values[0]).toBeCloseTo(series[0]!.values[0]! - 9, 6);
    render(<OctaveComparison v={v} />);
    expect(screen.getByRole("row", { name: /Measured after/ }).textContent).toContain((series[1]!.values[0]!).toFixed(1));
  });
});
