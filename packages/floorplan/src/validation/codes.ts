/** Every problem code the validator emits, with its severity. Errors block analysis; warnings are stated assumptions. */
export const PROBLEM_CODES = {
  "document-invalid": "error",
  "level-without-height": "error",
  "unknown-level": "error",
  "room-zero-area": "error",
  "room-self-intersecting": "error",
  "room-duplicate-corner": "error",
  "rooms-overlap": "error",
  "opening-wider-than-wall": "error",
  "opening-outside-wall": "error",
  "opening-on-missing-wall": "error",
  "opening-taller-than-wall": "error",
  "unknown-construction": "error",
  "construction-wrong-kind": "warning",
  "vent-unconnected": "error",
  "vent-in-unknown-space": "error",
  "duct-missing-vent": "error",
  "void-zero-area": "error",
  "void-covers-nothing": "warning",
  "unknown-neighbour": "error",
  "neighbour-unsurveyed": "warning",
  "finish-assumed": "warning",
  "wall-setting-orphaned": "warning",
  "penetration-no-area": "warning",
  "absorption-raised": "warning",
} as const;

export type ProblemCode = keyof typeof PROBLEM_CODES;
