import type { DataSource, EntityManager } from "typeorm";
import { In, Not } from "typeorm";
import type { QueryDeepPartialEntity } from "typeorm/query-builder/QueryPartialEntity.js";
import { priceBookItemInputSchema, priceBookItemSchema, type FirmSettings, type PriceBookItem } from "@hushmark/schemas";
import type { z } from "zod";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import { HttpError, conflict, notFound } from "../http/errors.js";
import { DEMO_FIRM_SETTINGS } from "./demo-price-book.js";
import { FirmSettingsRow } from "./firm-settings.entity.js";
import { PriceBookItem as PriceBookItemRow } from "./price-book-item.entity.js";
import { priceBookFromCsv, priceBookToCsv } from "./price-book-csv.js";

type ItemInput = z.output<typeof priceBookItemInputSchema>;

export const DEFAULT_FIRM_SETTINGS: FirmSettings = { currency: "USD", taxRatePercent: 0, depositPercent: 30, validityDays: 30, terms: "" };

export function itemDto(r: PriceBookItemRow): PriceBookItem {
  return priceBookItemSchema.parse({
    id: r.id, code: r.code, name: r.name, family: r.family, appliesTo: r.appliesTo, effect: r.effect,
    costs: { fixedMaterials: r.fixedMaterials, fixedLabour: r.fixedLabour, perM2Materials: r.perM2Materials, perM2Labour: r.perM2Labour, perItemMaterials: r.perItemMaterials, perItemLabour: r.perItemLabour },
    labourHours: r.labourHours, addedThicknessMm: r.addedThicknessMm, flags: r.flags, cautions: r.cautions, active: r.active,
    updatedAt: r.updatedAt.toISOString(),
  });
}

function columns(i: ItemInput): QueryDeepPartialEntity<PriceBookItemRow> {
  return {
    code: i.code, name: i.name, family: i.family, appliesTo: i.appliesTo, effect: i.effect as never,
    ...i.costs, labourHours: i.labourHours, addedThicknessMm: i.addedThicknessMm, flags: [...i.flags], cautions: i.cautions, active: i.active,
  } as never;
}

/** Writes a firm's price book items (used by the seed and by CSV import). */
export async function insertPriceBook(manager: EntityManager, organizationId: string, items: ItemInput[]): Promise<void> {
  if (items.length === 0) return;
  await manager.getRepository(PriceBookItemRow).insert(items.map((i) => ({ organizationId, ...columns(i) })));
}

