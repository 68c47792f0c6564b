import { z } from "zod";

/** Roles within a firm. */
export const roleSchema = z.enum(["owner", "surveyor", "planner", "client"]);
export type Role = z.infer<typeof roleSchema>;
export const ROLES = roleSchema.options;

/** Roles that work for the firm (everyone but clients). */
export const STAFF_ROLES: readonly Role[] = ["owner", "surveyor", "planner"];
