import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import type { MeasurementKind } from "@hushmark/schemas";
import { Project } from "../entities/project.entity.js";
import { StoredFile } from "../files/stored-file.entity.js";

/** A measured band spectrum pinned to a place on the plan; from a file, a recording or the live analyzer. */
@Entity({ name: "measurements" })
export class Measurement {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Index("ix_measurements_org")
  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Index("ix_measurements_project")
  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Column({ type: "varchar", length: 120, name: "label" })
  label!: string;

  @Column({ type: "varchar", length: 24, name: "kind" })
  kind!: MeasurementKind;

  @Column({ type: "varchar", length: 16, name: "source" })
  source!: "csv" | "recording" | "live" | "manual";

  @Column({ type: "varchar", length: 16, name: "status", default: "ready" })
  status!: "ready" | "processing" | "failed";

  /** 0…1 while a recording is analysed. */
  @Column({ type: "real", name: "progress", default: 1 })
  progress!: number;

  @Column({ type: "text", name: "error", nullable: true })
  error!: string | null;

  @Column({ type: "timestamptz", name: "taken_at" })
  takenAt!: Date;

  @Column({ type: "varchar", length: 100, name: "room_id", nullable: true })
  roomId!: string | null;

  @Column({ type: "jsonb", name: "point", nullable: true })
  point!: { x: number; y: number } | null;

  @Column({ type: "varchar", length: 120, name: "device", default: "" })
  device!: string;

  @Column({ type: "double precision", name: "calibration_db", default: 0 })
  calibrationDb!: number;

  @Column({ type: "jsonb", name: "leq_db" })
  leqDb!: (number | null)[];

  @Column({ type: "jsonb", name: "lmax_db", nullable: true })
  lmaxDb!: (number | null)[] | null;

  @Column({ type: "jsonb", name: "l10_db", nullable: true })
  l10Db!: (number | null)[] | null;

  @Column({ type: "jsonb", name: "l90_db", nullable: true })
  l90Db!: (number | null)[] | null;

  @Column({ type: "jsonb", name: "summary", nullable: true })
  summary!: Record<string, number | null> | null;

  @Column({ type: "jsonb", name: "time_history", nullable: true })
  timeHistory!: Record<string, unknown> | null;

  @Column({ type: "jsonb", name: "events", nullable: true })
  events!: Record<string, unknown>[] | null;

  /** How the events were found (margin and minimum duration). */
  @Column({ type: "jsonb", name: "event_settings", nullable: true })
  eventSettings!: { marginDb: number; minDurationS: number } | null;

  @Column({ type: "uuid", name: "file_id", nullable: true })
  fileId!: string | null;

  @ManyToOne(() => StoredFile, { onDelete: "SET NULL" })
  @JoinColumn({ name: "file_id" })
  file?: StoredFile | null;

  @Column({ type: "uuid", name: "created_by", nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
