import { createHash } from "node:crypto";
import type { DataSource } from "typeorm";
import {
  catalogueWith, constructionCatalogue, constructionFromCsv, constructionRatings, coveringDeltaLwDb, finishPresets, sourceLibrary,
  type Catalogue, type Construction,
} from "@hushmark/floorplan";
import type { CatalogueResponse, ConstructionDto, ConstructionUpload } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import { FirmConstruction } from "../entities/index.js";
import { HttpError, conflict, notFound } from "../http/errors.js";

function dto(c: Construction, origin: ConstructionDto["origin"]): ConstructionDto {
  return {
    id: c.id, name: c.name, category: c.category, thicknessMm: c.thicknessMm, surfaceDensityKgM2: c.surfaceDensityKgM2,
    tlDb: [...c.tlDb], ...(c.impactLnDb ? { impactLnDb: [...c.impactLnDb] } : {}), source: c.source, ratings: constructionRatings(c), origin,
  };
}

/** The built-in constructions with their engine ratings, computed once per process. */
let builtIn: ConstructionDto[] | undefined;
const builtInDtos = () => (builtIn ??= Object.values(constructionCatalogue.constructions).map((c) => dto(c, "built-in")));

/** A firm's catalogue for the builder, and a digest of its own entries (part of analysis cache keys). */
export interface FirmCatalogue {
  catalogue: Catalogue;
  extra: Construction[];
  digest: string;
}

/** Firms whose catalogue one process keeps in memory; beyond this the least recently used is dropped. */
const MEMO_FIRMS = 500;

/** Bumps the firm's constructions version in the same transaction as the change it stands for. */
const BUMP_VERSION = "UPDATE organizations SET constructions_version = constructions_version + 1 WHERE id = $1";

/** The construction catalogue a firm works with: the built-in entries and its own lab data. */
export function createCatalogueService(dataSource: DataSource) {
  const repo = dataSource.getRepository(FirmConstruction);
  // Per process, keyed by the firm's constructions_version: another process's change bumps the
  // version in PostgreSQL, so the next read here sees a new number and loads the rows again.
  const memo = new Map<string, { version: number; value: FirmCatalogue }>();

  async function firmConstructions(organizationId: string): Promise<Construction[]> {
    const rows = await repo.find({ where: { organizationId }, order: { constructionId: "ASC" } });
    return rows.map((r) => r.data as unknown as Construction);
  }

  /** The firm's catalogue, from memory while its constructions_version is unchanged (do not mutate). */
  async function catalogueFor(organizationId: string): Promise<FirmCatalogue> {
    const current: { version: number }[] = await dataSource.query("SELECT constructions_version AS version FROM organizations WHERE id = $1", [organizationId]);
    const hit = memo.get(organizationId);
    if (hit && current[0] && hit.version === current[0].version) {
      memo.delete(organizationId);
      memo.set(organizationId, hit);
      return hit.value;
    }
    // The version and the rows in one statement, so both come from one snapshot even while
    // another process adds a construction.
    const rows: { version: number; data: Construction | null }[] = await dataSource.query(
      `SELECT o.constructions_version AS version, fc.data FROM organizations o
       LEFT JOIN firm_constructions fc ON fc.organization_id = o.id WHERE o.id = $1 ORDER BY fc.construction_id`,
      [organizationId],
    );
    const extra = rows.flatMap((r) => (r.data ? [r.data] : []));
    const digest = createHash("sha256").update(JSON.stringify(extra)).digest("hex").slice(0, 16);
    const value: FirmCatalogue = { catalogue: catalogueWith(constructionCatalogue, { constructions: extra }), extra, digest };
    if (rows[0]) {
      memo.delete(organizationId);
      memo.set(organizationId, { version: rows[0].version, value });
      if (memo.size > MEMO_FIRMS) memo.delete(memo.keys().next().value!);
    }
    return value;
  }

  async function list(actor: Actor): Promise<CatalogueResponse> {
    const own = (await firmConstructions(actor.organizationId)).map((c) => dto(c, "firm"));
    return {
      constructions: [...builtInDtos(), ...own],
      coverings: Object.values(constructionCatalogue.coverings).map((c) => ({ ...c, deltaLDb: [...c.deltaLDb], deltaLwDb: coveringDeltaLwDb(c) })),
      silencers: Object.values(constructionCatalogue.silencers).map((s) => ({ ...s, insertionLossDb: [...s.insertionLossDb] })),
      sources: sourceLibrary.map((s) => ({ id: s.id, name: s.name, kind: s.kind, typicalSpace: s.typicalSpace, levelsDb: [...s.levelsDb], source: s.source })),
      finishes: finishPresets.map((f) => ({ id: f.id, name: f.name })),
    };
  }

  /** Reads a lab CSV into a construction with its ratings, without saving; line-numbered problems answer 400. */
  function preview(input: ConstructionUpload): { construction: ConstructionDto; notes: string[]; value: Construction } {
    const parsed = constructionFromCsv(input.csv, input);
    if (!parsed.ok) {
      throw new HttpError(400, "invalid_input", "The lab data could not be read.", parsed.problems.map((p) => ({ path: "csv", line: p.line, message: p.line ? `Line ${p.line}: ${p.message}` : p.message })));
    }
    return { construction: dto(parsed.value, "firm"), notes: parsed.notes, value: parsed.value };
  }

  async function add(actor: Actor, input: ConstructionUpload): Promise<ConstructionDto> {
    const { construction, value } = preview(input);
    if (constructionCatalogue.constructions[input.id]) throw conflict("id_taken", `"${input.id}" is a built-in construction; choose another id.`);
    const taken = () => conflict("id_taken", `Your firm already has a construction "${input.id}"; choose another id or delete that one first.`);
    if (await repo.exists({ where: { organizationId: actor.organizationId, constructionId: input.id } })) throw taken();
    try {
      await dataSource.transaction(async (m) => {
        await m.getRepository(FirmConstruction).insert({ organizationId: actor.organizationId, constructionId: input.id, data: value as never, createdById: actor.userId });
        await m.query(BUMP_VERSION, [actor.organizationId]);
      });
    } catch (error) {
      // Two saves of the same id at once: the primary key decides, the loser hears why.
      if ((error as { driverError?: { code?: string } }).driverError?.code === "23505") throw taken();
      throw error;
    }
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "construction.added", entityType: "construction", entityId: input.id });
    return construction;
  }

  async function remove(actor: Actor, constructionId: string): Promise<void> {
    const affected = await dataSource.transaction(async (m) => {
      const result = await m.getRepository(FirmConstruction).delete({ organizationId: actor.organizationId, constructionId });
      if (result.affected) await m.query(BUMP_VERSION, [actor.organizationId]);
      return result.affected ?? 0;
    });
    if (!affected) throw notFound("That construction");
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "construction.removed", entityType: "construction", entityId: constructionId });
  }

  return { list, preview, add, remove, catalogueFor };
}

export type CatalogueService = ReturnType<typeof createCatalogueService>;
