import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import { Organization } from "../entities/organization.entity.js";
import { decimal } from "../money/decimal.js";

/** One upgrade a firm offers: what it applies to, its acoustic effect, costs, labour, flags and cautions. */
@Entity({ name: "price_book_items" })
@Index("ux_price_book_items_code", ["organizationId", "code"], { unique: true })
export class PriceBookItem {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @ManyToOne(() => Organization, { onDelete: "CASCADE" })
  @JoinColumn({ name: "organization_id" })
  organization?: Organization;

  @Column({ type: "varchar", length: 60, name: "code" })
  code!: string;

  @Column({ type: "varchar", length: 120, name: "name" })
  name!: string;

  @Column({ type: "varchar", length: 20, name: "family" })
  family!: string;

  @Column({ type: "jsonb", name: "applies_to" })
  appliesTo!: string[];

  /** The effect in the engine's terms (schemas `upgradeEffectSchema`). */
  @Column({ type: "jsonb", name: "effect" })
  effect!: Record<string, unknown>;

  @Column({ type: "numeric", precision: 12, scale: 2, name: "fixed_materials", default: 0, transformer: decimal })
  fixedMaterials!: number;

  @Column({ type: "numeric", precision: 12, scale: 2, name: "fixed_labour", default: 0, transformer: decimal })
  fixedLabour!: number;

  @Column({ type: "numeric", precision: 12, scale: 2, name: "per_m2_materials", default: 0, transformer: decimal })
  perM2Materials!: number;

  @Column({ type: "numeric", precision: 12, scale: 2, name: "per_m2_labour", default: 0, transformer: decimal })
  perM2Labour!: number;

  @Column({ type: "numeric", precision: 12, scale: 2, name: "per_item_materials", default: 0, transformer: decimal })
  perItemMaterials!: number;

  @Column({ type: "numeric", precision: 12, scale: 2, name: "per_item_labour", default: 0, transformer: decimal })
  perItemLabour!: number;

  @Column({ type: "numeric", precision: 8, scale: 2, name: "labour_hours", default: 0, transformer: decimal })
  labourHours!: number;

  @Column({ type: "numeric", precision: 6, scale: 1, name: "added_thickness_mm", default: 0, transformer: decimal })
  addedThicknessMm!: number;

  @Column({ type: "jsonb", name: "flags", default: () => "'[]'" })
  flags!: string[];

  @Column({ type: "jsonb", name: "cautions", default: () => "'[]'" })
  cautions!: string[];

  @Column({ type: "boolean", name: "active", default: true })
  active!: boolean;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
