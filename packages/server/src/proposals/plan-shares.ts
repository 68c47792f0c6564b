import type { Catalogue } from "@hushmark/floorplan";
import type { PriceBookItem, ScenarioItem, ScenarioSetup } from "@hushmark/schemas";
import type { DataSource } from "typeorm";
import { PriceBookItem as PriceBookItemRow } from "../price-book/price-book-item.entity.js";
import { itemDto } from "../price-book/price-book.service.js";
import { plannerFor } from "../scenarios/scenario-evaluate.js";
import { elementShares } from "./plan-drawing.js";

/**
 * The plan's network with a scenario's upgrades, and each element's share of the sound at the
 * receiver before and after them: what the PDF and the client's marked-up plan colour by.
 */
export async function planShares(dataSource: DataSource, catalogue: Catalogue, document: unknown, setup: ScenarioSetup, items: readonly ScenarioItem[]) {
  const ids = [...new Set(items.map((i) => i.priceBookItemId))];
  const rows = ids.length ? await dataSource.getRepository(PriceBookItemRow).createQueryBuilder("i").where("i.id IN (:...ids)", { ids }).getMany() : [];
  const book = new Map<string, PriceBookItem>(rows.map((r) => [r.id, itemDto(r)]));
  const picks = items.flatMap((i, k) => {
    const item = book.get(i.priceBookItemId);
    return item ? [{ key: `u${k}`, item, elementId: i.elementId }] : [];
  });
  const built = plannerFor(document, setup, picks, catalogue);
  const prepared = built.ok ? built.value.prepared : null;
  const before = prepared ? elementShares(prepared, setup.receiverId) : new Map<string, number>();
  const after = prepared && built.ok ? elementShares(prepared, setup.receiverId, built.value.planner.prepared.map((p) => p.option)) : new Map<string, number>();
  return { prepared, before, after };
}

/** Shares rounded to 0.01 %, as the proposal keeps them (enough to tell a small element before and after). */
export const sharesRecord = (m: Map<string, number>): Record<string, number> => Object.fromEntries([...m].map(([k, v]) => [k, Math.round(v * 10_000) / 10_000]));
