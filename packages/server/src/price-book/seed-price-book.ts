import type { DataSource } from "typeorm";
import { priceBookItemInputSchema } from "@hushmark/schemas";
import { DEMO_FIRM_SETTINGS, DEMO_PRICE_BOOK } from "./demo-price-book.js";
import { FirmSettingsRow } from "./firm-settings.entity.js";
import { PriceBookItem } from "./price-book-item.entity.js";
import { insertPriceBook } from "./price-book.service.js";

/** Gives the demo owner's firm its invented price book and settings once (also on a database seeded before they existed). */
export async function seedDemoPriceBook(dataSource: DataSource, ownerEmail: string): Promise<void> {
  const rows: { organization_id: string }[] = await dataSource.query(
    "SELECT m.organization_id FROM memberships m JOIN users u ON u.id = m.user_id WHERE u.email = $1 AND m.role = 'owner' LIMIT 1",
    [ownerEmail],
  );
  const organizationId = rows[0]?.organization_id;
  if (!organizationId) return;
  await dataSource.transaction(async (m) => {
    if ((await m.getRepository(PriceBookItem).count({ where: { organizationId } })) === 0) {
      await insertPriceBook(m, organizationId, DEMO_PRICE_BOOK.map((i) => priceBookItemInputSchema.parse(i)));
      console.log(`demo data: price book with ${DEMO_PRICE_BOOK.length} upgrades`);
    }
    if (!(await m.getRepository(FirmSettingsRow).exists({ where: { organizationId } }))) {
      await m.getRepository(FirmSettingsRow).insert({ organizationId, ...DEMO_FIRM_SETTINGS });
    }
  });
}
