import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn, UpdateDateColumn } from "typeorm";
import { Organization } from "../entities/organization.entity.js";
import { decimal } from "../money/decimal.js";

/** A firm's commercial settings: currency, tax, deposit, validity and terms of its proposals. */
@Entity({ name: "firm_settings" })
export class FirmSettingsRow {
  @PrimaryColumn({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @OneToOne(() => Organization, { onDelete: "CASCADE" })
  @JoinColumn({ name: "organization_id" })
  organization?: Organization;

  @Column({ type: "varchar", length: 3, name: "currency", default: "USD" })
  currency!: string;

  @Column({ type: "numeric", precision: 5, scale: 2, name: "tax_rate_percent", default: 0, transformer: decimal })
  taxRatePercent!: number;

  @Column({ type: "numeric", precision: 5, scale: 2, name: "deposit_percent", default: 30, transformer: decimal })
  depositPercent!: number;

  @Column({ type: "integer", name: "validity_days", default: 30 })
  validityDays!: number;

  @Column({ type: "text", name: "terms", default: "" })
  terms!: string;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
