import type { BriefNoise, BriefTarget } from "@hushmark/schemas";

export const noiseKindLabels: Record<BriefNoise["kind"], string> = {
  speech: "Speech",
  music_bass: "Amplified music and bass",
  television: "Television",
  traffic: "Traffic",
  machinery_hum: "Machinery or hum",
  impact: "Footfall and other impacts",
};

export const timeLabels = { morning: "Morning", daytime: "Daytime", evening: "Evening", night: "Night" } as const;
export const dayLabels = { mon: "Mon", tue: "Tue", wed: "Wed", thu: "Thu", fri: "Fri", sat: "Sat", sun: "Sun" } as const;
export const seasonLabels = { spring: "Spring", summer: "Summer", autumn: "Autumn", winter: "Winter" } as const;

export const targetKindLabels: Record<BriefTarget["kind"], string> = {
  level: "A level in the room (dBA)",
  nc: "A noise criterion (NC)",
  reduction: "A reduction (dB)",
  noticeable: "Noticeably quieter",
};

// The plain-language anchors; their basis is in docs/brief-targets.md.
const levelAnchors: [number, string][] = [
  [20, "about as quiet as a recording studio — you would hear a clock tick"],
  [25, "a very quiet bedroom at night"],
  [30, "a quiet bedroom: the level guidance for good sleep"],
  [35, "a quiet living room or a private office"],
  [40, "a library, or a quiet conversation next door"],
  [45, "an open office with people talking softly"],
  [55, "normal conversation a few metres away"],
  [90, "loud enough that talking over it is hard"],
];

export function levelInWords(dba: number): string {
  return (levelAnchors.find(([max]) => dba <= max) ?? levelAnchors[levelAnchors.length - 1]!)[1];
}

export function targetExplanation(target: BriefTarget | null): string {
  if (!target) return "Choose how quiet it must become; the analysis and the upgrade search aim at this.";
  switch (target.kind) {
    case "level":
      return Number.isFinite(target.levelDba)
        ? `${target.levelDba} dBA in the receiving room is ${levelInWords(target.levelDba)}. Lower numbers are quieter; every 10 dB down sounds about half as loud.`
        : "A level in dBA: the A-weighted sound level measured in the room, the way a sound level meter shows it.";
    case "nc":
      return Number.isFinite(target.nc)
        ? `NC-${target.nc}: no band of the background noise may rise above the NC-${target.nc} curve, so low hums count as well as hiss. Studios aim for NC-15 to 20, bedrooms 25 to 35, offices 30 to 35.`
        : "An NC rating limits the noise in every band at once, so a low hum cannot hide behind a quiet overall figure.";
    case "reduction":
      return Number.isFinite(target.reductionDb)
        ? `${target.reductionDb} dB less than today. 3 dB is just noticeable, 5 dB clearly noticeable, 10 dB sounds about half as loud, 20 dB about a quarter.`
        : "How many dB quieter than today, however loud it is now.";
    case "noticeable":
      return "No number agreed: we aim for at least 5 dB less than today, which most people clearly notice, and confirm it by measuring before and after.";
  }
}
