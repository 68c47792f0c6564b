import { CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from "typeorm";
import { Membership } from "./membership.entity.js";
import { Project } from "./project.entity.js";

/** Which client memberships may see a project. */
@Entity({ name: "project_clients" })
export class ProjectClient {
  @PrimaryColumn({ type: "uuid", name: "project_id" })
  projectId!: string;

  @ManyToOne(() => Project, { onDelete: "CASCADE" })
  @JoinColumn({ name: "project_id" })
  project?: Project;

  @Index("ix_project_clients_membership")
  @PrimaryColumn({ type: "uuid", name: "membership_id" })
  membershipId!: string;

  @ManyToOne(() => Membership, { onDelete: "CASCADE" })
  @JoinColumn({ name: "membership_id" })
  membership?: Membership;

  @CreateDateColumn({ type: "timestamptz", name: "created_at" })
  createdAt!: Date;
}
