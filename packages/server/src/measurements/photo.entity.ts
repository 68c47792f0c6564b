import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
import { Project } from "../entities/project.entity.js";
import { StoredFile } from "../files/stored-file.entity.js";
import { Measurement } from "./measurement.entity.js";

/** A photo of a leak or weak spot, attached to a plan element or a measurement. */
@Entity({ name: "photos" })
export class Photo {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Index("ix_photos_org")
  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Index("ix_photos_project")
  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "varchar", length: 100, name: "element_id", nullable: true })
  elementId!: string | null;

  @Column({ type: "uuid", name: "measurement_id", nullable: true })
  measurementId!: string | null;

  @ManyToOne(() => Measurement, { onDelete: "CASCADE" })
  @JoinColumn({ name: "measurement_id" })
  measurement?: Measurement | null;

  @Column({ type: "varchar", length: 300, name: "caption", default: "" })
  caption!: string;

  @Column({ type: "uuid", name: "file_id" })
  fileId!: string;

  @ManyToOne(() => StoredFile, { onDelete: "CASCADE" })
  @JoinColumn({ name: "file_id" })
  file?: StoredFile;

  @Column({ type: "uuid", name: "thumbnail_file_id" })
  thumbnailFileId!: string;

  @ManyToOne(() => StoredFile, { onDelete: "CASCADE" })
  @JoinColumn({ name: "thumbnail_file_id" })
  thumbnailFile?: StoredFile;

  @Column({ type: "integer", name: "width", nullable: true })
  width!: number | null;

  @Column({ type: "integer", name: "height", nullable: true })
  height!: number | null;

  @Column({ type: "uuid", name: "created_by", nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
