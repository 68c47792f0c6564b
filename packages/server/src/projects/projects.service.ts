import type { DataSource } from "typeorm";
import { projectInputSchema, type Project as ProjectDto, type ProjectUpdate, STAFF_ROLES } from "@hushmark/schemas";
import type { z } from "zod";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import { Membership, Plan, Project, ProjectClient } from "../entities/index.js";
import { HttpError, notFound } from "../http/errors.js";

interface ProjectRow {
  id: string;
  title: string;
  site_address: string;
  site_lat_deg: number | null;
  site_lon_deg: number | null;
  plan_north_bearing_deg: number | null;
  status: ProjectDto["status"];
  created_at: Date;
  updated_at: Date;
  plan_version: number | null;
  clients: { membershipId: string; displayName: string; email: string }[] | null;
}

const PROJECT_SQL = `
  SELECT p.id, p.title, p.site_address, p.site_lat_deg, p.site_lon_deg, p.plan_north_bearing_deg, p.status, p.created_at, p.updated_at, pl.version AS plan_version,
    (SELECT json_agg(json_build_object('membershipId', m.id, 'displayName', u.display_name, 'email', u.email) ORDER BY u.display_name)
       FROM project_clients pc JOIN memberships m ON m.id = pc.membership_id JOIN users u ON u.id = m.user_id
      WHERE pc.project_id = p.id) AS clients
  FROM projects p LEFT JOIN plans pl ON pl.project_id = p.id
  WHERE p.organization_id = $1`;

const CLIENT_FILTER = ` AND EXISTS (SELECT 1 FROM project_clients pc WHERE pc.project_id = p.id AND pc.membership_id = $2)`;

function toDto(row: ProjectRow): ProjectDto {
  return {
    id: row.id,
    title: row.title,
    siteAddress: row.site_address,
    site: row.site_lat_deg !== null && row.site_lon_deg !== null
      ? { latDeg: row.site_lat_deg, lonDeg: row.site_lon_deg, planNorthBearingDeg: row.plan_north_bearing_deg ?? 0 }
      : null,
    status: row.status,
    clients: row.clients ?? [],
    planVersion: row.plan_version ?? 0,
    createdAt: new Date(row.created_at).toISOString(),
    updatedAt: new Date(row.updated_at).toISOString(),
  };
}

/** The plan document a new project starts with; replaced by the plan model's empty plan once it exists. */
export type EmptyPlanFactory = (title: string) => Record<string, unknown>;

/** Projects of a firm. Every query filters by the caller's firm; clients see only their own projects. */
export function createProjectsService(dataSource: DataSource, emptyPlan: EmptyPlanFactory) {
  const isStaff = (actor: Actor) => STAFF_ROLES.includes(actor.role);

  async function list(actor: Actor): Promise<ProjectDto[]> {
    const sql = `${PROJECT_SQL}${isStaff(actor) ? "" : CLIENT_FILTER} ORDER BY p.updated_at DESC`;
    const rows: ProjectRow[] = await dataSource.query(sql, isStaff(actor) ? [actor.organizationId] : [actor.organizationId, actor.membershipId]);
    return rows.map(toDto);
  }

  /** The project if the caller may see it; 404 otherwise (also for other firms' projects). */
  async function get(actor: Actor, id: string): Promise<ProjectDto> {
    const filter = isStaff(actor) ? "" : CLIENT_FILTER.replace("$2", "$3");
    const params = isStaff(actor) ? [actor.organizationId, id] : [actor.organizationId, id, actor.membershipId];
    const rows: ProjectRow[] = await dataSource.query(`${PROJECT_SQL} AND p.id = $2${filter}`, params);
    const row = rows[0];
    if (!row) throw notFound("That project");
    return toDto(row);
  }

  async function create(actor: Actor, input: z.infer<typeof projectInputSchema>): Promise<ProjectDto> {
    const id = await dataSource.transaction(async (manager) => {
      const project = await manager.getRepository(Project).save({ organizationId: actor.organizationId, title: input.title, siteAddress: input.siteAddress, status: input.status });
      await manager.getRepository(Plan).insert({ projectId: project.id, document: emptyPlan(input.title) as never, version: 0, updatedById: actor.userId });
      await recordAudit(manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "project.created", entityType: "project", entityId: project.id, data: { title: input.title } });
      return project.id;
    });
    return get(actor, id);
  }

  async function update(actor: Actor, id: string, patch: ProjectUpdate): Promise<ProjectDto> {
    await get(actor, id);
    const { site, ...rest } = patch;
    const changes: Partial<Pick<Project, "title" | "siteAddress" | "status" | "siteLatDeg" | "siteLonDeg" | "planNorthBearingDeg">> = Object.fromEntries(Object.entries(rest).filter(([, v]) => v !== undefined));
    // The three site columns change together: a site is set whole or cleared whole.
    if (site !== undefined) Object.assign(changes, { siteLatDeg: site?.latDeg ?? null, siteLonDeg: site?.lonDeg ?? null, planNorthBearingDeg: site?.planNorthBearingDeg ?? null });
    if (Object.keys(changes).length) {
      await dataSource.getRepository(Project).update({ id, organizationId: actor.organizationId }, changes);
      await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "project.updated", entityType: "project", entityId: id, data: changes });
    }
    return get(actor, id);
  }

  async function addClient(actor: Actor, id: string, membershipId: string): Promise<ProjectDto> {
    await get(actor, id);
    const membership = await dataSource.getRepository(Membership).findOne({ where: { id: membershipId, organizationId: actor.organizationId } });
    if (!membership) throw notFound("That person");
    if (membership.role !== "client") throw new HttpError(400, "invalid_input", "Only people with the client role can be a project's client.", [{ path: "membershipId", message: "Pick someone with the client role." }]);
    await dataSource.getRepository(ProjectClient).upsert({ projectId: id, membershipId }, ["projectId", "membershipId"]);
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "project.client_added", entityType: "project", entityId: id, data: { membershipId } });
    return get(actor, id);
  }

  async function removeClient(actor: Actor, id: string, membershipId: string): Promise<ProjectDto> {
    await get(actor, id);
    await dataSource.getRepository(ProjectClient).delete({ projectId: id, membershipId });
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "project.client_removed", entityType: "project", entityId: id, data: { membershipId } });
    return get(actor, id);
  }

  return { list, get, create, update, addClient, removeClient };
}

export type ProjectsService = ReturnType<typeof createProjectsService>;
