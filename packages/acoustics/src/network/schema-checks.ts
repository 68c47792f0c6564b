/**
 * Cross-field checks of the network JSON that a shape schema cannot express: unique ids,
 * references between spaces, links and sources, per-band array lengths, and the
 * absorption/reverberation-time rule. Each issue carries the JSON path of the offending value.
 */
import type { z } from "zod";
import { bandCount } from "../bands/bands.js";
import type { networkShapeSchema } from "./schema.js";

type NetworkShape = z.output<typeof networkShapeSchema>;
type Path = (string | number)[];

interface Checker {
  readonly bands: number;
  issue(path: Path, message: string): void;
}

function checkBandArray(c: Checker, value: unknown, path: Path): void {
  if (Array.isArray(value) && value.length !== c.bands) {
    c.issue(path, `has ${value.length} values; the network has ${c.bands} bands`);
  }
}

function checkUnique(c: Checker, ids: (string | undefined)[], path: (i: number) => Path, what: string): void {
  const seen = new Map<string, number>();
  ids.forEach((id, i) => {
    if (id === undefined) return;
    const first = seen.get(id);
    if (first !== undefined) c.issue(path(i), `duplicate ${what} id "${id}" (first used at index ${first})`);
    else seen.set(id, i);
  });
}

function checkSpaces(c: Checker, net: NetworkShape): void {
  checkUnique(c, net.spaces.map((s) => s.id), (i) => ["spaces", i, "id"], "space");
  net.spaces.forEach((s, i) => {
    const at: Path = ["spaces", i];
    checkBandArray(c, s.absorption_m2, [...at, "absorption_m2"]);
    checkBandArray(c, s.rt60_s, [...at, "rt60_s"]);
    if (s.kind === "outdoors") return;
    const hasA = s.absorption_m2 !== undefined;
    const hasT = s.rt60_s !== undefined;
    if (hasA === hasT) {
      c.issue(at, `space "${s.id}" needs exactly one of absorption_m2 and rt60_s`);
    } else if (hasT && s.volume_m3 === undefined) {
      c.issue([...at, "volume_m3"], `space "${s.id}" gives rt60_s, so it needs volume_m3 (A = 0.16·V/T)`);
    }
  });
}

function checkPartitionParts(c: Checker, net: NetworkShape, i: number): void {
  const link = net.links[i];
  if (link?.type !== "partition") return;
  checkUnique(c, link.parts.map((p) => p.id), (k) => ["links", i, "parts", k, "id"], "part");
  link.parts.forEach((p, k) => {
    const at: Path = ["links", i, "parts", k];
    if ("tl_db" in p) checkBandArray(c, p.tl_db, [...at, "tl_db"]);
    if ("dne_db" in p) checkBandArray(c, p.dne_db, [...at, "dne_db"]);
  });
}

function checkLinkBands(c: Checker, net: NetworkShape, i: number): void {
  const link = net.links[i];
  const at: Path = ["links", i];
  if (link === undefined) return;
  switch (link.type) {
    case "partition":
      checkPartitionParts(c, net, i);
      return;
    case "vent":
      checkBandArray(c, link.attenuation_db, [...at, "attenuation_db"]);
      link.attenuation_parts?.forEach((p, k) =>
        checkBandArray(c, p.attenuation_db, [...at, "attenuation_parts", k, "attenuation_db"]),
      );
      return;
    case "floor":
      checkBandArray(c, link.tl_db, [...at, "tl_db"]);
      checkBandArray(c, link.impact?.ln_db, [...at, "impact", "ln_db"]);
      checkBandArray(c, link.impact?.delta_l_db, [...at, "impact", "delta_l_db"]);
      return;
    case "flanking":
      checkBandArray(c, link.element_i.tl_db, [...at, "element_i", "tl_db"]);
      checkBandArray(c, link.element_j.tl_db, [...at, "element_j", "tl_db"]);
      checkBandArray(c, link.kij_db, [...at, "kij_db"]);
      checkBandArray(c, link.delta_r_db, [...at, "delta_r_db"]);
      return;
  }
}

function checkLinks(c: Checker, net: NetworkShape): void {
  const spaceIds = new Set(net.spaces.map((s) => s.id));
  checkUnique(c, net.links.map((l) => l.id), (i) => ["links", i, "id"], "link");
  net.links.forEach((link, i) => {
    link.between.forEach((id, k) => {
      if (!spaceIds.has(id)) c.issue(["links", i, "between", k], `link "${link.id}" names unknown space "${id}"`);
    });
    if (link.between[0] === link.between[1]) {
      c.issue(["links", i, "between"], `link "${link.id}" must join two different spaces`);
    }
    checkLinkBands(c, net, i);
  });
}

function checkSources(c: Checker, net: NetworkShape): void {
  const spaceIds = new Set(net.spaces.map((s) => s.id));
  const floors = new Map(net.links.flatMap((l) => (l.type === "floor" ? [[l.id, l] as const] : [])));
  const airborneSpaces = new Set<string>();
  checkUnique(c, net.sources.map((s) => s.id), (i) => ["sources", i, "id"], "source");
  net.sources.forEach((s, i) => {
    const at: Path = ["sources", i];
    if (s.type === "airborne") {
      if (!spaceIds.has(s.space)) c.issue([...at, "space"], `source names unknown space "${s.space}"`);
      if (airborneSpaces.has(s.space)) c.issue([...at, "space"], `space "${s.space}" already has an airborne source`);
      airborneSpaces.add(s.space);
      checkBandArray(c, s.levels_db, [...at, "levels_db"]);
      return;
    }
    const floor = floors.get(s.floor);
    if (floor === undefined) c.issue([...at, "floor"], `impact source names "${s.floor}", which is not a floor link`);
    else if (s.ln_db === undefined && floor.impact === undefined) {
      c.issue([...at, "ln_db"], `impact source on "${s.floor}" needs ln_db (the floor has no impact data)`);
    }
    checkBandArray(c, s.ln_db, [...at, "ln_db"]);
  });
}

/** zod superRefine hook: every cross-field rule of the network format. */
export function checkNetwork(net: NetworkShape, ctx: z.RefinementCtx): void {
  const c: Checker = {
    bands: bandCount(net.bands),
    issue: (path, message) => ctx.addIssue({ code: "custom", path, message }),
  };
  checkSpaces(c, net);
  checkLinks(c, net);
  checkSources(c, net);
}
