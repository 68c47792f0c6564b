// The invented demo firm, its people and projects. Names, firms and addresses are made up.
import type { Role } from "@hushmark/schemas";

export const DEMO_PASSWORD = "quiet-demo-2026";
export const DEMO_FIRM = "Larkspur Sound Control";

export const DEMO_PEOPLE: { email: string; displayName: string; role: Role }[] = [
  { email: "owner@larkspur.example", displayName: "Imogen Hale", role: "owner" },
  { email: "surveyor@larkspur.example", displayName: "Tomás Reyes", role: "surveyor" },
  { email: "planner@larkspur.example", displayName: "Priya Nandakumar", role: "planner" },
  { email: "client@fernhollow.example", displayName: "Dana Whitlock (Fernhollow Audio)", role: "client" },
  { email: "client@bergfamily.example", displayName: "Elin Berg", role: "client" },
];

export const DEMO_PROJECTS: { title: string; siteAddress: string; status: "survey" | "diagnosis"; client: string; planFile: string }[] = [
  {
    title: "Fernhollow Audio — podcast studio",
    siteAddress: "Unit 2, 14 Tannery Row, Eastbridge",
    status: "diagnosis",
    client: "client@fernhollow.example",
    planFile: "fernhollow-studio.plan.json",
  },
  {
    title: "Berg residence — basement cinema under the nursery",
    siteAddress: "7 Orchard Close, Millbrook",
    status: "survey",
    client: "client@bergfamily.example",
    planFile: "cinema-under-nursery.plan.json",
  },
];
