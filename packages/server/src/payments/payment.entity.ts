import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, PrimaryGeneratedColumn } from "typeorm";
import { ProposalRow } from "../proposals/proposal.entity.js";

/** A deposit asked through the payment service for one proposal version. */
@Entity({ name: "payments" })
@Index("ix_payments_proposal", ["proposalId"])
export class PaymentRow {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @Column({ type: "uuid", name: "proposal_id" })
  proposalId!: string;

  @ManyToOne(() => ProposalRow, { onDelete: "CASCADE" })
  @JoinColumn({ name: "proposal_id" })
  proposal?: ProposalRow;

  @Column({ type: "integer", name: "version" })
  version!: number;

  @Index("ux_payments_checkout_session", { unique: true })
  @Column({ type: "varchar", length: 255, name: "checkout_session_id" })
  checkoutSessionId!: string;

  @Column({ type: "integer", name: "amount_minor" })
  amountMinor!: number;

  @Column({ type: "varchar", length: 3, name: "currency" })
  currency!: string;

  @Column({ type: "varchar", length: 10, name: "status", default: "pending" })
  status!: string;

  @Column({ type: "text", name: "failure_message", nullable: true })
  failureMessage!: string | null;

  @Column({ type: "uuid", name: "requested_by" })
  requestedById!: string;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @Column({ type: "timestamptz", name: "paid_at", nullable: true })
  paidAt!: Date | null;
}

/** Webhook events already handled, so a repeated delivery changes nothing. */
@Entity({ name: "payment_events" })
export class PaymentEventRow {
  @PrimaryColumn({ type: "varchar", length: 255, name: "event_id" })
  eventId!: string;

  @Column({ type: "varchar", length: 80, name: "type" })
  type!: string;

  @Column({ type: "uuid", name: "payment_id", nullable: true })
  paymentId!: string | null;

  @CreateDateColumn({ type: "timestamptz", name: "received_at" })
  receivedAt!: Date;
}
