import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import { Project } from "../entities/project.entity.js";

/** A named set of upgrades on plan elements, with the setup it is evaluated against and its last evaluation. */
@Entity({ name: "scenarios" })
@Index("ix_scenarios_project", ["projectId"])
export class ScenarioRow {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "varchar", length: 120, name: "name" })
  name!: string;

  @Column({ type: "jsonb", name: "setup" })
  setup!: Record<string, unknown>;

  @Column({ type: "jsonb", name: "items" })
  items!: { priceBookItemId: string; elementId: string }[];

  @Column({ type: "jsonb", name: "evaluation", nullable: true })
  evaluation!: Record<string, unknown> | null;

  @Column({ type: "uuid", name: "created_by", nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
