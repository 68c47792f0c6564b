import type { DataSource, EntityManager } from "typeorm";
import { AuditEvent } from "../entities/index.js";

export interface AuditEntry {
  organizationId: string | null;
  actorUserId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  data?: Record<string, unknown>;
}

/** Records who did what to which record, inside the caller's transaction when one is given. */
export async function recordAudit(db: DataSource | EntityManager, entry: AuditEntry): Promise<void> {
  await db.getRepository(AuditEvent).insert({ ...entry, data: (entry.data ?? {}) as never });
}
