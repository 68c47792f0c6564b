import { describe, expect, it } from "vitest";
import { emptyPlan } from "@hushmark/floorplan";
import { underlayCorners } from "@hushmark/editor-core";
import { dropPlacement, newUnderlayId, scaleText } from "./placement";
import { fileKindOf } from "./prepare-file";

describe("dropping an underlay into the view", () => {
  it("centres it and fills 70 % of the limiting side", () => {
    const view = { scale: 50, ox: 100, oy: 500, width: 1000, height: 600 }; // shows x −2..18 m, y −2..10 m
    const p = dropPlacement(2000, 1000, view);
    const corners = underlayCorners({ ...p, rotationDeg: 0, widthPx: 2000, heightPx: 1000 });
    const xs = corners.map((c) => c.x), ys = corners.map((c) => c.y);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(14, 9); // 70 % of 20 m
    expect((Math.max(...xs) + Math.min(...xs)) / 2).toBeCloseTo(8, 9);
    expect((Math.max(...ys) + Math.min(...ys)) / 2).toBeCloseTo(4, 9);
  });
});

describe("underlay ids and scale text", () => {
  it("gives a second placement of one file its own id", () => {
    const plan = emptyPlan({ id: "p", name: "P" });
    const first = newUnderlayId(plan, "0b6f0d8e-1111-4c2b");
    expect(first).toBe("underlay-0b6f0d8e1111");
    const withOne = { ...plan, underlays: [{ id: first, fileId: "x", levelId: "level-0", name: "", widthPx: 1, heightPx: 1, origin: { x: 0, y: 0 }, scaleMPerPx: 1, rotationDeg: 0, opacity: 1, locked: false, visible: true, calibrated: false }] };
    expect(newUnderlayId(withOne, "0b6f0d8e-1111-4c2b")).toBe(`${first}-2`);
  });

  it("reads the scale in the plan's unit", () => {
    expect(scaleText(0.005, "metric")).toBe("1 px = 5.0 mm");
    expect(scaleText(0.0254 / 8, "imperial")).toBe("1 in = 8.0 px");
  });
});

describe("file kinds by content", () => {
  const bytes = (s: string, prefix: number[] = []) => Uint8Array.from([...prefix, ...Array.from(s, (c) => c.charCodeAt(0))]);
  it("knows PNG, JPEG, WebP, PDF and HEIC by their first bytes, and nothing by name", () => {
    expect(fileKindOf(bytes("PNG\r\n\x1a\n", [0x89]))).toBe("png");
    expect(fileKindOf(Uint8Array.from([0xff, 0xd8, 0xff, 0xe0]))).toBe("jpeg");
    expect(fileKindOf(bytes("RIFF\0\0\0\0WEBPVP8 "))).toBe("webp");
    expect(fileKindOf(bytes("%PDF-1.7\n"))).toBe("pdf");
    expect(fileKindOf(bytes("\0\0\0\x18ftypheic\0\0\0\0"))).toBe("heic");
    expect(fileKindOf(bytes("<svg xmlns="))).toBe("unknown");
  });
});
