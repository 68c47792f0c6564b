import type { Measurement as MeasurementDto, MeasurementDetail } from "@hushmark/schemas";
import type { Measurement } from "./measurement.entity.js";

const num = (v: unknown) => (typeof v === "number" ? v : null);

export function measurementDto(m: Measurement): MeasurementDto {
  const s = m.summary;
  return {
    id: m.id,
    projectId: m.projectId,
    label: m.label,
    kind: m.kind,
    source: m.source,
    status: m.status,
    progress: m.progress,
    error: m.error,
    takenAt: new Date(m.takenAt).toISOString(),
    roomId: m.roomId,
    point: m.point,
    device: m.device,
    calibrationDb: m.calibrationDb,
    leqDb: m.leqDb,
    lmaxDb: m.lmaxDb,
    l10Db: m.l10Db,
    l90Db: m.l90Db,
    summary: s
      ? { laeqDb: num(s.laeqDb), lafmaxDb: num(s.lafmaxDb), la10Db: num(s.la10Db), la90Db: num(s.la90Db), durationS: num(s.durationS), sampleRateHz: num(s.sampleRateHz), channels: num(s.channels) }
      : null,
    events: (m.events as MeasurementDto["events"]) ?? null,
    hasRecording: m.fileId !== null && m.source === "recording",
    createdAt: new Date(m.createdAt).toISOString(),
  };
}

export function measurementDetailDto(m: Measurement): MeasurementDetail {
  const h = m.timeHistory as MeasurementDetail["history"] | null;
  return { ...measurementDto(m), history: h ? { stepS: h.stepS, laeqDb: h.laeqDb, lafmaxDb: h.lafmaxDb, bandsDb: h.bandsDb ?? null } : null };
}
