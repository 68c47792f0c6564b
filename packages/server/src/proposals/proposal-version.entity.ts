import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn } from "typeorm";
import { StoredFile } from "../files/stored-file.entity.js";
import { ProposalRow } from "./proposal.entity.js";

/** One version of a proposal: a frozen copy of what the client reads, and its PDF once rendered. */
@Entity({ name: "proposal_versions" })
export class ProposalVersionRow {
  @PrimaryColumn({ type: "uuid", name: "proposal_id" })
  proposalId!: string;

  @ManyToOne(() => ProposalRow, { onDelete: "CASCADE" })
  @JoinColumn({ name: "proposal_id" })
  proposal?: ProposalRow;

  @PrimaryColumn({ type: "integer", name: "version" })
  version!: number;

  @Column({ type: "jsonb", name: "content" })
  content!: Record<string, unknown>;

  /** The scenario's setup and upgrades as they were (the PDF draws the plan after them). */
  @Column({ type: "jsonb", name: "scenario_snapshot" })
  scenarioSnapshot!: { setup: Record<string, unknown>; items: { priceBookItemId: string; elementId: string }[] };

  /** The plan document the proposal was made on (the PDF draws it). */
  @Column({ type: "jsonb", name: "plan_document" })
  planDocument!: Record<string, unknown>;

  @Column({ type: "timestamptz", name: "sent_at", nullable: true })
  sentAt!: Date | null;

  @Column({ type: "uuid", name: "sent_by", nullable: true })
  sentById!: string | null;

  @Column({ type: "varchar", length: 10, name: "pdf_status", default: "pending" })
  pdfStatus!: string;

  /** The rendered PDF in object storage (a `stored_files` record), once the job has made it. */
  @Column({ type: "uuid", name: "pdf_file_id", nullable: true })
  pdfFileId!: string | null;

  @ManyToOne(() => StoredFile, { onDelete: "SET NULL" })
  @JoinColumn({ name: "pdf_file_id" })
  pdfFile?: StoredFile;

  @Column({ type: "text", name: "pdf_error", nullable: true })
  pdfError!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
