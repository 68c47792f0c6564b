import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
import type { Role } from "@hushmark/schemas";
import { Organization } from "./organization.entity.js";

/** An e-mailed invitation to join a firm with a role. */
@Entity({ name: "invitations" })
export class Invitation {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Index("ix_invitations_org")
  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @ManyToOne(() => Organization, { onDelete: "CASCADE" })
  @JoinColumn({ name: "organization_id" })
  organization?: Organization;

  @Column({ type: "varchar", length: 254 })
  email!: string;

  @Column({ type: "varchar", length: 16 })
  role!: Role;

  @Column({ type: "varchar", length: 120, name: "display_name", nullable: true })
  displayName!: string | null;

  @Index("uq_invitations_token_hash", { unique: true })
  @Column({ type: "char", length: 64, name: "token_hash" })
  tokenHash!: string;

  @Column({ type: "uuid", name: "invited_by", nullable: true })
  invitedById!: string | null;

  @Column({ type: "timestamptz", name: "expires_at" })
  expiresAt!: Date;

  @Column({ type: "timestamptz", name: "accepted_at", nullable: true })
  acceptedAt!: Date | null;

  @Column({ type: "timestamptz", name: "revoked_at", nullable: true })
  revokedAt!: Date | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
