export type DisplayUnit = "metric" | "imperial";

const INCH_M = 0.0254;
const FOOT_M = 0.3048;

/** A number, a decimal fraction or a plain fraction like `1/2` or `6 1/2`. */
function parseNumber(text: string): number | null {
  const t = text.trim();
  if (t === "") return null;
  const mixed = /^(\d+(?:\.\d+)?)\s+(\d+)\/(\d+)$/.exec(t);
  if (mixed) return Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
  const frac = /^(\d+)\/(\d+)$/.exec(t);
  if (frac) return Number(frac[2]) === 0 ? null : Number(frac[1]) / Number(frac[2]);
  if (!/^\d*(?:[.,]\d+)?$|^\d+[.,]$/.test(t)) return null;
  const n = Number(t.replace(",", "."));
  return Number.isFinite(n) ? n : null;
}

/**
 * Reads a typed length in metres. A bare number is in the display unit (metres, or feet for
 * imperial); units may be written: `3.2 m`, `320 cm`, `3200 mm`, `10'`, `10' 6"`, `10'6`,
 * `10 ft 6 in`, `6 1/2"`, `10-6` (feet-inches). Answers null when it cannot be read.
 */
export function parseLength(input: string, unit: DisplayUnit): number | null {
  const text = input.trim().toLowerCase().replace(/[’′]/g, "'").replace(/[”″]/g, '"').replace(/''/g, '"');
  if (text === "") return null;
  const metric = /^(.+?)\s*(mm|cm|m)$/.exec(text);
  if (metric) {
    const n = parseNumber(metric[1]!);
    if (n === null) return null;
    return metric[2] === "mm" ? n / 1000 : metric[2] === "cm" ? n / 100 : n;
  }
  const feetInches = /^(?:(\d+(?:\.\d+)?)\s*(?:'|ft|feet|foot))?\s*-?\s*(?:(\d+(?:\.\d+)?(?:\s+\d+\/\d+)?|\d+\/\d+)\s*(?:"|in|inch|inches)?)?$/.exec(text);
  if (feetInches && (feetInches[1] !== undefined || feetInches[2] !== undefined)) {
    const hasFeetMark = feetInches[1] !== undefined;
    const hasInchMark = /("|in|inch|inches)$/.test(text);
    if (hasFeetMark || hasInchMark) {
      const feet = hasFeetMark ? Number(feetInches[1]) : 0;
      const inches = feetInches[2] !== undefined ? parseNumber(feetInches[2]) : 0;
      if (inches === null) return null;
      return feet * FOOT_M + inches * INCH_M;
    }
  }
  const dashed = /^(\d+)\s*-\s*(\d+(?:\.\d+)?)$/.exec(text);
  if (dashed && unit === "imperial") return Number(dashed[1]) * FOOT_M + Number(dashed[2]) * INCH_M;
  const bare = parseNumber(text);
  if (bare === null) return null;
  return unit === "metric" ? bare : bare * FOOT_M;
}

/** Reads `4 x 3`, `4×3` or `4, 3` as two lengths (a rectangle's width and depth), m. */
export function parseLengthPair(input: string, unit: DisplayUnit): [number, number] | null {
  const parts = input.split(/\s*(?:x|×|\*|,|;)\s*/i);
  if (parts.length !== 2) return null;
  const a = parseLength(parts[0]!, unit);
  const b = parseLength(parts[1]!, unit);
  return a === null || b === null ? null : [a, b];
}

/** A length for labels: `3.25 m` (to the centimetre) or `10' 8 1/2"` (to the nearest 1/8 inch). */
export function formatLength(m: number, unit: DisplayUnit): string {
  if (unit === "metric") return `${(Math.round(m * 100) / 100).toFixed(2)} m`;
  const sign = m < 0 ? "-" : "";
  const eighths = Math.round((Math.abs(m) / INCH_M) * 8);
  const feet = Math.floor(eighths / 96);
  const restEighths = eighths - feet * 96;
  const inches = Math.floor(restEighths / 8);
  let frac = restEighths - inches * 8;
  let den = 8;
  while (frac > 0 && frac % 2 === 0) { frac /= 2; den /= 2; }
  const inchText = frac > 0 ? `${inches} ${frac}/${den}"` : `${inches}"`;
  return feet > 0 ? `${sign}${feet}' ${inchText}` : `${sign}${inchText}`;
}

/** Characters that start or continue a typed length while drawing. */
export function isLengthKey(key: string): boolean {
  return key.length === 1 && /[0-9.,'"\- /xmcfint×]/i.test(key);
}
