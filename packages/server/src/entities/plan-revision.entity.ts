import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn } from "typeorm";
import { Project } from "./project.entity.js";
import { User } from "./user.entity.js";

/** Every saved version of a plan, kept for good. */
@Entity({ name: "plan_revisions" })
export class PlanRevision {
  @PrimaryColumn({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @PrimaryColumn({ type: "integer" })
  version!: number;

  @Column({ type: "jsonb" })
  document!: Record<string, unknown>;

  @Column({ type: "uuid", name: "saved_by", nullable: true })
  savedById!: string | null;

  @ManyToOne(() => User, { onDelete: "SET NULL" })
  @JoinColumn({ name: "saved_by" })
  savedBy?: User | null;

  @Column({ type: "varchar", length: 200, nullable: true })
  message!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "saved_at" })
  savedAt!: Date;
}
