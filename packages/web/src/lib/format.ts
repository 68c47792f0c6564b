import type { ProjectStatus, Role } from "@hushmark/schemas";

export const roleLabels: Record<Role, string> = {
  owner: "Owner",
  surveyor: "Surveyor",
  planner: "Planner",
  client: "Client",
};

export const roleDescriptions: Record<Role, string> = {
  owner: "Runs the firm: people, prices and settings",
  surveyor: "Sketches plans on site and records measurements",
  planner: "Builds upgrade options and prices proposals",
  client: "Sees their own projects, comments and approves",
};

export const statusLabels: Record<ProjectStatus, string> = {
  brief: "Brief",
  survey: "Survey",
  diagnosis: "Diagnosis",
  proposal: "Proposal",
  approved: "Approved",
  in_progress: "In progress",
  verified: "Verified",
  archived: "Archived",
};

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });
const dateTimeFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });

export function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? "—" : dateFormat.format(date);
}

export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? "—" : dateTimeFormat.format(date);
}
