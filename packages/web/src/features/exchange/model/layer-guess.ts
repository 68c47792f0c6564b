import type { DxfLayerRole } from "@hushmark/floorplan";

/** A first guess at a layer's role from its name, for the surveyor to correct. */
export function layerRoleGuess(name: string): DxfLayerRole {
  const n = name.toLowerCase();
  if (/door/.test(n)) return "doors";
  if (/window|glaz/.test(n)) return "windows";
  if (/wall|partition|room/.test(n)) return "walls";
  if (/dim|anno|text|hatch|title|grid|defpoints/.test(n)) return "ignore";
  return "underlay";
}
