import { getIssues } from "@placemarkio/check-geojson";
import { area as turfArea } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { cinemaUnderNurseryPlan } from "../demo/cinema-under-nursery.js";
import { fernhollowStudioPlan } from "../demo/fernhollow-studio.js";
import { elementsOfType } from "../document/elements.js";
import { polygonAreaM2, polygonPerimeterM, polygonSignedAreaM2 } from "../geometry/polygon.js";
import { geoFrame, lonLatToPlan, planToLonLat, wgs84RadiiM, type SiteLocation } from "./geo-frame.js";
import { planToGeoJson } from "./geojson-export.js";

// An invented site on a tram street, plan y turned 30° east of north.
const SITE: SiteLocation = { lonDeg: 8.5417, latDeg: 47.3769, planNorthBearingDeg: 30 };

describe("GeoJSON export", () => {
  for (const [label, site] of [["at a site", SITE], ["without a site (local frame)", undefined]] as const) {
    it(`${label}: every level passes an RFC 7946 validator`, () => {
      for (const make of [fernhollowStudioPlan, cinemaUnderNurseryPlan]) {
        const out = planToGeoJson(make(), site);
        expect(out.levels.length).toBe(elementsOfType(make(), "level").length);
        for (const fc of out.levels) {
          expect(getIssues(JSON.stringify(fc)), `${fc.hushmark.levelId}`).toEqual([]);
          expect(fc.features.length).toBeGreaterThan(0);
        }
      }
    });

    it(`${label}: room polygons keep their planar areas`, () => {
      const plan = fernhollowStudioPlan();
      const out = planToGeoJson(plan, site);
      const frame = out.frame;
      const { meridionalM, primeVerticalM } = wgs84RadiiM(frame.site.latDeg);
      for (const room of elementsOfType(plan, "room")) {
        const feature = out.levels.flatMap((l) => l.features).find((f) => f.id === room.id)!;
        expect(feature.geometry.type).toBe("Polygon");
        const ring = (feature.geometry as { coordinates: number[][][] }).coordinates[0]!;
        expect(ring[0]).toEqual(ring[ring.length - 1]);
        const back = ring.slice(0, -1).map((c) => lonLatToPlan(frame, c));
        const planar = polygonAreaM2(room.outline);
        // Computed back through the frame: only the 1e-10° rounding separates them.
        expect(Math.abs(polygonAreaM2(back) - planar)).toBeLessThan(polygonPerimeterM(room.outline) * 2e-5);
        expect(polygonSignedAreaM2(back)).toBeGreaterThan(0);
        expect(feature.properties.areaM2).toBeCloseTo(planar, 4);
        // Independently, turf's spherical area (mean radius R = 6 371 008.8 m, @turf/helpers) differs from ours by R²/(M·N) only.
        const sphere = turfArea({ type: "Polygon", coordinates: [ring] });
        expect(sphere / planar).toBeCloseTo(6371008.8 ** 2 / (meridionalM * primeVerticalM), 4);
      }
    });
  }

  it("says when it falls back to the local frame", () => {
    const out = planToGeoJson(fernhollowStudioPlan());
    expect(out.frame.kind).toBe("local");
    expect(out.levels[0]!.hushmark.frame).toBe("local");
    expect(out.frame.note).toMatch(/No site location/);
    expect(planToGeoJson(fernhollowStudioPlan(), SITE).frame.kind).toBe("site");
  });

  it("places the plan's origin at the site and turns plan north by the bearing", () => {
    const frame = geoFrame(SITE);
    expect(planToLonLat(frame, { x: 0, y: 0 })).toEqual([SITE.lonDeg, SITE.latDeg]);
    // 10 m along plan y, which points 30° east of north: 5 m east and 8.66 m north.
    const [lon, lat] = planToLonLat(frame, { x: 0, y: 10 });
    const { meridionalM, primeVerticalM } = wgs84RadiiM(SITE.latDeg);
    const eastM = ((lon - SITE.lonDeg) * Math.PI) / 180 * primeVerticalM * Math.cos((SITE.latDeg * Math.PI) / 180);
    const northM = ((lat - SITE.latDeg) * Math.PI) / 180 * meridionalM;
    expect(eastM).toBeCloseTo(5, 3);
    expect(northM).toBeCloseTo(8.660254, 3);
    // One second of latitude is about 30.9 m at this latitude (WGS84 meridian arc).
    expect((meridionalM * Math.PI) / 180 / 3600).toBeCloseTo(30.88, 1);
  });

  it("puts walls, openings, vents, ducts and pins on their level", () => {
    const out = planToGeoJson(fernhollowStudioPlan(), SITE);
    const ground = out.levels.find((l) => l.hushmark.levelId === "ground")!;
    const kinds = (k: string) => ground.features.filter((f) => f.properties.kind === k).map((f) => f.id).sort();
    expect(kinds("door")).toEqual(["door-street", "door-studio"]);
    expect(kinds("window")).toEqual(["shopfront"]);
    expect(kinds("vent")).toEqual(["grille-back", "grille-record"]);
    expect(kinds("duct").length).toBe(1);
    expect(kinds("wall").length).toBeGreaterThan(4);
    const first = out.levels.find((l) => l.hushmark.levelId === "first")!;
    expect(first.features.filter((f) => f.properties.kind === "door")).toEqual([]);
  });
});
