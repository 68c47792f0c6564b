/**
 * The invented demo: "Fernhollow Audio", a two-room podcast studio beside a café, under a dance
 * school, on a tram street, sharing a supply duct. Made-up numbers; raw JSON before parsing.
 */
import { bands, flat, rising } from "./networks.js";

export const fernhollowNetwork = () => ({
  name: "Fernhollow Audio",
  building: { year_built: 1962 },
  spaces: [
    { id: "cafe", kind: "room", volume_m3: 120, rt60_s: 0.8, fuel_appliance: true },
    { id: "cafe-back", kind: "room", volume_m3: 30, absorption_m2: 12 },
    { id: "booth", kind: "room", volume_m3: 25, absorption_m2: 14 },
    { id: "control", kind: "room", volume_m3: 40, absorption_m2: 20, sleeping_room: false },
    { id: "void", kind: "void", volume_m3: 35, absorption_m2: 30 },
    { id: "dance", kind: "room", volume_m3: 150, rt60_s: 1.0 },
    { id: "street", kind: "outdoors" },
  ],
  links: [
    { id: "party-wall", between: ["cafe", "control"], length_m: 5, parts: [
      { id: "wall", kind: "wall", area_m2: 12, tl_db: rising(28, 1.4) },
      { id: "gap", kind: "gap", area_m2: 0.004, open: true },
    ] },
    { id: "booth-wall", between: ["cafe", "booth"], length_m: 3, fire_rated: true, parts: [{ id: "wall", kind: "wall", area_m2: 8, tl_db: rising(30, 1.5) }] },
    { id: "booth-door", between: ["booth", "control"], parts: [
      { id: "wall", kind: "wall", area_m2: 6, tl_db: rising(30, 1.2) },
      { id: "door", kind: "door", area_m2: 1.8, tl_db: rising(14, 0.6) },
      { id: "undercut", kind: "gap", area_m2: 0.01, open: true },
    ] },
    { id: "cafe-ceiling", between: ["cafe", "void"], parts: [{ id: "tiles", kind: "ceiling", area_m2: 30, tl_db: rising(6, 0.5) }] },
    { id: "control-ceiling", between: ["void", "control"], parts: [{ id: "tiles", kind: "ceiling", area_m2: 18, tl_db: rising(6, 0.5) }] },
    { id: "duct", type: "vent", between: ["cafe-back", "control"], open_area_m2: 0.05, attenuation_db: bands((b) => 1 + 0.4 * b) },
    { id: "back-wall", between: ["cafe-back", "booth"], parts: [{ id: "wall", kind: "wall", area_m2: 9, tl_db: rising(33, 1.3) }] },
    { id: "dance-floor", type: "floor", between: ["dance", "control"], area_m2: 40, tl_db: rising(38, 1.2), impact: { ln_db: flat(74) } },
    { id: "shopfront", between: ["street", "control"], parts: [{ id: "glass", kind: "window", area_m2: 6, tl_db: rising(20, 0.7) }] },
  ],
  sources: [
    { id: "grinder", space: "cafe", levels_db: bands((b) => 78 + (b > 12 ? 4 : 0)) },
    { id: "back-room", space: "cafe-back", levels_db: flat(75) },
    { id: "tram", space: "street", levels_db: bands((b) => 72 + (b < 6 ? 6 : 0)) },
    { id: "dancing", type: "impact", floor: "dance-floor" },
  ],
});

export const fernhollowOptions = () => [
  { id: "seal-gap", name: "Acoustic sealant along the party wall", link: "party-wall", action: { kind: "seal-leak", part: "gap" }, cost: { fixed: 40, per_item: 5, items: 4 }, labour_h: 1 },
  { id: "party-lining", name: "Independent lining on the party wall", link: "party-wall", action: { kind: "add-layer", part: "wall", delta_tl_db: 12 }, cost: { fixed: 300, per_m2: 85 }, labour_h: 16, added_thickness_m: 0.1 },
  { id: "solid-door", name: "Solid-core door with seals", link: "booth-door", action: { kind: "replace-part", part: "door", tl_db: rising(26, 0.6) }, cost: { per_item: 650 }, labour_h: 4 },
  { id: "door-bottom", name: "Drop seal on the booth door", link: "booth-door", action: { kind: "seal-leak", part: "undercut" }, cost: { per_item: 120 }, labour_h: 1 },
  { id: "ceiling-barrier", name: "Barrier over the control-room tiles", link: "control-ceiling", action: { kind: "add-layer", delta_tl_db: 15 }, cost: { per_m2: 45 }, labour_h: 8 },
  { id: "cafe-ceiling-barrier", name: "Barrier over the café tiles (neighbour's side)", link: "cafe-ceiling", action: { kind: "add-layer", delta_tl_db: 14 }, cost: { per_m2: 40 }, labour_h: 10, flags: ["neighbour-access"] },
  { id: "duct-liner", name: "Lined duct run with a baffle", link: "duct", action: { kind: "add-duct-attenuation", attenuation_db: bands((b) => 3 + 0.8 * b) }, cost: { fixed: 420 }, labour_h: 6 },
  { id: "register-cover", name: "Register cover", link: "duct", action: { kind: "add-duct-attenuation", attenuation_db: 25 }, cost: { per_item: 30 }, labour_h: 0.5, flags: ["reduces-ventilation"] },
  { id: "window-insert", name: "Window insert", link: "shopfront", action: { kind: "add-layer", delta_tl_db: 15 }, cost: { per_m2: 160 }, labour_h: 5, flags: ["changes-appearance"] },
  { id: "dance-underlay", name: "Resilient underlay in the dance school", link: "dance-floor", action: { kind: "add-impact-improvement", delta_l_db: bands((b) => 2 + 1.3 * b) }, cost: { per_m2: 35 }, labour_h: 12, flags: ["neighbour-access"] },
  { id: "resilient-ceiling", name: "Resilient ceiling under the dance floor", link: "dance-floor", action: { kind: "add-impact-improvement", delta_l_db: 12, delta_tl_db: 10 }, cost: { per_m2: 70 }, labour_h: 20, flags: ["structural-work"] },
];
