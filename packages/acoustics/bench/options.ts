/** Synthetic upgrade options for the benchmark, on the links that matter most to the receiver. */
import type { Network, UpgradeOptionInput } from "../src/index.js";
import { seededRandom } from "./building.js";

/** `count` options on the links with the largest shares (`linksByShare`), two kinds per link where possible. */
export function syntheticOptions(network: Network, linksByShare: readonly string[], count: number, seed = 7): UpgradeOptionInput[] {
  const rnd = seededRandom(seed);
  const byId = new Map(network.links.map((l) => [l.id, l]));
  const out: UpgradeOptionInput[] = [];
  for (let k = 0; out.length < count; k++) {
    const link = byId.get(linksByShare[k % linksByShare.length]!)!;
    const round = Math.floor(k / linksByShare.length);
    const n = out.length;
    const base = { id: `o${n}`, link: link.id, labour_h: 1 + 10 * rnd(), cost: { fixed: 50 + 400 * rnd(), per_m2: 20 + 60 * rnd() } };
    if (link.type === "partition") {
      const gap = link.parts.findIndex((p) => "open" in p);
      const door = link.parts.findIndex((p) => p.kind === "door");
      if (round === 0 && gap >= 0) out.push({ ...base, action: { kind: "seal-leak", part: gap } });
      else if (round <= 1 && door >= 0) out.push({ ...base, action: { kind: "replace-part", part: door, tl_db: Array.from({ length: 21 }, (_, b) => 28 + 0.6 * b) } });
      else out.push({ ...base, action: { kind: "add-layer", part: 0, delta_tl_db: 4 + 10 * rnd() }, added_thickness_m: 0.05 });
    } else if (link.type === "vent") out.push({ ...base, action: { kind: "add-duct-attenuation", attenuation_db: 5 + 15 * rnd() } });
    else if (link.type === "floor") out.push({ ...base, action: { kind: "add-impact-improvement", delta_l_db: 10, delta_tl_db: 3 + 6 * rnd() } });
    else out.push({ ...base, action: { kind: "add-layer", delta_tl_db: 3 + 8 * rnd() } });
  }
  return out;
}
