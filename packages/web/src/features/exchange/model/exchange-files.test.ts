import { describe, expect, it } from "vitest";
import { cinemaUnderNurseryPlan, dxfSurvey, fernhollowStudioPlan, parsePlan } from "@hushmark/floorplan";
import { dxfFile, geoJsonFile, planDocumentFile, scheduleFile } from "./exchange-files";

describe("export files", () => {
  const plan = fernhollowStudioPlan();
  it("names files after the project and level and fills them with the level asked for", () => {
    const dxf = dxfFile(plan, "first", "Fernhollow Audio — studio");
    expect(dxf.fileName).toBe("fernhollow-audio-studio-first-floor.dxf");
    const survey = dxfSurvey(dxf.text);
    expect(survey.ok && survey.layers.find((l) => l.name === "rooms")?.entities).toBe(1);
    const geo = geoJsonFile(plan, "ground", "Fernhollow Audio");
    expect(geo.frame).toBe("local");
    const fc = JSON.parse(geo.text) as { hushmark: { levelId: string }; features: unknown[] };
    expect(fc.hushmark.levelId).toBe("ground");
    expect(fc.features.length).toBeGreaterThan(5);
  });

  it("writes a schedule with a header and a plan document that reads back", () => {
    const csv = scheduleFile(cinemaUnderNurseryPlan(), "Cinema");
    expect(csv.text.split("\r\n")[0]).toMatch(/^level,kind,id,name/);
    const doc = planDocumentFile(plan, "Fernhollow");
    const back = parsePlan(doc.text);
    expect(back.ok && back.plan.id).toBe("fernhollow-studio");
  });
});
