/**
 * What an upgrade does to its link: a pure Link → Link change, checked against the network
 * (the link exists, the action suits its type, the part exists), plus the area it touches.
 */
import type { FlankingLink, Link, Network, Part, PartitionLink } from "../network/schema.js";
import { bandValue } from "../network/transmission.js";
import type { InputIssue } from "../network/parse.js";
import type { UpgradeAction, UpgradeOption } from "./schema.js";

const add = (values: readonly number[], delta: number | readonly number[]) => values.map((v, b) => v + bandValue(delta, b));

function partIndex(link: PartitionLink, ref: string | number): number {
  return typeof ref === "number" ? (ref < link.parts.length ? ref : -1) : link.parts.findIndex((p) => p.id === ref);
}

function withPart(link: PartitionLink, index: number, part: Part): PartitionLink {
  return { ...link, parts: link.parts.map((p, i) => (i === index ? part : p)) };
}

function addLayerToPartition(link: PartitionLink, action: Extract<UpgradeAction, { kind: "add-layer" }>): PartitionLink {
  const targets = action.part === undefined ? link.parts.map((_, i) => i) : [partIndex(link, action.part)];
  return {
    ...link,
    parts: link.parts.map((p, i) => (targets.includes(i) && "tl_db" in p ? { ...p, tl_db: add(p.tl_db, action.delta_tl_db) } : p)),
  };
}

function addLayerToFlanking(link: FlankingLink, delta: number | readonly number[]): FlankingLink {
  const current = link.delta_r_db;
  const next = Array.from(link.element_i.tl_db, (_, b) => bandValue(current, b) + bandValue(delta, b));
  return { ...link, delta_r_db: next };
}

/** The link after the action (no checks: call `checkOption` first). */
export function applyAction(link: Link, action: UpgradeAction): Link {
  switch (action.kind) {
    case "replace-part": {
      if (link.type !== "partition") return link;
      const i = partIndex(link, action.part);
      const old = link.parts[i] as Part;
      const part: Part = { id: old.id, ref: old.ref, name: old.name, kind: old.kind, fire_rated: old.fire_rated, area_m2: old.area_m2, tl_db: [...action.tl_db], construction: action.construction, estimate: action.estimate };
      return withPart(link, i, part);
    }
    case "add-layer":
      if (link.type === "partition") return addLayerToPartition(link, action);
      if (link.type === "floor") return { ...link, tl_db: add(link.tl_db, action.delta_tl_db) };
      if (link.type === "flanking") return addLayerToFlanking(link, action.delta_tl_db);
      return link;
    case "seal-leak": {
      if (link.type !== "partition") return link;
      const i = partIndex(link, action.part);
      const old = link.parts[i] as Part;
      return withPart(link, i, { ...old, area_m2: Math.min(old.area_m2, action.remaining_open_area_m2) });
    }
    case "add-duct-attenuation":
      return link.type === "vent" ? { ...link, attenuation_db: add(link.attenuation_db, action.attenuation_db) } : link;
    case "add-impact-improvement": {
      if (link.type !== "floor") return link;
      const ln = link.impact?.ln_db ?? link.tl_db.map(() => 0);
      const dl = link.impact?.delta_l_db ?? ln.map(() => 0);
      const tl = action.delta_tl_db === undefined ? link.tl_db : add(link.tl_db, action.delta_tl_db);
      return { ...link, tl_db: tl, impact: { ln_db: ln, delta_l_db: add(dl, action.delta_l_db) } };
    }
  }
}

/** Area in m² the action works on (for per-m² prices). */
export function actionAreaM2(link: Link, action: UpgradeAction): number {
  if (link.type === "partition") {
    if ("part" in action && action.part !== undefined) return link.parts[partIndex(link, action.part)]?.area_m2 ?? 0;
    return link.parts.filter((p) => "tl_db" in p).reduce((s, p) => s + p.area_m2, 0);
  }
  if (link.type === "floor") return link.area_m2;
  if (link.type === "flanking") return link.element_j.area_m2;
  return 0;
}

const SUITS: Record<UpgradeAction["kind"], readonly Link["type"][]> = {
  "replace-part": ["partition"],
  "add-layer": ["partition", "floor", "flanking"],
  "seal-leak": ["partition"],
  "add-duct-attenuation": ["vent"],
  "add-impact-improvement": ["floor"],
};

function checkBands(values: unknown, bands: number, path: string, issues: InputIssue[]): void {
  if (Array.isArray(values) && values.length !== bands) issues.push({ path, message: `has ${values.length} values; the network has ${bands} bands` });
}

/** Problems of one option against the network, with JSON paths under `at` (like `$.options[2]`). */
export function checkOption(option: UpgradeOption, network: Network, bands: number, at: string): InputIssue[] {
  const issues: InputIssue[] = [];
  const link = network.links.find((l) => l.id === option.link);
  if (link === undefined) return [{ path: `${at}.link`, message: `no link "${option.link}" in the network` }];
  const a = option.action;
  if (!SUITS[a.kind].includes(link.type)) {
    return [{ path: `${at}.action.kind`, message: `"${a.kind}" does not apply to ${link.type} link "${link.id}" (it suits ${SUITS[a.kind].join(", ")})` }];
  }
  if (link.type === "partition" && "part" in a && a.part !== undefined) {
    const i = partIndex(link, a.part);
    if (i < 0) issues.push({ path: `${at}.action.part`, message: `link "${link.id}" has no part ${JSON.stringify(a.part)}` });
    else if (a.kind === "seal-leak" && !("open" in (link.parts[i] as Part))) {
      issues.push({ path: `${at}.action.part`, message: `part ${JSON.stringify(a.part)} of "${link.id}" is not an open gap` });
    } else if (a.kind === "add-layer" && !("tl_db" in (link.parts[i] as Part))) {
      issues.push({ path: `${at}.action.part`, message: `part ${JSON.stringify(a.part)} of "${link.id}" has no tl_db to add a layer to` });
    }
  }
  for (const key of ["tl_db", "delta_tl_db", "attenuation_db", "delta_l_db"] as const) {
    if (key in a) checkBands((a as Record<string, unknown>)[key], bands, `${at}.action.${key}`, issues);
  }
  return issues;
}
