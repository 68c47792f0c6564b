import { Column, Entity, JoinColumn, ManyToOne, OneToOne, PrimaryColumn, UpdateDateColumn } from "typeorm";
import { Project } from "./project.entity.js";
import { User } from "./user.entity.js";

/** The current plan document of a project, with its version for optimistic concurrency. */
@Entity({ name: "plans" })
export class Plan {
  @PrimaryColumn({ type: "uuid", name: "project_id" })
  projectId!: string;

  @OneToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "jsonb" })
  document!: Record<string, unknown>;

  @Column({ type: "integer", default: 0 })
  version!: number;

  @Column({ type: "uuid", name: "updated_by", nullable: true })
  updatedById!: string | null;

  @ManyToOne(() => User, { onDelete: "SET NULL" })
  @JoinColumn({ name: "updated_by" })
  updatedBy?: User | null;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
