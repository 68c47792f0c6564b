import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

describe("a project's site location for map exports", () => {
  let h: Harness;
  let owner: supertest.Agent;
  let planner: supertest.Agent;
  let projectId: string;

  beforeAll(async () => {
    h = await startHarness();
    owner = (await newFirm(h)).agent;
    planner = (await addMember(h, owner, "surveyor")).agent;
    projectId = (await owner.post("/api/v1/projects").send({ title: "Mill Lane flats", siteAddress: "4 Mill Lane" })).body.id;
  });
  afterAll(async () => h.close());

  it("has none until it is set", async () => {
    const got = await owner.get(`/api/v1/projects/${projectId}`);
    expect(got.status).toBe(200);
    expect(got.body.site).toBeNull();
  });

  it("keeps latitude, longitude and the bearing of plan north, and the bearing defaults to 0", async () => {
    const set = await planner.patch(`/api/v1/projects/${projectId}`).send({ site: { latDeg: 51.4545, lonDeg: -2.5879, planNorthBearingDeg: 12.5 } });
    expect(set.status).toBe(200);
    expect(set.body.site).toEqual({ latDeg: 51.4545, lonDeg: -2.5879, planNorthBearingDeg: 12.5 });
    const again = await owner.get(`/api/v1/projects/${projectId}`);
    expect(again.body.site).toEqual({ latDeg: 51.4545, lonDeg: -2.5879, planNorthBearingDeg: 12.5 });
    const noBearing = await planner.patch(`/api/v1/projects/${projectId}`).send({ site: { latDeg: -33.86, lonDeg: 151.21 } });
    expect(noBearing.body.site).toEqual({ latDeg: -33.86, lonDeg: 151.21, planNorthBearingDeg: 0 });
  });

  it("leaves the site alone when other fields change, and clears it with null", async () => {
    const renamed = await planner.patch(`/api/v1/projects/${projectId}`).send({ title: "Mill Lane flats, rear" });
    expect(renamed.body.site).toEqual({ latDeg: -33.86, lonDeg: 151.21, planNorthBearingDeg: 0 });
    const cleared = await planner.patch(`/api/v1/projects/${projectId}`).send({ site: null });
    expect(cleared.body.site).toBeNull();
    expect(cleared.body.title).toBe("Mill Lane flats, rear");
  });

  it("refuses a latitude off the globe without changing what is stored", async () => {
    await planner.patch(`/api/v1/projects/${projectId}`).send({ site: { latDeg: 10, lonDeg: 20 } });
    const bad = await planner.patch(`/api/v1/projects/${projectId}`).send({ site: { latDeg: 120, lonDeg: 20 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0]).toMatchObject({ path: "site.latDeg", message: expect.stringMatching(/−90° and 90°/) });
    const half = await planner.patch(`/api/v1/projects/${projectId}`).send({ site: { latDeg: 10 } });
    expect(half.status).toBe(400);
    expect((await owner.get(`/api/v1/projects/${projectId}`)).body.site).toEqual({ latDeg: 10, lonDeg: 20, planNorthBearingDeg: 0 });
  });
});
