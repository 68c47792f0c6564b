/** How the drawing's units were found: from the header's $INSUNITS, from the caller, or not at all. */
export type DxfUnits =
  | { status: "header"; code: number; name: string; metresPerUnit: number }
  | { status: "chosen"; name: string; metresPerUnit: number }
  | { status: "missing"; code: number | null; message: string };

/** $INSUNITS codes of the DXF header with their length in metres (0 = unitless, not listed). */
const INSUNITS: Record<number, { name: string; metresPerUnit: number }> = {
  1: { name: "inches", metresPerUnit: 0.0254 },
  2: { name: "feet", metresPerUnit: 0.3048 },
  3: { name: "miles", metresPerUnit: 1609.344 },
  4: { name: "millimetres", metresPerUnit: 0.001 },
  5: { name: "centimetres", metresPerUnit: 0.01 },
  6: { name: "metres", metresPerUnit: 1 },
  7: { name: "kilometres", metresPerUnit: 1000 },
  8: { name: "microinches", metresPerUnit: 0.0254e-6 },
  9: { name: "mils", metresPerUnit: 0.0254e-3 },
  10: { name: "yards", metresPerUnit: 0.9144 },
  14: { name: "decimetres", metresPerUnit: 0.1 },
  15: { name: "decametres", metresPerUnit: 10 },
  16: { name: "hectometres", metresPerUnit: 100 },
};

/** Units a surveyor can pick when the drawing does not say (metres per drawing unit). */
export const DXF_UNIT_CHOICES = {
  millimetres: 0.001,
  centimetres: 0.01,
  metres: 1,
  inches: 0.0254,
  feet: 0.3048,
} as const;
export type DxfUnitChoice = keyof typeof DXF_UNIT_CHOICES;

/** The drawing's units from its $INSUNITS header value (metres per drawing unit), or "missing". */
export function dxfUnitsFromHeader(insUnits: unknown): DxfUnits {
  const code = typeof insUnits === "number" && Number.isInteger(insUnits) ? insUnits : null;
  const known = code === null ? undefined : INSUNITS[code];
  if (known) return { status: "header", code: code!, ...known };
  const message = code === null
    ? "The drawing does not say which units it is in ($INSUNITS is not set): choose millimetres, centimetres, metres, inches or feet."
    : code === 0
      ? "The drawing is marked unitless ($INSUNITS = 0): choose the units it was drawn in."
      : `The drawing's units code $INSUNITS = ${code} is not a length Hushmark knows: choose the units it was drawn in.`;
  return { status: "missing", code, message };
}

/** The units to convert with: the caller's choice wins over the header (metres per drawing unit). */
export function dxfUnitsResolved(fromHeader: DxfUnits, choice: DxfUnitChoice | undefined): DxfUnits {
  if (choice) return { status: "chosen", name: choice, metresPerUnit: DXF_UNIT_CHOICES[choice] };
  return fromHeader;
}
