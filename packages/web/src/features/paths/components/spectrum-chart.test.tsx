import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import type { AnalysisResult } from "@hushmark/schemas";
import { SpectrumChart } from "./spectrum-chart";

const THIRDS = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];

const result = (levels: number[], nc: number | null) => ({
  bandsHz: THIRDS,
  receiver: { id: "r", name: "Control room", levelsDb: levels, dba: 0, nc: null },
  target: nc === null ? null : { kind: "nc", value: nc, met: false, shortfallDb: 0 },
}) as unknown as AnalysisResult;

describe("the spectrum chart", () => {
  it("sets octave-band levels against the NC curve, not the third-octave bars", () => {
    render(<SpectrumChart result={result(THIRDS.map(() => 40), 25)} dimmed={false} />);
    const table = screen.getByRole("table", { name: /by octave band, against the NC 25 curve/ });
    const rows = within(table).getAllByRole("row").slice(1);
    // Seven octaves 63 Hz–4 kHz from the 21 third octaves; the 8 kHz octave has no data.
    expect(rows).toHaveLength(7);
    // Three equal bands sum to 10·lg 3 = 4.77 dB more (energy sum, by definition).
    expect(within(rows[0]!).getAllByRole("cell")[1]!.textContent).toBe("44.8");
    // NC 25 at 63 Hz is 54 dB (ANSI/ASA S12.2 NC table, from memory).
    expect(Number(within(rows[0]!).getAllByRole("cell")[2]!.textContent)).toBeCloseTo(54, 0);
  });

  it("leaves the octave steps out when there is no full third-octave spectrum", () => {
    const { container } = render(<SpectrumChart result={result([40, 41], null)} dimmed={false} />);
    expect(container.querySelector('[data-part="octaves"]')).toBeNull();
  });
});
