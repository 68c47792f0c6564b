import { STAFF_ROLES, type Role } from "@hushmark/schemas";

// Mirrors the server's role matrix so screens hide what the server would refuse anyway;
// the server stays the authority.
export const can = {
  createProjects: (role: Role) => role === "owner" || role === "surveyor",
  managePeople: (role: Role) => role === "owner",
  seeAllSections: (role: Role) => STAFF_ROLES.includes(role),
};
