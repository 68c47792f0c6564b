import { z } from "zod";

export const projectStatusSchema = z.enum(["brief", "survey", "diagnosis", "proposal", "approved", "in_progress", "verified", "archived"]);
export type ProjectStatus = z.infer<typeof projectStatusSchema>;

export const projectInputSchema = z.object({
  title: z.string().trim().min(2, "Give the project a title of at least 2 characters.").max(160, "A title is at most 160 characters."),
  siteAddress: z.string().trim().max(300, "An address is at most 300 characters.").default(""),
  status: projectStatusSchema.default("brief"),
});
export type ProjectInput = z.input<typeof projectInputSchema>;

/**
 * Where the site is, for map exports: WGS84 latitude and longitude of the plan origin, and the
 * bearing of the Sketch's up direction (plan +y) clockwise from true north, degrees.
 */
export const siteLocationSchema = z.object({
  latDeg: z.number({ error: "Give the latitude in degrees." }).finite().min(-90, "A latitude lies between −90° and 90°.").max(90, "A latitude lies between −90° and 90°."),
  lonDeg: z.number({ error: "Give the longitude in degrees." }).finite().min(-180, "A longitude lies between −180° and 180°.").max(180, "A longitude lies between −180° and 180°."),
  planNorthBearingDeg: z.number({ error: "Give the bearing in degrees." }).finite().min(0, "A bearing lies from 0° up to 360°.").lt(360, "A bearing lies from 0° up to 360°.").default(0),
});
export type SiteLocation = z.infer<typeof siteLocationSchema>;

/** A project's changes; `site: null` clears the site location. */
export const projectUpdateSchema = projectInputSchema.partial().extend({ site: siteLocationSchema.nullable().optional() });
export type ProjectUpdate = z.infer<typeof projectUpdateSchema>;

export const projectClientSchema = z.object({ membershipId: z.uuid(), displayName: z.string(), email: z.string() });

export const projectSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  siteAddress: z.string(),
  /** Null until someone sets it; map exports then use the documented local frame. */
  site: siteLocationSchema.nullable().optional(),
  status: projectStatusSchema,
  clients: z.array(projectClientSchema),
  planVersion: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Project = z.infer<typeof projectSchema>;

export const projectListSchema = z.object({ projects: z.array(projectSchema) });

export const addProjectClientSchema = z.object({ membershipId: z.uuid("Pick a client.") });

export const idParamSchema = z.object({ id: z.uuid("That id is not valid.") });
export const projectIdParamSchema = z.object({ projectId: z.uuid("That project id is not valid.") });
