import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import type { ProjectStatus } from "@hushmark/schemas";
import { Organization } from "./organization.entity.js";

/** A job for one client site. */
@Entity({ name: "projects" })
export class Project {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Index("ix_projects_org")
  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @ManyToOne(() => Organization, { onDelete: "CASCADE" })
  @JoinColumn({ name: "organization_id" })
  organization?: Organization;

  @Column({ type: "varchar", length: 160 })
  title!: string;

  @Column({ type: "varchar", length: 300, name: "site_address", default: "" })
  siteAddress!: string;

  /** WGS84 latitude and longitude of the plan origin and the bearing of plan +y from true north, degrees; null until set. */
  @Column({ type: "double precision", name: "site_lat_deg", nullable: true })
  siteLatDeg!: number | null;

  @Column({ type: "double precision", name: "site_lon_deg", nullable: true })
  siteLonDeg!: number | null;

  @Column({ type: "double precision", name: "plan_north_bearing_deg", nullable: true })
  planNorthBearingDeg!: number | null;

  @Column({ type: "varchar", length: 24, default: "brief" })
  status!: ProjectStatus;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
