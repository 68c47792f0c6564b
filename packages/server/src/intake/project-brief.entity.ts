import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn, UpdateDateColumn } from "typeorm";
import { Project } from "../entities/project.entity.js";

/** A project's brief (intake), one document per project with a version for optimistic concurrency. */
@Entity({ name: "project_briefs" })
export class ProjectBrief {
  @PrimaryColumn({ type: "uuid", name: "project_id" })
  projectId!: string;

  @OneToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "integer", name: "version", default: 0 })
  version!: number;

  /** Shape version of `brief` (BRIEF_FORMAT_VERSION when written). */
  @Column({ type: "integer", name: "format_version", default: 1 })
  formatVersion!: number;

  @Column({ type: "jsonb", name: "brief" })
  brief!: Record<string, unknown>;

  @Column({ type: "uuid", name: "updated_by", nullable: true })
  updatedById!: string | null;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
