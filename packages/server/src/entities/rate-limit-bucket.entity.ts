import { Column, Entity, PrimaryColumn } from "typeorm";

/** A fixed-window counter shared by every server process (sign-in and reset limits). */
@Entity({ name: "rate_limit_buckets" })
export class RateLimitBucket {
  @PrimaryColumn({ type: "varchar", length: 300 })
  key!: string;

  @Column({ type: "integer", default: 0 })
  hits!: number;

  @Column({ type: "timestamptz", name: "reset_at" })
  resetAt!: Date;
}
