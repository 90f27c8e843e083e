import type { ConnectorContext, JoinedMember } from "../../../core/connector/connector-kind.js";
import type { Material } from "../../../core/schema/job.js";

export const IN = 25.4;
export const LBF = 4.4482216152605;
export const KIP = 1000 * LBF;
export const PSI = LBF / (IN * IN);
export const KSI = 1000 * PSI;

/** A material in core units with only what the connector models read. */
export function material(fields: Partial<Material> & { id?: string }): Material {
  return { id: "M", name: "material", family: "sawn-timber", E: 11_000, density: 500, strength: {}, source: "", ...fields } as Material;
}

export const wood = (G: number, fields: Partial<Material> = {}) => material({ id: `G${G}`, name: `wood G = ${G}`, specificGravity: G, ...fields });
export const ec5Timber = (rhoK: number, rhoMean: number, fields: Partial<Material> = {}) => material({ id: `rho${rhoK}`, name: `timber ρk ${rhoK}`, characteristicDensity: rhoK, meanDensity: rhoMean, ...fields });
export const steel = (FuMPa: number, FyMPa?: number) => material({ id: `steel${FuMPa}`, name: `steel Fu ${FuMPa}`, family: "steel", E: 200_000, density: 7850, tensileStrength: FuMPa, ...(FyMPa !== undefined ? { yieldStrength: FyMPa } : {}) });

export const member = (part: string, m: Material, thickness: number, width = 1000): JoinedMember => ({ part, material: m, thickness, width });

/** A context at one contact line, core units; the combination's loads by category. */
export function context(head: JoinedMember, point: JoinedMember, options: Partial<Omit<ConnectorContext, "members">> = {}): ConnectorContext {
  return {
    duration: "unspecified",
    categories: ["dead", "live"],
    combinationName: "test",
    basis: "allowable",
    adherends: [],
    rows: 1,
    units: "si",
    ...options,
    members: [head, point],
  };
}
