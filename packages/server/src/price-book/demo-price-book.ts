import type { PriceBookItemInput } from "@hushmark/schemas";

/**
 * The demo firm's price book: invented prices in US dollars. Acoustic effects are typical
 * retrofit figures (common practice), not lab data for a product.
 */
export const DEMO_PRICE_BOOK: PriceBookItemInput[] = [
  // Sealing
  { code: "door-bottom-auto", name: "Automatic door bottom", family: "sealing", appliesTo: ["door"], effect: { kind: "sealed-gap", gap: "undercut" }, costs: { perItemMaterials: 145, perItemLabour: 70 }, labourHours: 1, flags: [] },
  { code: "door-perimeter-seals", name: "Door perimeter seal kit", family: "sealing", appliesTo: ["door", "window"], effect: { kind: "sealed-gap", gap: "perimeter" }, costs: { perItemMaterials: 85, perItemLabour: 90 }, labourHours: 1.5 },
  { code: "outlet-putty-pads", name: "Outlet putty pads and acoustic sealant", family: "sealing", appliesTo: ["penetration"], effect: { kind: "sealed-gap", gap: "opening" }, costs: { perItemMaterials: 18, perItemLabour: 40 }, labourHours: 0.5, cautions: ["Turn the circuit off at the panel before removing cover plates."] },
  { code: "register-cover", name: "Magnetic register cover", family: "sealing", appliesTo: ["vent"], effect: { kind: "duct-attenuation", attenuationDb: 12 }, costs: { perItemMaterials: 22, perItemLabour: 10 }, labourHours: 0.2, flags: ["reduces-ventilation"] },
  // Mass
  { code: "gypsum-layer", name: "Extra 15.9 mm gypsum layer with damped joints", family: "mass", appliesTo: ["wall"], effect: { kind: "added-layer", deltaTlDb: 4 }, costs: { fixedLabour: 120, perM2Materials: 14, perM2Labour: 22 }, labourHours: 6, addedThicknessMm: 16, flags: ["changes-appearance"] },
  { code: "mlv-barrier", name: "Mass-loaded vinyl barrier, 5 kg/m², behind new board", family: "mass", appliesTo: ["wall", "ceiling"], effect: { kind: "added-layer", deltaTlDb: 6 }, costs: { fixedLabour: 150, perM2Materials: 26, perM2Labour: 30 }, labourHours: 8, addedThicknessMm: 20, flags: ["changes-appearance"] },
  { code: "solid-core-door", name: "Solid-core door with seals and drop seal", family: "mass", appliesTo: ["door"], effect: { kind: "construction", constructionId: "door-solid-core-sealed" }, costs: { perItemMaterials: 520, perItemLabour: 260 }, labourHours: 4, flags: ["changes-appearance"] },
  { code: "window-insert", name: "Laminated acoustic window insert", family: "mass", appliesTo: ["window"], effect: { kind: "construction", constructionId: "glazing-laminated-12-7" }, costs: { fixedLabour: 90, perM2Materials: 210, perM2Labour: 60 }, labourHours: 3, addedThicknessMm: 0, flags: ["changes-appearance"], cautions: ["In a sleeping room the insert must come out from inside quickly, without tools."] },
  { code: "secondary-glazing", name: "Secondary glazing on its own frame", family: "mass", appliesTo: ["window"], effect: { kind: "construction", constructionId: "glazing-double-3-50-3" }, costs: { fixedLabour: 180, perM2Materials: 260, perM2Labour: 95 }, labourHours: 5, flags: ["changes-appearance"] },
  { code: "window-plug", name: "Removable window plug (night use)", family: "mass", appliesTo: ["window"], effect: { kind: "added-layer", deltaTlDb: 15 }, costs: { fixedMaterials: 40, perM2Materials: 120, perM2Labour: 35 }, labourHours: 2, flags: ["blocks-daylight"], cautions: ["A plug in a sleeping room must come out from inside quickly, without keys or tools."] },
  // Decoupling
  { code: "resilient-channel-lining", name: "Resilient channel and new gypsum lining", family: "decoupling", appliesTo: ["wall"], effect: { kind: "added-layer", deltaTlDb: 7 }, costs: { fixedLabour: 200, perM2Materials: 24, perM2Labour: 38 }, labourHours: 10, addedThicknessMm: 30, flags: ["changes-appearance"] },
  { code: "isolation-clips-lining", name: "Isolation clips, furring and two gypsum layers", family: "decoupling", appliesTo: ["wall", "ceiling"], effect: { kind: "added-layer", deltaTlDb: 10 }, costs: { fixedLabour: 250, perM2Materials: 42, perM2Labour: 48 }, labourHours: 14, addedThicknessMm: 55, flags: ["changes-appearance"] },
  { code: "independent-stud-wall", name: "Independent stud wall, insulated, two gypsum layers", family: "decoupling", appliesTo: ["wall"], effect: { kind: "added-layer", deltaTlDb: 14 }, costs: { fixedLabour: 400, perM2Materials: 55, perM2Labour: 70 }, labourHours: 24, addedThicknessMm: 110, flags: ["changes-appearance"] },
  { code: "floated-floor", name: "Floated floor on resilient mat", family: "decoupling", appliesTo: ["floor"], effect: { kind: "impact-improvement", deltaLDb: 20, deltaTlDb: 5 }, costs: { fixedLabour: 300, perM2Materials: 48, perM2Labour: 35 }, labourHours: 16, flags: ["structural-work", "neighbour-access"] },
  // Damping
  { code: "damping-compound-layer", name: "Viscoelastic damping compound between two boards", family: "damping", appliesTo: ["wall", "ceiling"], effect: { kind: "added-layer", deltaTlDb: 6 }, costs: { fixedLabour: 140, perM2Materials: 30, perM2Labour: 26 }, labourHours: 8, addedThicknessMm: 16, flags: ["changes-appearance"] },
  // Ducts
  { code: "lined-duct", name: "Acoustically lined duct run", family: "ducts", appliesTo: ["vent"], effect: { kind: "duct-attenuation", attenuationDb: 8 }, costs: { fixedMaterials: 180, fixedLabour: 240 }, labourHours: 4 },
  { code: "baffle-box", name: "Baffle box at the grille", family: "ducts", appliesTo: ["vent"], effect: { kind: "duct-attenuation", attenuationDb: 14 }, costs: { fixedMaterials: 260, fixedLabour: 220 }, labourHours: 5 },
  { code: "duct-silencer", name: "Inline duct silencer", family: "ducts", appliesTo: ["vent"], effect: { kind: "duct-attenuation", attenuationDb: 20 }, costs: { fixedMaterials: 480, fixedLabour: 320 }, labourHours: 6, cautions: ["A silencer adds pressure drop: have the ventilation flow checked after fitting."] },
  // Impact
  { code: "carpet-underlay-above", name: "Carpet and underlay on the floor above", family: "impact", appliesTo: ["floor"], effect: { kind: "impact-improvement", deltaLDb: 22 }, costs: { perM2Materials: 32, perM2Labour: 12 }, labourHours: 6, flags: ["neighbour-access", "changes-appearance"] },
  { code: "resilient-ceiling-below", name: "Resilient ceiling below (clips and two gypsum layers)", family: "impact", appliesTo: ["floor", "ceiling"], effect: { kind: "impact-improvement", deltaLDb: 12, deltaTlDb: 8 }, costs: { fixedLabour: 260, perM2Materials: 40, perM2Labour: 45 }, labourHours: 16, flags: ["structural-work"] },
];

export const DEMO_FIRM_SETTINGS = {
  currency: "USD",
  taxRatePercent: 8.25,
  depositPercent: 30,
  validityDays: 30,
  terms: "Work starts within three weeks of the deposit. The balance is due on completion of the after-work measurement. Prices include materials, labour and disposal of waste.",
};
