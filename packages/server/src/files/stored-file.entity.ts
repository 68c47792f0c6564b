import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from "typeorm";
import { Project } from "../entities/project.entity.js";

export type StoredFileState = "receiving" | "stored";

const bigintNumber = { to: (v: number) => v, from: (v: string | null) => (v === null ? null : Number(v)) };

/** An uploaded file kept in object storage; the key is ours (never the uploaded name). */
@Entity({ name: "stored_files" })
export class StoredFile {
  @PrimaryColumn({ type: "uuid", name: "id" })
  id!: string;

  @Index("ix_stored_files_org")
  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Index("ix_stored_files_project")
  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "varchar", length: 300, name: "object_key", unique: true })
  objectKey!: string;

  /** The type found by reading the content, not the one the browser claimed. */
  @Column({ type: "varchar", length: 100, name: "content_type" })
  contentType!: string;

  @Column({ type: "bigint", name: "size_bytes", transformer: bigintNumber })
  sizeBytes!: number;

  @Column({ type: "char", length: 64, name: "sha256" })
  sha256!: string;

  /** For display only. */
  @Column({ type: "varchar", length: 200, name: "original_name", default: "" })
  originalName!: string;

  @Column({ type: "varchar", length: 16, name: "state", default: "receiving" })
  state!: StoredFileState;

  @Column({ type: "uuid", name: "created_by", nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
