import { AnalysisCache } from "./analysis-cache.entity.js";
import { AuditEvent } from "./audit-event.entity.js";
import { FirmConstruction } from "./firm-construction.entity.js";
import { Invitation } from "./invitation.entity.js";
import { Membership } from "./membership.entity.js";
import { Organization } from "./organization.entity.js";
import { PasswordReset } from "./password-reset.entity.js";
import { PlanRevision } from "./plan-revision.entity.js";
import { Plan } from "./plan.entity.js";
import { ProjectClient } from "./project-client.entity.js";
import { Project } from "./project.entity.js";
import { RateLimitBucket } from "./rate-limit-bucket.entity.js";
import { Session } from "./session.entity.js";
import { User } from "./user.entity.js";
import { ProjectBrief } from "../intake/project-brief.entity.js";
import { StoredFile } from "../files/stored-file.entity.js";
import { Measurement } from "../measurements/measurement.entity.js";
import { Photo } from "../measurements/photo.entity.js";
import { moneyEntities } from "../money/entities.js";
import { UnderlayFile } from "../underlays/underlay-file.entity.js";
import { OutboxMail } from "../outbox/outbox-mail.entity.js";

export {
  AnalysisCache, AuditEvent, FirmConstruction, Invitation, Membership, Organization, PasswordReset, Plan, PlanRevision, Project, ProjectClient, RateLimitBucket, Session, User,
};

/** Every entity, for the DataSource. */
export const entities = [
  Organization, User, Membership, Project, ProjectClient, Plan, PlanRevision, AuditEvent, Session, Invitation, PasswordReset, RateLimitBucket,
  AnalysisCache, FirmConstruction, ProjectBrief, StoredFile, Measurement, Photo, UnderlayFile, OutboxMail, ...moneyEntities,
];
