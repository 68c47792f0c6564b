import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from "typeorm";
import type { Role } from "@hushmark/schemas";
import { Organization } from "./organization.entity.js";
import { User } from "./user.entity.js";

/** A user's role within one firm. */
@Entity({ name: "memberships" })
@Index("uq_memberships_user_org", ["userId", "organizationId"], { unique: true })
export class Membership {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  @Column({ type: "uuid", name: "user_id" })
  userId!: string;

  @ManyToOne(() => User, { onDelete: "CASCADE" })
  @JoinColumn({ name: "user_id" })
  user?: User;

  @Index("ix_memberships_org")
  @Column({ type: "uuid", name: "organization_id" })
  organizationId!: string;

  @ManyToOne(() => Organization, { onDelete: "CASCADE" })
  @JoinColumn({ name: "organization_id" })
  organization?: Organization;

  @Column({ type: "varchar", length: 16 })
  role!: Role;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
