import type { Plan } from "../document/schema.js";
import { planDocument, rectangle } from "./helpers.js";

/**
 * Demo plan (invented): a basement home cinema under a nursery in a timber-floored house (keep
 * the bass in). The cinema's ceiling is gypsum fixed to the joists; a heating duct runs from the
 * cinema to the nursery; a stair door leads up to the hall.
 */
export function cinemaUnderNurseryPlan(): Plan {
  return planDocument(
    {
      id: "cinema-under-nursery",
      name: "Home cinema under the nursery",
      displayUnit: "imperial",
      defaults: {
        interiorWallConstructionId: "stud-wood-1x1-gypsum",
        exteriorWallConstructionId: "concrete-200",
        wallThicknessM: 0.12,
        floorConstructionId: "floor-wood-joist-gypsum-ceiling",
        ceilingConstructionId: "ceiling-gypsum-12-5",
        exteriorFaces: { kind: "none" },
        wallToleranceM: 0.05,
      },
      wallSettings: {
        // Above ground the nursery and hall have façades.
        "nursery:nursery1|0": { constructionId: "stud-wood-1x1-gypsum-insulated", faces: { kind: "outdoors" } },
      },
    },
    [
      { type: "level", id: "basement", name: "Basement", elevationM: -2.9, heightM: 2.4 },
      { type: "level", id: "ground", name: "Ground floor", elevationM: 0, heightM: 2.5 },
      { type: "room", id: "cinema", levelId: "basement", name: "Home cinema", use: "cinema", outline: rectangle("cinema", 0, 0, 6, 4.5), finish: { kind: "preset", presetId: "soft-furnished" } },
      { type: "room", id: "stair-down", levelId: "basement", name: "Basement stair", use: "stair", outline: rectangle("stair-down", 6, 0, 1.8, 4.5), finish: { kind: "preset", presetId: "bare-hard" } },
      { type: "room", id: "nursery", levelId: "ground", name: "Nursery", use: "nursery", outline: rectangle("nursery", 0.5, 0, 3.6, 3.4), finish: { kind: "preset", presetId: "furnished" }, target: { kind: "dba", dba: 30 }, floor: { constructionId: "floor-wood-joist-gypsum-ceiling", coveringId: "covering-carpet-underlay" } },
      { type: "room", id: "hall", levelId: "ground", name: "Hall and stair", use: "corridor", outline: rectangle("hall", 4.1, 0, 3.7, 4.5), finish: { kind: "preset", presetId: "bare-hard" } },
      { type: "room", id: "study", levelId: "ground", name: "Study", use: "office", outline: rectangle("study", 0.5, 3.4, 3.6, 1.1), finish: { kind: "preset", presetId: "furnished" } },
      { type: "door", id: "door-cinema", name: "Cinema door", wallRef: "cinema:cinema2", offsetM: 1.5, widthM: 0.8, heightM: 2.0, constructionId: "door-solid-core-sealed", leaks: { undercutMm: 6, perimeterGapMm: 0, sealsCracked: false } },
      { type: "door", id: "door-nursery", name: "Nursery door", wallRef: "nursery:nursery2", offsetM: 1.2, widthM: 0.8, heightM: 2.0, constructionId: "door-hollow-core-sealed", leaks: { undercutMm: 10, perimeterGapMm: 0, sealsCracked: false } },
      { type: "window", id: "nursery-window", name: "Nursery window (escape window)", wallRef: "nursery:nursery1", offsetM: 1.0, widthM: 1.2, heightM: 1.2, sillM: 0.8, constructionId: "glazing-double-4-16-4" },
      { type: "vent", id: "register-cinema", name: "Heating register, cinema", spaceId: "cinema", mount: "ceiling", position: { x: 1.5, y: 1.5 }, openAreaM2: 0.02 },
      { type: "vent", id: "register-nursery", name: "Heating register, nursery", spaceId: "nursery", mount: "floor", position: { x: 1.5, y: 1.5 }, openAreaM2: 0.02 },
      { type: "duct", id: "heating-duct", name: "Heating duct", fromVentId: "register-cinema", toVentId: "register-nursery", lengthM: 2.5, lining: "bare", bends: 2 },
      { type: "pin", id: "pin-sofa", levelId: "basement", position: { x: 3, y: 3 }, label: "M1 — cinema, sofa", spaceId: "cinema" },
      { type: "pin", id: "pin-cot", levelId: "ground", position: { x: 2, y: 1.2 }, label: "M2 — nursery, by the cot", spaceId: "nursery" },
      { type: "note", id: "note-sub", levelId: "basement", position: { x: 0.5, y: 4 }, text: "Subwoofer in the back corner; films most evenings 20:00–23:00." },
    ],
  );
}
