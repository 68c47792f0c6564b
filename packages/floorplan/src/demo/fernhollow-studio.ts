import type { Plan } from "../document/schema.js";
import { planDocument, rectangle } from "./helpers.js";

/**
 * Demo plan (invented): "Fernhollow Audio", a two-room podcast studio on the ground floor of a
 * mixed-use building. The café next door runs a grinder, a busy counter and a refrigeration
 * condenser on the shared back wall; a suspended ceiling void runs over both units; a dance
 * school rehearses upstairs; a tram passes the shopfront glazing; a supply duct is shared with
 * the café's back room. Plan origin at the south-west corner of the shopfront, x east, y north.
 */
export function fernhollowStudioPlan(): Plan {
  return planDocument(
    {
      id: "fernhollow-studio",
      name: "Fernhollow Audio — ground floor studio and neighbours",
      displayUnit: "metric",
      defaults: {
        interiorWallConstructionId: "stud-wood-1x1-gypsum-insulated",
        exteriorWallConstructionId: "masonry-brick-100",
        wallThicknessM: 0.12,
        floorConstructionId: "floor-concrete-200",
        ceilingConstructionId: "ceiling-suspended-tile",
        exteriorFaces: { kind: "outdoors" },
        wallToleranceM: 0.05,
      },
      wallSettings: {
        // The party wall with the café: a fit-out steel stud partition stopping at the suspended ceiling.
        "cafe:cafe4|control:control2": { constructionId: "stud-steel-1x1-gypsum", thicknessM: 0.1 },
        "cafe:cafe4|record:record2": { constructionId: "stud-steel-1x1-gypsum", thicknessM: 0.1 },
        "back:back4|record:record2": { constructionId: "stud-steel-1x1-gypsum", thicknessM: 0.1 },
        // The café's back room shares its north wall with the building's stair, not surveyed.
        "back:back3|0": { faces: { kind: "neighbour", neighbourId: "stair" } },
        // The studio's west wall is the party wall to a closed shop unit: treat as nothing to analyse.
        "control:control4|0": { faces: { kind: "none" } },
        "record:record4|0": { faces: { kind: "none" } },
      },
    },
    [
      { type: "level", id: "ground", name: "Ground floor", elevationM: 0, heightM: 2.7 },
      { type: "level", id: "first", name: "First floor", elevationM: 3.6, heightM: 3.0 },
      // Studio
      { type: "room", id: "control", levelId: "ground", name: "Control room", use: "control-room", outline: rectangle("control", 0, 0, 6, 4), finish: { kind: "preset", presetId: "soft-furnished" }, target: { kind: "nc", nc: 25 }, ceiling: { constructionId: "ceiling-suspended-tile" } },
      { type: "room", id: "record", levelId: "ground", name: "Recording room", use: "studio", outline: rectangle("record", 0, 4, 6, 5), finish: { kind: "preset", presetId: "acoustically-treated" }, target: { kind: "nc", nc: 20 }, ceiling: { constructionId: "ceiling-suspended-tile" } },
      // Café next door
      { type: "room", id: "cafe", levelId: "ground", name: "Café (counter and grinder)", use: "cafe", outline: rectangle("cafe", 6, 0, 8, 6), finish: { kind: "preset", presetId: "bare-hard" }, ceiling: { constructionId: "ceiling-suspended-tile" } },
      { type: "room", id: "back", levelId: "ground", name: "Café back room (condenser)", use: "kitchen", outline: rectangle("back", 6, 6, 8, 3), finish: { kind: "preset", presetId: "bare-hard" }, ceiling: { constructionId: "ceiling-suspended-tile" } },
      { type: "neighbour", id: "stair", name: "Building stair (not surveyed)", volumeM3: 40, absorptionM2: 4 },
      // Upstairs
      { type: "room", id: "dance", levelId: "first", name: "Dance school rehearsal room", use: "classroom", outline: rectangle("dance", 0, 0, 14, 9), finish: { kind: "preset", presetId: "bare-hard" }, floor: { constructionId: "floor-concrete-200", coveringId: "covering-vinyl" } },
      // One suspended-ceiling void over both units: the party wall stops at the tiles.
      { type: "void", id: "plenum", name: "Suspended ceiling void", kind: "ceiling-void", levelId: "ground", outline: rectangle("plenum", 0, 0, 14, 9), depthM: 0.6 },
      // Door between control and recording room, hollow core with a generous undercut.
      { type: "door", id: "door-studio", name: "Studio door", wallRef: "control:control3", offsetM: 1.0, widthM: 0.85, heightM: 2.04, constructionId: "door-hollow-core-sealed", leaks: { undercutMm: 12, perimeterGapMm: 2, sealsCracked: false } },
      // Shopfront: single 6 mm glazing on the tram street, with a shop door.
      { type: "window", id: "shopfront", name: "Shopfront glazing", wallRef: "control:control1", offsetM: 0.4, widthM: 4.2, heightM: 2.2, sillM: 0.3, constructionId: "glazing-single-6", leaks: { undercutMm: 0, perimeterGapMm: 0, sealsCracked: true } },
      { type: "door", id: "door-street", name: "Street door", wallRef: "control:control1", offsetM: 4.8, widthM: 0.9, heightM: 2.1, constructionId: "door-solid-core", leaks: { undercutMm: 8, perimeterGapMm: 3, sealsCracked: false } },
      // Back-to-back outlet boxes in the party wall.
      { type: "penetration", id: "outlet-party", name: "Back-to-back outlet boxes", wallRef: "record:record2", offsetM: 1.2, widthM: 0.08, what: "outlet-box", openAreaM2: 0.0006 },
      // Shared supply duct: grille in the recording room ceiling to a grille in the café back room.
      { type: "vent", id: "grille-record", name: "Supply grille, recording room", spaceId: "record", mount: "ceiling", position: { x: 4.5, y: 7.5 }, openAreaM2: 0.045 },
      { type: "vent", id: "grille-back", name: "Supply grille, café back room", spaceId: "back", mount: "ceiling", position: { x: 8, y: 7.5 }, openAreaM2: 0.045 },
      { type: "duct", id: "supply-duct", name: "Shared supply duct", fromVentId: "grille-record", toVentId: "grille-back", lengthM: 4.5, lining: "bare", bends: 1 },
      // Survey marks.
      { type: "pin", id: "pin-mic", levelId: "ground", position: { x: 3, y: 6.5 }, label: "M1 — recording room, mic position", spaceId: "record" },
      { type: "pin", id: "pin-grinder", levelId: "ground", position: { x: 10, y: 2 }, label: "M2 — café, by the grinder", spaceId: "cafe" },
      { type: "pin", id: "pin-street", levelId: "ground", position: { x: 2, y: -1.5 }, label: "M3 — pavement, tram stop side" },
      { type: "note", id: "note-condenser", levelId: "ground", position: { x: 7, y: 8.5 }, text: "Condenser fixed to the back wall; cycles about every 8 minutes, day and night." },
      { type: "note", id: "note-dance", levelId: "first", position: { x: 7, y: 4.5 }, text: "Tap and ballet classes Tue/Thu 17:00–21:00; vinyl on the slab, no underlay." },
    ],
  );
}
