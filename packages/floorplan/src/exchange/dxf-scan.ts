/** A problem that stops a DXF from being read; nothing is converted when one is found. */
export interface DxfProblem {
  code: "dxf-empty" | "dxf-binary" | "dxf-malformed" | "dxf-no-entities" | "dxf-units-missing" | "dxf-level-unknown";
  message: string;
  /** 1-based line of the file where the problem was found. */
  line?: number;
}

/** Where the parts of a DXF text file lie: offsets into the text (characters). */
export interface DxfLayout {
  /** Text before the ENTITIES section (header, tables, blocks). */
  headEnd: number;
  /** Start offset of each top-level entity in the ENTITIES section (VERTEX and SEQEND stay with their POLYLINE). */
  entityStarts: number[];
  /** Offset where the ENTITIES section's ENDSEC group starts. */
  entitiesEnd: number;
  lineCount: number;
  /** Entities per layer name (the first group 8 of each entity), for the layer-mapping dialog. */
  layerEntityCounts: Record<string, number>;
}

// Group codes whose values must be numbers (coordinates, lengths, angles, flags, counts), DXF reference ranges.
function numericCode(code: number): boolean {
  return (code >= 10 && code <= 99) || (code >= 110 && code <= 149) || (code >= 160 && code <= 179) ||
    (code >= 210 && code <= 239) || (code >= 270 && code <= 289) || (code >= 370 && code <= 389) || (code >= 1010 && code <= 1071);
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Scans a DXF text file group by group (code line, value line), checking that every code is a
 * whole number and every numeric group holds a number, and finds the ENTITIES section's entity
 * boundaries so they can be parsed in chunks (offsets in characters).
 */
export function dxfLayout(text: string): { ok: true; layout: DxfLayout } | { ok: false; problem: DxfProblem } {
  if (text.trim() === "") return { ok: false, problem: { code: "dxf-empty", message: "The file is empty." } };
  if (text.startsWith("AutoCAD Binary DXF")) {
    return { ok: false, problem: { code: "dxf-binary", message: "This is a binary DXF; save it from CAD as an ASCII (text) DXF and import that." } };
  }
  let pos = 0;
  let line = 0;
  let section: string | null = null;
  let expectSectionName = false;
  let sectionGroupStart = 0;
  let headEnd = -1;
  let entitiesEnd = -1;
  const entityStarts: number[] = [];
  const layerEntityCounts: Record<string, number> = {};
  let awaitingLayer = false;
  const next = (): string | null => {
    if (pos > text.length) return null;
    let end = text.indexOf("\n", pos);
    if (end < 0) end = text.length;
    const raw = text.slice(pos, end);
    pos = end + 1;
    line++;
    return raw.endsWith("\r") ? raw.slice(0, -1) : raw;
  };
  while (pos < text.length) {
    const groupStart = pos;
    const codeText = next();
    if (codeText === null) break;
    if (codeText.trim() === "" && pos >= text.length) break;
    const codeLine = line;
    const code = Number(codeText.trim());
    if (!/^\s*-?\d+\s*$/.test(codeText) || !Number.isInteger(code)) {
      return { ok: false, problem: { code: "dxf-malformed", line: codeLine, message: `Line ${codeLine}: expected a group code (a whole number) but found "${codeText.trim().slice(0, 40)}". The file is damaged or not a DXF.` } };
    }
    if (pos > text.length) {
      return { ok: false, problem: { code: "dxf-malformed", line: codeLine, message: `Line ${codeLine}: the file ends after group code ${code} without its value; it was probably cut off.` } };
    }
    const value = next() ?? "";
    const v = value.trim();
    if (numericCode(code) && !NUMBER.test(v)) {
      return { ok: false, problem: { code: "dxf-malformed", line, message: `Line ${line}: group ${code} must hold a number but holds "${v.slice(0, 40)}". The file is damaged.` } };
    }
    if (code === 8 && awaitingLayer) {
      layerEntityCounts[v] = (layerEntityCounts[v] ?? 0) + 1;
      awaitingLayer = false;
    }
    if (code !== 0 && !(code === 2 && expectSectionName)) continue;
    awaitingLayer = false;
    if (code === 2) {
      section = v;
      expectSectionName = false;
      if (section === "ENTITIES") headEnd = sectionGroupStart;
      continue;
    }
    if (v === "SECTION") {
      expectSectionName = true;
      sectionGroupStart = groupStart;
      continue;
    }
    if (section === "ENTITIES") {
      if (v === "ENDSEC") {
        entitiesEnd = groupStart;
        section = null;
      } else if (v !== "VERTEX" && v !== "SEQEND") {
        entityStarts.push(groupStart);
        awaitingLayer = true;
      }
    } else if (v === "ENDSEC") {
      section = null;
    }
  }
  if (headEnd < 0) {
    return { ok: false, problem: { code: "dxf-no-entities", message: "The file has no ENTITIES section, so there is nothing to import. Is it a DXF drawing?" } };
  }
  if (entitiesEnd < 0) {
    return { ok: false, problem: { code: "dxf-malformed", line, message: "The ENTITIES section never ends (no ENDSEC): the file was probably cut off." } };
  }
  return { ok: true, layout: { headEnd, entityStarts, entitiesEnd, lineCount: line, layerEntityCounts } };
}
