import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn } from "typeorm";
import { Project } from "./project.entity.js";

/** A computed analysis, keyed by the plan version and a hash of the inputs; shared by every server process. */
@Entity({ name: "analysis_cache" })
export class AnalysisCache {
  @PrimaryColumn({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  /** SHA-256 (hex) of the plan version and the canonical request. */
  @PrimaryColumn({ type: "char", length: 64, name: "cache_key" })
  cacheKey!: string;

  @Column({ type: "integer", name: "plan_version" })
  planVersion!: number;

  @Column({ type: "jsonb" })
  result!: Record<string, unknown>;

  @Column({ type: "real", name: "compute_ms" })
  computeMs!: number;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
