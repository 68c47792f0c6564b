import type { IEntity } from "dxf-parser";
import type { Point } from "../document/schema.js";
import { arcPoints, bulgePoints } from "./arc-flatten.js";

/** What one DXF entity becomes, in plan metres: a path, a text label, or a reason to skip it. */
export type EntityShape =
  | { kind: "path"; points: Point[]; closed: boolean }
  | { kind: "label"; text: string; at: Point }
  | { kind: "skip"; reason: string };

interface Loose {
  type: string;
  vertices?: Array<{ x?: number; y?: number; bulge?: number }>;
  shape?: boolean;
  center?: { x?: number; y?: number };
  radius?: number;
  startAngle?: number;
  endAngle?: number;
  text?: string;
  startPoint?: { x?: number; y?: number };
  position?: { x?: number; y?: number };
  extrusionDirectionZ?: number;
  extrusionDirection?: { z?: number };
  is3dPolygonMesh?: boolean;
  isPolyfaceMesh?: boolean;
  inPaperSpace?: boolean;
}

const SKIP_REASONS: Record<string, string> = {
  SPLINE: "splines are not converted; trace them over the underlay or convert them to polylines in CAD",
  ELLIPSE: "ellipses are not converted",
  DIMENSION: "dimensions are annotation, not geometry",
  HATCH: "hatches are fills, not outlines",
  SOLID: "solid fills are not outlines",
  "3DFACE": "3D faces are not plan lines",
  POINT: "single points carry no outline",
  ATTDEF: "block attributes are not geometry",
};

function finitePoint(p: { x?: number; y?: number } | undefined): p is { x: number; y: number } {
  return !!p && Number.isFinite(p.x) && Number.isFinite(p.y);
}

/**
 * One DXF entity as plan geometry: coordinates scaled by `metresPerUnit`, arcs and bulges
 * flattened to chords within `chordToleranceM`, the mirrored object coordinate system of a
 * (0, 0, −1) extrusion undone (m).
 */
export function entityShape(entity: IEntity, metresPerUnit: number, chordToleranceM: number): EntityShape {
  const e = entity as unknown as Loose;
  if (e.inPaperSpace) return { kind: "skip", reason: "drawn on a paper-space layout, not the model" };
  const mirror = (e.extrusionDirectionZ ?? e.extrusionDirection?.z ?? 1) < 0 ? -1 : 1;
  const m = (p: { x: number; y: number }): Point => ({ x: mirror * p.x * metresPerUnit, y: p.y * metresPerUnit });
  const tol = chordToleranceM;
  switch (e.type) {
    case "LINE": {
      const [a, b] = e.vertices ?? [];
      if (!finitePoint(a) || !finitePoint(b)) return { kind: "skip", reason: "a line without two end points" };
      return { kind: "path", points: [m(a), m(b)], closed: false };
    }
    case "LWPOLYLINE":
    case "POLYLINE": {
      if (e.is3dPolygonMesh || e.isPolyfaceMesh) return { kind: "skip", reason: "3D meshes are not plan lines" };
      const vs = (e.vertices ?? []).filter(finitePoint) as Array<{ x: number; y: number; bulge?: number }>;
      if (vs.length < 2) return { kind: "skip", reason: "a polyline with fewer than two vertices" };
      const closed = !!e.shape;
      const pts: Point[] = [m(vs[0]!)];
      const count = closed ? vs.length : vs.length - 1;
      for (let i = 0; i < count; i++) {
        const a = vs[i]!, b = vs[(i + 1) % vs.length]!;
        // Mirroring reverses the turning direction, so the bulge changes sign with it.
        pts.push(...bulgePoints(m(a), m(b), mirror * (a.bulge ?? 0), tol));
      }
      if (closed) pts.pop();
      return { kind: "path", points: pts, closed };
    }
    case "ARC": {
      if (!finitePoint(e.center) || !(Number.isFinite(e.radius) && e.radius! > 0)) return { kind: "skip", reason: "an arc without centre or radius" };
      const start = e.startAngle ?? 0;
      let sweep = (e.endAngle ?? 0) - start;
      while (sweep <= 0) sweep += 2 * Math.PI;
      const r = e.radius! * metresPerUnit;
      const c = m(e.center);
      // Under a mirrored extrusion the arc runs clockwise in plan coordinates.
      const pts = mirror < 0 ? arcPoints(c, r, Math.PI - start, -sweep, tol) : arcPoints(c, r, start, sweep, tol);
      return { kind: "path", points: pts, closed: false };
    }
    case "CIRCLE": {
      if (!finitePoint(e.center) || !(Number.isFinite(e.radius) && e.radius! > 0)) return { kind: "skip", reason: "a circle without centre or radius" };
      const pts = arcPoints(m(e.center), e.radius! * metresPerUnit, 0, 2 * Math.PI, tol);
      pts.pop();
      return { kind: "path", points: pts, closed: true };
    }
    case "TEXT":
    case "MTEXT": {
      const at = e.startPoint ?? e.position;
      if (!finitePoint(at) || !e.text) return { kind: "skip", reason: "text without position or content" };
      return { kind: "label", text: plainText(e.text), at: m(at) };
    }
    default:
      return { kind: "skip", reason: SKIP_REASONS[e.type] ?? `${e.type} entities are not converted` };
  }
}

/** MTEXT keeps formatting codes (\\P paragraph, {\\f...;} fonts); a room name wants the words only. */
function plainText(s: string): string {
  return s.replace(/\\P/g, " ").replace(/\\[A-Za-z][^;\\{}]*;/g, "").replace(/[{}]/g, "").replace(/\s+/g, " ").trim();
}
