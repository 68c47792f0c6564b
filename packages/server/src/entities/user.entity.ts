import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";

/** A person who can sign in; may belong to several firms through memberships. */
@Entity({ name: "users" })
export class User {
  @PrimaryGeneratedColumn("uuid")
  id!: string;

  /** Stored lower-case; unique across the whole service. */
  @Index("uq_users_email", { unique: true })
  @Column({ type: "varchar", length: 254 })
  email!: string;

  @Column({ type: "varchar", length: 120, name: "display_name" })
  displayName!: string;

  /** argon2id PHC string. */
  @Column({ type: "varchar", length: 255, name: "password_hash" })
  passwordHash!: string;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;

  @UpdateDateColumn({ type: "timestamptz", name: "updated_at" })
  updatedAt!: Date;
}
