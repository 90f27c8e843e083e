import type { UnitSystem } from "../../../core/units/quantity.js";

type Item = Record<string, unknown>;

/** What each connector kind is called in the kind list. */
export const connectorKindNames: Record<string, string> = {
  nail: "nail",
  "wood-screw": "wood screw",
  "lag-screw": "lag screw",
  "timber-bolt": "bolt or dowel in timber",
  "steel-bolt": "bolt in steel plies",
  "fillet-weld": "fillet weld",
  rated: "rated connector (from its published rating)",
  glue: "glue line",
};

/**
 * A common starting point for a connector of each kind. The standard follows the job: an allowable
 * basis takes the US standards (they give allowable values), a factored SI job the Eurocodes. Sizes are
 * trade sizes or numbers in the job's units. Every value is editable; none is a recommendation.
 */
export function connectorPreset(kind: string, units: UnitSystem, basis: "allowable" | "factored"): Item {
  const us = units === "us";
  const euro = !us && basis === "factored";
  const timber = euro ? "EN1995-1-1" : "NDS-2018";
  const steel = euro ? "EN1993-1-8" : "AISC-360-16";
  const length = (mm: number, inches: number) => (us ? inches : mm);
  switch (kind) {
    case "nail":
      return euro ? { standard: timber, diameter: 3.1, length: 75, shank: "smooth" } : { standard: timber, size: "16d common" };
    case "wood-screw":
      return euro ? { standard: timber, diameter: 5, length: 80 } : { standard: timber, gauge: "#10", length: length(75, 3) };
    case "lag-screw":
      return euro ? { standard: timber, diameter: 10, length: 140 } : { standard: timber, size: "1/2", length: length(150, 6) };
    case "timber-bolt":
      return euro ? { standard: timber, size: "M16", grade: "4.6" } : { standard: timber, size: "5/8" };
    case "steel-bolt":
      return euro ? { standard: steel, size: "M20", grade: "8.8" } : { standard: steel, size: "3/4", grade: "A" };
    case "fillet-weld":
      return euro ? { standard: steel, throat: 4, pattern: "continuous" } : { standard: steel, leg: length(6, 0.25), electrode: "E70", pattern: "continuous" };
    case "glue":
      return { label: "Structural adhesive" };
    case "rated":
      return { label: "Rated connector", minSpacing: length(50, 2) };
    default:
      return {};
  }
}

/** The same connector as another kind: id, label and source kept, the new kind's starting values filled in. */
export function asConnectorKind(connector: Item, kind: string, units: UnitSystem, basis: "allowable" | "factored"): Item {
  const kept: Item = { id: connector.id ?? "", kind, ...connectorPreset(kind, units, basis) };
  if (typeof connector.label === "string" && connector.label !== "") kept.label = connector.label;
  if (typeof connector.source === "string" && connector.source !== "") kept.source = connector.source;
  return kept;
}
