import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
import { StoredFile } from "../files/stored-file.entity.js";
import { ProposalRow } from "../proposals/proposal.entity.js";

/** Measured levels before and after the work at the receiver, kept with the proposal's prediction. */
@Entity({ name: "verifications" })
@Index("ix_verifications_proposal", ["proposalId"])
export class VerificationRow {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Column({ type: "uuid", name: "project_id" })
  projectId!: string;

  @Column({ type: "uuid", name: "proposal_id" })
  proposalId!: string;

  @ManyToOne(() => ProposalRow, { onDelete: "CASCADE" })
  @JoinColumn({ name: "proposal_id" })
  proposal?: ProposalRow;

  @Column({ type: "jsonb", name: "before_levels_db" })
  beforeLevelsDb!: number[];

  @Column({ type: "jsonb", name: "after_levels_db" })
  afterLevelsDb!: number[];

  @Column({ type: "text", name: "note", default: "" })
  note!: string;

  /** The closing report in object storage, made on its first download (a verification does not change). */
  @Column({ type: "uuid", name: "report_file_id", nullable: true })
  reportFileId!: string | null;

  @ManyToOne(() => StoredFile, { onDelete: "SET NULL" })
  @JoinColumn({ name: "report_file_id" })
  reportFile?: StoredFile;

  @Column({ type: "uuid", name: "created_by" })
  createdById!: string;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
