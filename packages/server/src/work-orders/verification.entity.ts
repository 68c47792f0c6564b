import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
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

  @Column({ type: "uuid", name: "created_by" })
  createdById!: string;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
