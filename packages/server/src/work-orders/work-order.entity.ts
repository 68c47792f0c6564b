import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import { ProposalRow } from "../proposals/proposal.entity.js";

/** The work for one upgrade of an approved proposal: element, materials, steps and cautions. */
@Entity({ name: "work_orders" })
@Index("ix_work_orders_project", ["projectId"])
export class WorkOrderRow {
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

  @Column({ type: "integer", name: "position" })
  position!: number;

  @Column({ type: "varchar", length: 200, name: "title" })
  title!: string;

  @Column({ type: "varchar", length: 200, name: "element_id" })
  elementId!: string;

  @Column({ type: "varchar", length: 200, name: "element_name" })
  elementName!: string;

  @Column({ type: "jsonb", name: "materials" })
  materials!: { name: string; quantity: number; unit: string }[];

  @Column({ type: "jsonb", name: "steps" })
  steps!: string[];

  @Column({ type: "jsonb", name: "cautions" })
  cautions!: { code: string; text: string }[];

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}

/** One checklist item of a work order. */
@Entity({ name: "work_order_tasks" })
@Index("ix_work_order_tasks_order", ["workOrderId"])
export class WorkOrderTaskRow {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "work_order_id" })
  workOrderId!: string;

  @ManyToOne(() => WorkOrderRow, { onDelete: "CASCADE" })
  @JoinColumn({ name: "work_order_id" })
  workOrder?: WorkOrderRow;

  @Column({ type: "integer", name: "position" })
  position!: number;

  @Column({ type: "text", name: "text" })
  text!: string;

  @Column({ type: "varchar", length: 10, name: "status", default: "todo" })
  status!: string;

  @Column({ type: "uuid", name: "assignee_membership_id", nullable: true })
  assigneeMembershipId!: string | null;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
