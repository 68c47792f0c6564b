import { existsSync, readFileSync } from "node:fs";
import type { DataSource } from "typeorm";
import { parseSpectrumCsv } from "@hushmark/acoustics";
import { BRIEF_FORMAT_VERSION, briefSchema, type BriefInput, type MeasurementKind } from "@hushmark/schemas";
import { Plan } from "../entities/index.js";
import { ProjectBrief } from "../intake/project-brief.entity.js";
import { Measurement } from "./measurement.entity.js";

interface DemoReading {
  file: string;
  label: string;
  kind: MeasurementKind;
  roomId: string | null;
  takenAt: string;
  device: string;
}

// Invented briefs and readings for the demo projects; the band levels are the made-up files in examples/measurements.
const DEMO: { title: string; brief: BriefInput; readings: DemoReading[] }[] = [
  {
    title: "Fernhollow Audio — podcast studio",
    brief: {
      noises: [
        { id: "condenser", kind: "machinery_hum", where: "café refrigeration condenser on the shared back wall", direction: "keep_out", times: ["daytime", "evening", "night"], days: [], seasons: ["summer"], note: "Cycles on and off all night; worst in warm weather." },
        { id: "grinder", kind: "machinery_hum", where: "café grinder and counter through the party wall", direction: "keep_out", times: ["morning", "daytime"], days: ["mon", "tue", "wed", "thu", "fri", "sat"], seasons: [], note: "" },
        { id: "dance", kind: "impact", where: "dance school rehearsals on the floor above", direction: "keep_out", times: ["evening"], days: ["mon", "wed", "thu"], seasons: [], note: "Tap classes on Wednesdays." },
        { id: "tram", kind: "traffic", where: "tram wheels squealing past the shopfront glazing", direction: "keep_out", times: ["morning", "daytime", "evening"], days: [], seasons: [], note: "" },
      ],
      receivingRoom: "Recording room",
      target: { kind: "nc", nc: 20 },
      budget: { amount: 18000, currency: "EUR" },
      accepts: { liningDepth: { value: 8, unit: "cm" }, daylight: true, ventilation: false, doorLook: true, structuralWork: false, neighbourAccess: false, tenure: "tenant" },
      notes: "Tenant: the lease allows linings and a new door but no work on the structure or the café's side.",
    },
    readings: [
      { file: "fernhollow-cafe-morning.csv", label: "Café counter, morning rush", kind: "source_side", roomId: "cafe", takenAt: "2026-04-14T08:40:00Z", device: "Class 1 meter" },
      { file: "fernhollow-recording-room-night.csv", label: "Recording room, night", kind: "receiver_side", roomId: "record", takenAt: "2026-04-14T23:10:00Z", device: "Class 1 meter" },
      { file: "fernhollow-back-room-condenser.csv", label: "Back room by the condenser", kind: "source_side", roomId: "back", takenAt: "2026-04-14T23:30:00Z", device: "Class 1 meter" },
      { file: "fernhollow-pavement-tram.csv", label: "Pavement, tram passing", kind: "background", roomId: null, takenAt: "2026-04-15T07:50:00Z", device: "Class 1 meter" },
    ],
  },
  {
    title: "Berg residence — basement cinema under the nursery",
    brief: {
      noises: [{ id: "film", kind: "music_bass", where: "home cinema in the basement, subwoofer on the nursery side", direction: "keep_in", times: ["evening", "night"], days: ["fri", "sat"], seasons: [], note: "Films after the children's bedtime." }],
      receivingRoom: "Nursery",
      target: { kind: "level", levelDba: 30 },
      budget: { amount: 25000, currency: "EUR" },
      accepts: { liningDepth: { value: 4, unit: "in" }, daylight: false, ventilation: false, doorLook: true, structuralWork: true, neighbourAccess: false, tenure: "owner" },
      notes: "",
    },
    readings: [
      { file: "cinema-during-film.csv", label: "Cinema during a film", kind: "source_side", roomId: "cinema", takenAt: "2026-04-18T20:30:00Z", device: "Class 1 meter" },
      { file: "nursery-during-film.csv", label: "Nursery during the same film", kind: "receiver_side", roomId: "nursery", takenAt: "2026-04-18T20:35:00Z", device: "Class 1 meter" },
    ],
  },
];

function roomCentre(document: Record<string, unknown>, roomId: string | null): { x: number; y: number } | null {
  const room = roomId ? (document.elements as Record<string, { outline?: { x: number; y: number }[] }> | undefined)?.[roomId] : undefined;
  const pts = room?.outline ?? [];
  return pts.length ? { x: pts.reduce((s, p) => s + p.x, 0) / pts.length, y: pts.reduce((s, p) => s + p.y, 0) / pts.length } : null;
}

/** Gives the demo projects their brief and measurements once (also on a database seeded before they existed). */
export async function seedDemoMeasurements(dataSource: DataSource, ownerEmail: string, examplesDir: string): Promise<void> {
  const rows: { organization_id: string; user_id: string }[] = await dataSource.query(
    "SELECT m.organization_id, m.user_id FROM memberships m JOIN users u ON u.id = m.user_id WHERE u.email = $1 AND m.role = 'owner' LIMIT 1",
    [ownerEmail],
  );
  const owner = rows[0];
  if (!owner) return;
  let added = 0;
  await dataSource.transaction(async (manager) => {
    for (const demo of DEMO) {
      const project: { id: string }[] = await manager.query("SELECT id FROM projects WHERE organization_id = $1 AND title = $2 LIMIT 1", [owner.organization_id, demo.title]);
      const projectId = project[0]?.id;
      if (!projectId) continue;
      if (!(await manager.getRepository(ProjectBrief).existsBy({ projectId }))) {
        await manager.getRepository(ProjectBrief).insert({ projectId, version: 1, formatVersion: BRIEF_FORMAT_VERSION, brief: briefSchema.parse(demo.brief) as never, updatedById: owner.user_id });
      }
      if (await manager.getRepository(Measurement).existsBy({ projectId })) continue;
      const plan = await manager.getRepository(Plan).findOneBy({ projectId });
      for (const r of demo.readings) {
        const file = `${examplesDir}measurements/${r.file}`;
        if (!existsSync(file)) continue;
        const parsed = parseSpectrumCsv(readFileSync(file, "utf8"));
        if (!parsed.ok) throw new Error(`demo measurement ${r.file}: ${parsed.problems.map((p) => `line ${p.line}: ${p.reason}`).join("; ")}`);
        await manager.getRepository(Measurement).insert({
          organizationId: owner.organization_id, projectId, label: r.label, kind: r.kind, source: "csv", status: "ready", progress: 1, error: null,
          takenAt: new Date(r.takenAt), roomId: r.roomId, point: plan ? roomCentre(plan.document, r.roomId) : null, device: r.device, calibrationDb: 0,
          leqDb: parsed.leqDb, lmaxDb: parsed.lmaxDb, fileId: null, createdById: owner.user_id,
        });
        added += 1;
      }
    }
  });
  if (added) console.log(`demo data: ${added} measurements and the briefs`);
}
