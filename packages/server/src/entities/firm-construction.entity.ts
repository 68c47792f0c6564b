import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn } from "typeorm";
import { Organization } from "./organization.entity.js";

/** A firm's own construction (from its lab data), used beside the built-in catalogue. */
@Entity({ name: "firm_constructions" })
export class FirmConstruction {
  @PrimaryColumn({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @ManyToOne(() => Organization, { onDelete: "CASCADE" })
  @JoinColumn({ name: "organization_id" })
  organization?: Organization;

  @PrimaryColumn({ type: "varchar", length: 60, name: "construction_id" })
  constructionId!: string;

  /** The construction as the plan model reads it (floorplan `Construction`). */
  @Column({ type: "jsonb" })
  data!: Record<string, unknown>;

  @Column({ type: "uuid", name: "created_by", nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
