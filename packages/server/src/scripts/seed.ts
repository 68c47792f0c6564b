// Seeds the demo firm once (`npm run -w @hushmark/server seed`); a second run changes nothing.
import "reflect-metadata";
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { hashPassword } from "../auth/passwords.js";
import { loadConfig } from "../config.js";
import { createDataSource } from "../data-source.js";
import { Membership, Organization, Plan, PlanRevision, Project, ProjectClient, User } from "../entities/index.js";
import { emptyPlanDocument } from "../plans/plan-documents.js";
import { DEMO_FIRM, DEMO_PASSWORD, DEMO_PEOPLE, DEMO_PROJECTS } from "./demo-data.js";
import { seedDemoPriceBook } from "../price-book/seed-price-book.js";
import { seedDemoMeasurements } from "../measurements/seed-demo-measurements.js";

const config = loadConfig();
const dataSource = createDataSource(config.databaseUrl, { poolSize: 2 });
await dataSource.initialize();
const examplesDir = fileURLToPath(new URL("../../../../examples/", import.meta.url));

const owner = DEMO_PEOPLE[0]!;
if (await dataSource.getRepository(User).exists({ where: { email: owner.email } })) {
  console.log(`demo data: already there (${DEMO_FIRM})`);
} else {
  const passwordHash = await hashPassword(DEMO_PASSWORD, config.argon2);
  await dataSource.transaction(async (manager) => {
    const firm = await manager.getRepository(Organization).save({ name: DEMO_FIRM });
    const memberships = new Map<string, Membership>();
    for (const person of DEMO_PEOPLE) {
      const user = await manager.getRepository(User).save({ email: person.email, displayName: person.displayName, passwordHash });
      memberships.set(person.email, await manager.getRepository(Membership).save({ userId: user.id, organizationId: firm.id, role: person.role }));
    }
    const ownerId = memberships.get(owner.email)!.userId;
    for (const demo of DEMO_PROJECTS) {
      const project = await manager.getRepository(Project).save({ organizationId: firm.id, title: demo.title, siteAddress: demo.siteAddress, status: demo.status });
      const file = `${examplesDir}${demo.planFile}`;
      const document = existsSync(file) ? (JSON.parse(readFileSync(file, "utf8")) as Record<string, unknown>) : emptyPlanDocument(demo.title);
      const version = existsSync(file) ? 1 : 0;
      await manager.getRepository(Plan).insert({ projectId: project.id, document: document as never, version, updatedById: ownerId });
      if (version) await manager.getRepository(PlanRevision).insert({ projectId: project.id, version, document: document as never, savedById: ownerId, message: "Demo plan" });
      await manager.getRepository(ProjectClient).insert({ projectId: project.id, membershipId: memberships.get(demo.client)!.id });
    }
  });
  console.log(`demo data: created ${DEMO_FIRM} with ${DEMO_PEOPLE.length} people and ${DEMO_PROJECTS.length} projects`);
}
await seedDemoPriceBook(dataSource, owner.email);
await seedDemoMeasurements(dataSource, owner.email, examplesDir);
await dataSource.destroy();
