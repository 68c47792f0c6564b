import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
import { User } from "./user.entity.js";

/**
 * One refresh token. Rotation makes a new row in the same family and marks the old one used;
 * presenting a used token again revokes the family.
 */
@Entity({ name: "sessions" })
export class Session {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Index("ix_sessions_user")
  @Column({ type: "uuid", name: "user_id" })
  userId!: string;

  @ManyToOne(() => User, { onDelete: "CASCADE" })
  @JoinColumn({ name: "user_id" })
  user?: User;

  @Index("ix_sessions_family")
  @Column({ type: "uuid", name: "family_id" })
  familyId!: string;

  /** SHA-256 of the refresh token, hex. */
  @Index("uq_sessions_token_hash", { unique: true })
  @Column({ type: "char", length: 64, name: "token_hash" })
  tokenHash!: string;

  /** The membership the session acts in (the firm switcher changes it). */
  @Column({ type: "uuid", name: "membership_id" })
  membershipId!: string;

  @Column({ type: "timestamptz", name: "expires_at" })
  expiresAt!: Date;

  @Column({ type: "timestamptz", name: "used_at", nullable: true })
  usedAt!: Date | null;

  @Column({ type: "timestamptz", name: "revoked_at", nullable: true })
  revokedAt!: Date | null;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
