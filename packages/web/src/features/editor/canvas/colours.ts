/** The design tokens as plain values for the canvas, which cannot read CSS variables cheaply. */
export const ink = "#1d2433";
export const paper = "#f7f5f0";
export const panel = "#ffffff";
export const rule = "#d9d4c7";
export const muted = "#6b7080";
export const brand = "#1f7a74";
export const brandStrong = "#185f5a";
export const focus = "#f2b233";
export const good = "#2f8f4e";
export const caution = "#c98a12";
export const danger = "#c2412d";


/** Room fills by kind of use: quiet rooms cool, noisy ones warm, all pale enough for ink on top. */
export function roomFill(use: string): string {
  switch (use) {
    case "bedroom": case "nursery": case "studio": case "control-room": case "office": case "meeting": case "classroom": return "#eef4f3";
    case "cafe": case "kitchen": case "plant": case "retail": case "cinema": return "#f7efe4";
    case "corridor": case "stair": case "storage": return "#f1f0ec";
    default: return "#fbfaf7";
  }
}
