import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
import { ProposalRow } from "./proposal.entity.js";

/** A comment on a proposal, a request for changes or an approval: who and when. */
@Entity({ name: "proposal_comments" })
@Index("ix_proposal_comments_proposal", ["proposalId"])
export class ProposalCommentRow {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "proposal_id" })
  proposalId!: string;

  @ManyToOne(() => ProposalRow, { onDelete: "CASCADE" })
  @JoinColumn({ name: "proposal_id" })
  proposal?: ProposalRow;

  @Column({ type: "integer", name: "version" })
  version!: number;

  @Column({ type: "varchar", length: 20, name: "kind" })
  kind!: string;

  @Column({ type: "text", name: "body" })
  body!: string;

  @Column({ type: "uuid", name: "author_user_id" })
  authorUserId!: string;

  @Column({ type: "varchar", length: 200, name: "author_name" })
  authorName!: string;

  @Column({ type: "varchar", length: 20, name: "author_role" })
  authorRole!: string;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
