/** Cost, labour and floor area lost of an upgrade option. */
import type { Link } from "../network/schema.js";
import { actionAreaM2 } from "./apply.js";
import type { UpgradeOption } from "./schema.js";

export interface OptionCosts {
  /** fixed + per_m2 × area + per_item × items, currency units. */
  readonly cost: number;
  readonly labourH: number;
  readonly floorAreaLostM2: number;
  /** Area the per-m² price was applied to, m². */
  readonly areaM2: number;
  readonly notes: readonly string[];
}

/** Costs of an option on its link. */
export function optionCosts(option: UpgradeOption, link: Link): OptionCosts {
  const notes: string[] = [];
  const area = option.cost.area_m2 ?? actionAreaM2(link, option.action);
  const cost = option.cost.fixed + option.cost.per_m2 * area + option.cost.per_item * option.cost.items;
  let lost = option.floor_area_lost_m2 ?? 0;
  if (option.floor_area_lost_m2 === undefined && option.added_thickness_m !== undefined) {
    const length = option.length_m ?? (link.type === "partition" ? link.length_m : undefined);
    if (length === undefined) notes.push("added thickness given without a wall length: floor area lost not counted");
    else lost = option.added_thickness_m * length;
  }
  return { cost, labourH: option.labour_h, floorAreaLostM2: lost, areaM2: area, notes };
}
