import * as dxfParserModule from "dxf-parser";
import type { IDxf, IEntity } from "dxf-parser";
import type { DxfBlock } from "./dxf-import-types.js";
import { dxfLayout, type DxfLayout, type DxfProblem } from "./dxf-scan.js";
import { dxfUnitsFromHeader, type DxfUnits } from "./dxf-units.js";

type ParserClass = new () => { parseSync(source: string): IDxf | null };

// The package is CommonJS under Node (default = the class) and ESM under bundlers (named and default).
const parserModule = dxfParserModule as unknown as { default?: unknown; DxfParser?: unknown };
const DxfParserClass = (
  typeof parserModule.default === "function"
    ? parserModule.default
    : (parserModule.default as { default?: unknown } | undefined)?.default ?? parserModule.DxfParser
) as ParserClass;

export type { IEntity as DxfEntity };

/** An opened DXF: its units, layers and entity count, read before any entity is converted. */
export interface DxfSource {
  units: DxfUnits;
  /** Layer names from the LAYER table (entities may also name layers that are not in it). */
  layerNames: string[];
  entityCount: number;
  /** Block definitions from the BLOCKS section, for expanding INSERTs. */
  blocks: Record<string, DxfBlock>;
  /** Entities per layer, counted while scanning. */
  layerEntityCounts: Record<string, number>;
  /** Parses the entities `size` at a time, in file order; `done` counts entities parsed so far. */
  chunks(size?: number): Generator<{ entities: IEntity[]; done: number; total: number }>;
}

function parsed(text: string): { ok: true; dxf: IDxf } | { ok: false; message: string } {
  try {
    const dxf = new DxfParserClass().parseSync(text);
    return dxf ? { ok: true, dxf } : { ok: false, message: "the DXF reader returned nothing" };
  } catch (e) {
    return { ok: false, message: e instanceof Error ? e.message : String(e) };
  }
}

const TAIL = "0\nENDSEC\n0\nEOF\n";

/**
 * Opens a DXF text file: checks every group, reads the header and layer table, and prepares the
 * ENTITIES section to be parsed in chunks (so a worker can report progress on large files).
 */
export function dxfSource(raw: string): { ok: true; source: DxfSource } | { ok: false; problem: DxfProblem } {
  // Some Windows tools start text files with a byte-order mark, which is not a group code.
  const text = raw.charCodeAt(0) === 0xfeff ? raw.slice(1) : raw;
  const scanned = dxfLayout(text);
  if (!scanned.ok) return scanned;
  const layout: DxfLayout = scanned.layout;
  const head = parsed(`${text.slice(0, layout.headEnd)}0\nEOF\n`);
  if (!head.ok) return { ok: false, problem: { code: "dxf-malformed", message: `The header or tables could not be read: ${head.message}.` } };
  const units = dxfUnitsFromHeader(head.dxf.header?.["$INSUNITS"]);
  const layerNames = [...new Set([...Object.keys(head.dxf.tables?.layer?.layers ?? {}), ...Object.keys(layout.layerEntityCounts)])].sort();
  const starts = layout.entityStarts;
  const source: DxfSource = {
    units,
    layerNames,
    entityCount: starts.length,
    layerEntityCounts: layout.layerEntityCounts,
    blocks: (head.dxf.blocks ?? {}) as Record<string, DxfBlock>,
    *chunks(size = 2000) {
      for (let i = 0; i < starts.length; i += size) {
        const from = starts[i]!;
        const to = i + size < starts.length ? starts[i + size]! : layout.entitiesEnd;
        const body = text.slice(from, to);
        const chunk = parsed(`0\nSECTION\n2\nENTITIES\n${body.endsWith("\n") ? body : `${body}\n`}${TAIL}`);
        if (!chunk.ok) throw new DxfChunkError(`Entities ${i + 1}–${Math.min(i + size, starts.length)} could not be read: ${chunk.message}.`);
        yield { entities: chunk.dxf.entities ?? [], done: Math.min(i + size, starts.length), total: starts.length };
      }
    },
  };
  return { ok: true, source };
}

/** Thrown by `DxfSource.chunks` when the reader rejects a chunk the scan accepted. */
export class DxfChunkError extends Error {}
