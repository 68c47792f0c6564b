import type { Point } from "../document/schema.js";

/** Where the plan sits on the Earth: the site point, the plan point at it, and where north is. */
export interface SiteLocation {
  /** WGS84 longitude and latitude of the site point, degrees. */
  lonDeg: number;
  latDeg: number;
  /** Bearing of the plan's +y axis, clockwise from true north, degrees (0 when the plan's y is north). */
  planNorthBearingDeg?: number;
  /** The plan point (m) that lies at the site point; default the plan origin. */
  originM?: Point;
}

/** The conversion used for an export: at a site, or the documented local frame when there is none. */
export type GeoFrame =
  | { kind: "site"; site: Required<SiteLocation>; note: string }
  | { kind: "local"; site: Required<SiteLocation>; note: string };

// WGS84 ellipsoid (NIMA TR8350.2): semi-major axis and flattening.
const A_M = 6378137;
const F = 1 / 298.257223563;
const E2 = F * (2 - F);

/** Meridional and prime-vertical radii of curvature of WGS84 at a latitude, m. */
export function wgs84RadiiM(latDeg: number): { meridionalM: number; primeVerticalM: number } {
  const s = Math.sin((latDeg * Math.PI) / 180);
  const w = 1 - E2 * s * s;
  return { meridionalM: (A_M * (1 - E2)) / Math.pow(w, 1.5), primeVerticalM: A_M / Math.sqrt(w) };
}

/** The frame for a site, or the local frame (plan origin at 0° E 0° N, plan y due north) without one (no unit). */
export function geoFrame(site: SiteLocation | undefined): GeoFrame {
  if (site) {
    return {
      kind: "site",
      site: { planNorthBearingDeg: 0, originM: { x: 0, y: 0 }, ...site },
      note: "Plan metres converted to WGS84 on the local tangent plane at the site point (see docs/exchange.md for its accuracy).",
    };
  }
  return {
    kind: "local",
    site: { lonDeg: 0, latDeg: 0, planNorthBearingDeg: 0, originM: { x: 0, y: 0 } },
    note: "No site location: the plan is placed in Hushmark's local frame, its origin at 0° E 0° N and its y axis due north, so positions are not real places but lengths and areas hold.",
  };
}

/** Rounding of exported degrees: 1e-10° is about 0.01 mm on the ground. */
const DEG_DECIMALS = 1e10;

/** A plan point as [longitude, latitude] in the frame, degrees (rounded to 1e-10°). */
export function planToLonLat(frame: GeoFrame, p: Point): [number, number] {
  const { lonDeg, latDeg, planNorthBearingDeg, originM } = frame.site;
  const b = (planNorthBearingDeg * Math.PI) / 180;
  const x = p.x - originM.x, y = p.y - originM.y;
  const east = x * Math.cos(b) + y * Math.sin(b);
  const north = -x * Math.sin(b) + y * Math.cos(b);
  const { meridionalM, primeVerticalM } = wgs84RadiiM(latDeg);
  const lat = latDeg + ((north / meridionalM) * 180) / Math.PI;
  const lon = lonDeg + ((east / (primeVerticalM * Math.cos((latDeg * Math.PI) / 180))) * 180) / Math.PI;
  return [Math.round(lon * DEG_DECIMALS) / DEG_DECIMALS, Math.round(lat * DEG_DECIMALS) / DEG_DECIMALS];
}

/** The inverse of `planToLonLat`: [longitude, latitude] degrees back to plan metres. */
export function lonLatToPlan(frame: GeoFrame, [lon, lat]: readonly [number, number] | readonly number[]): Point {
  const { lonDeg, latDeg, planNorthBearingDeg, originM } = frame.site;
  const { meridionalM, primeVerticalM } = wgs84RadiiM(latDeg);
  const north = (((lat ?? 0) - latDeg) * Math.PI) / 180 * meridionalM;
  const east = (((lon ?? 0) - lonDeg) * Math.PI) / 180 * primeVerticalM * Math.cos((latDeg * Math.PI) / 180);
  const b = (planNorthBearingDeg * Math.PI) / 180;
  return { x: originM.x + east * Math.cos(b) - north * Math.sin(b), y: originM.y + east * Math.sin(b) + north * Math.cos(b) };
}
