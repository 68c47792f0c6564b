import { z } from "zod";

export const projectStatusSchema = z.enum(["brief", "survey", "diagnosis", "proposal", "approved", "in_progress", "verified", "archived"]);
export type ProjectStatus = z.infer<typeof projectStatusSchema>;

export const projectInputSchema = z.object({
  title: z.string().trim().min(2, "Give the project a title of at least 2 characters.").max(160, "A title is at most 160 characters."),
  siteAddress: z.string().trim().max(300, "An address is at most 300 characters.").default(""),
  status: projectStatusSchema.default("brief"),
});
export type ProjectInput = z.input<typeof projectInputSchema>;

export const projectUpdateSchema = projectInputSchema.partial();
export type ProjectUpdate = z.infer<typeof projectUpdateSchema>;

export const projectClientSchema = z.object({ membershipId: z.uuid(), displayName: z.string(), email: z.string() });

export const projectSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  siteAddress: z.string(),
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
