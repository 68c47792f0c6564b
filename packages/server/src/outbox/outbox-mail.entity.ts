import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

export type OutboxMailStatus = "pending" | "sent" | "failed";

/**
 * One e-mail to send, written in the same transaction as the change it reports (a rolled-back
 * change leaves no mail, a committed one always has its mail). The key makes a repeated webhook or
 * job queue one mail; the drain sends pending rows and records the outcome here.
 */
@Entity({ name: "outbox_mails" })
@Index("ix_outbox_mails_due", ["status", "nextAttemptAt"])
export class OutboxMail {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  /** The firm the mail belongs to; null for account mail (password reset) that has no firm. */
  @Column({ type: "uuid", name: "organization_id", nullable: true })
  organizationId!: string | null;

  @Column({ type: "varchar", length: 40, name: "kind" })
  kind!: string;

  @Index("ux_outbox_mails_key", { unique: true })
  @Column({ type: "varchar", length: 200, name: "idempotency_key" })
  idempotencyKey!: string;

  @Column({ type: "varchar", length: 254, name: "to_address" })
  toAddress!: string;

  @Column({ type: "varchar", length: 300, name: "subject" })
  subject!: string;

  @Column({ type: "text", name: "text_body" })
  textBody!: string;

  @Column({ type: "text", name: "html_body", nullable: true })
  htmlBody!: string | null;

  @Column({ type: "varchar", length: 10, name: "status", default: "pending" })
  status!: OutboxMailStatus;

  @Column({ type: "integer", name: "attempts", default: 0 })
  attempts!: number;

  @Column({ type: "text", name: "last_error", nullable: true })
  lastError!: string | null;

  /** A pending row is not tried again before this (the backoff after a failed send). */
  @Column({ type: "timestamptz", name: "next_attempt_at", default: () => "now()" })
  nextAttemptAt!: Date;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @Column({ type: "timestamptz", name: "sent_at", nullable: true })
  sentAt!: Date | null;
}
