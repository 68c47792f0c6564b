import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** Who did what to which record. Kept even when the record goes away. */
@Entity({ name: "audit_events" })
@Index("ix_audit_events_org_time", ["organizationId", "createdAt"])
export class AuditEvent {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "organization_id", nullable: true })
  organizationId!: string | null;

  @Column({ type: "uuid", name: "actor_user_id", nullable: true })
  actorUserId!: string | null;

  @Column({ type: "varchar", length: 64 })
  action!: string;

  @Column({ type: "varchar", length: 40, name: "entity_type" })
  entityType!: string;

  @Column({ type: "varchar", length: 64, name: "entity_id", nullable: true })
  entityId!: string | null;

  @Column({ type: "jsonb" })
  data!: Record<string, unknown>;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
