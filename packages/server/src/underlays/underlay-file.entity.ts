import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
import { Project } from "../entities/project.entity.js";
import { StoredFile } from "../files/stored-file.entity.js";

/**
 * A drawing uploaded to trace over: the image's record and size. Where it sits on the plan (level,
 * scale, rotation) is part of the plan document, which names this record's id.
 */
@Entity({ name: "underlay_files" })
export class UnderlayFile {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Index("ix_underlay_files_org")
  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Index("ix_underlay_files_project")
  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "uuid", name: "file_id" })
  fileId!: string;

  @ManyToOne(() => StoredFile, { onDelete: "CASCADE" })
  @JoinColumn({ name: "file_id" })
  file?: StoredFile;

  @Column({ type: "varchar", length: 200, name: "name", default: "" })
  name!: string;

  /** `image` as uploaded, or `pdf-page` rendered from a PDF in the browser. */
  @Column({ type: "varchar", length: 16, name: "source", default: "image" })
  source!: "image" | "pdf-page";

  @Column({ type: "integer", name: "page", nullable: true })
  page!: number | null;

  @Column({ type: "integer", name: "width_px" })
  widthPx!: number;

  @Column({ type: "integer", name: "height_px" })
  heightPx!: number;

  @Column({ type: "uuid", name: "created_by", nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
