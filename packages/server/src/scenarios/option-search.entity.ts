import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from "typeorm";
import { Project } from "../entities/project.entity.js";

/**
 * One "best within limits" search: its state lives here, not in the memory of the process that
 * runs it, so any API process answers a poll or a cancel. The running process renews
 * `heartbeat_at` and stops its worker once the row is no longer `running`.
 */
@Entity({ name: "option_searches" })
@Index("ix_option_searches_project", ["projectId"])
export class OptionSearchRow {
  @PrimaryColumn({ type: "uuid", name: "id" })
  id!: string;

  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  /** running, done, cancelled or failed. */
  @Column({ type: "varchar", length: 12, name: "status" })
  status!: "running" | "done" | "cancelled" | "failed";

  @Column({ type: "jsonb", name: "progress" })
  progress!: { phase: string; done: number; total: number };

  @Column({ type: "text", name: "error", nullable: true })
  error!: string | null;

  @Column({ type: "jsonb", name: "result", nullable: true })
  result!: Record<string, unknown> | null;

  /** Set by whichever process took the cancel; the running process reads it on its next beat. */
  @Column({ type: "boolean", name: "cancel_requested", default: false })
  cancelRequested!: boolean;

  @Column({ type: "timestamptz", name: "heartbeat_at" })
  heartbeatAt!: Date;

  @Column({ type: "timestamptz", name: "finished_at", nullable: true })
  finishedAt!: Date | null;

  @Column({ type: "uuid", name: "created_by", nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