/** The price book and the firm's commercial settings. Owners edit; planners (and the rest of the staff) read. */
export function createPriceBookService(dataSource: DataSource) {
  const items = dataSource.getRepository(PriceBookItemRow);
  const settingsRepo = dataSource.getRepository(FirmSettingsRow);

  async function list(actor: Actor): Promise<PriceBookItem[]> {
    const rows = await items.find({ where: { organizationId: actor.organizationId }, order: { family: "ASC", name: "ASC" } });
    return rows.map(itemDto);
  }

  async function byIds(organizationId: string, ids: string[]): Promise<Map<string, PriceBookItem>> {
    if (ids.length === 0) return new Map();
    const rows = await items.find({ where: { organizationId, id: In([...new Set(ids)]) } });
    return new Map(rows.map((r) => [r.id, itemDto(r)]));
  }

  async function codeTaken(organizationId: string, code: string, exceptId?: string): Promise<boolean> {
    return (await items.count({ where: { organizationId, code, ...(exceptId ? { id: Not(exceptId) } : {}) } })) > 0;
  }

  async function create(actor: Actor, input: ItemInput): Promise<PriceBookItem> {
    if (await codeTaken(actor.organizationId, input.code)) throw conflict("code_taken", `The code “${input.code}” is already in the price book; pick another.`);
    const inserted = await items.insert({ organizationId: actor.organizationId, ...columns(input) });
    const id = String(inserted.identifiers[0]?.id);
    await recordAudit(dataSource.manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "price_book.item_added", entityType: "price_book_item", entityId: id, data: { code: input.code } });
    return itemDto(await items.findOneByOrFail({ id }));
  }

  async function update(actor: Actor, id: string, patch: Partial<ItemInput>): Promise<PriceBookItem> {
    const row = await items.findOne({ where: { id, organizationId: actor.organizationId } });
    if (!row) throw notFound("That price book item");
    const merged = priceBookItemInputSchema.parse({ ...itemDto(row), ...Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) });
    if (await codeTaken(actor.organizationId, merged.code, id)) throw conflict("code_taken", `The code “${merged.code}” is already in the price book; pick another.`);
    await items.update({ id, organizationId: actor.organizationId }, columns(merged));
    await recordAudit(dataSource.manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "price_book.item_changed", entityType: "price_book_item", entityId: id, data: { code: merged.code } });
    return itemDto(await items.findOneByOrFail({ id }));
  }

  async function remove(actor: Actor, id: string): Promise<void> {
    const res = await items.delete({ id, organizationId: actor.organizationId });
    if (!res.affected) throw notFound("That price book item");
  }

  async function exportCsv(actor: Actor): Promise<string> {
    return priceBookToCsv(await list(actor));
  }

  /** All rows or none: a file with any bad row changes nothing. */
  async function importCsv(actor: Actor, csv: string, mode: "merge" | "replace"): Promise<{ added: number; updated: number; removed: number }> {
    const parsed = priceBookFromCsv(csv);
    if (!parsed.ok) throw new HttpError(400, "invalid_csv", `The CSV has ${parsed.problems.length} problem${parsed.problems.length === 1 ? "" : "s"}; nothing was imported.`, parsed.problems);
    return dataSource.transaction(async (manager) => {
      const repo = manager.getRepository(PriceBookItemRow);
      const existing = new Map((await repo.find({ where: { organizationId: actor.organizationId } })).map((r) => [r.code, r]));
      let added = 0;
      let updated = 0;
      for (const item of parsed.items) {
        const row = existing.get(item.code);
        if (row) {
          await repo.update({ id: row.id }, columns(item));
          updated++;
        } else {
          await repo.insert({ organizationId: actor.organizationId, ...columns(item) });
          added++;
        }
      }
      let removed = 0;
      if (mode === "replace") {
        const keep = new Set(parsed.items.map((i) => i.code));
        const gone = [...existing.values()].filter((r) => !keep.has(r.code)).map((r) => r.id);
        if (gone.length) removed = (await repo.delete({ id: In(gone), organizationId: actor.organizationId })).affected ?? 0;
      }
      await recordAudit(manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "price_book.imported", entityType: "price_book", entityId: actor.organizationId, data: { added, updated, removed } });
      return { added, updated, removed };
    });
  }

  async function settings(organizationId: string): Promise<FirmSettings> {
    const row = await settingsRepo.findOne({ where: { organizationId } });
    if (!row) return DEFAULT_FIRM_SETTINGS;
    return { currency: row.currency, taxRatePercent: row.taxRatePercent, depositPercent: row.depositPercent, validityDays: row.validityDays, terms: row.terms };
  }

  async function saveSettings(actor: Actor, input: FirmSettings): Promise<FirmSettings> {
    await settingsRepo.upsert({ organizationId: actor.organizationId, ...input }, ["organizationId"]);
    await recordAudit(dataSource.manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "firm.settings_changed", entityType: "organization", entityId: actor.organizationId, data: { ...input, terms: undefined } });
    return settings(actor.organizationId);
  }

  return { list, byIds, create, update, remove, exportCsv, importCsv, settings, saveSettings };
}

export type PriceBookService = ReturnType<typeof createPriceBookService>;

/** The demo firm's seeded settings (invented). */
export const demoFirmSettings = DEMO_FIRM_SETTINGS;
