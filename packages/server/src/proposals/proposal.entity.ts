import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import { Project } from "../entities/project.entity.js";

/** A proposal to a client; its content lives in versions, its state here. */
@Entity({ name: "proposals" })
@Index("ix_proposals_project", ["projectId"])
export class ProposalRow {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "uuid", name: "scenario_id" })
  scenarioId!: string;

  @Column({ type: "varchar", length: 20, name: "status", default: "draft" })
  status!: string;

  @Column({ type: "integer", name: "current_version", default: 1 })
  currentVersion!: number;

  @Column({ type: "uuid", name: "approved_by", nullable: true })
  approvedById!: string | null;

  @Column({ type: "varchar", length: 200, name: "approved_by_name", nullable: true })
  approvedByName!: string | null;

  @Column({ type: "timestamptz", name: "approved_at", nullable: true })
  approvedAt!: Date | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
