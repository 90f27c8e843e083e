import { formatNumber } from "../units/format.js";
import { fromCore, unitLabel, type Quantity, type UnitSystem } from "../units/quantity.js";

/** A core-unit value as a person reads it in the job's own units: "38 mm", "1.5 in". */
export function inJobUnits(value: number, quantity: Quantity, units: UnitSystem): string {
  return `${formatNumber(fromCore(value, quantity, units))} ${unitLabel(quantity, units)}`;
}

export const MM_PER_IN = 25.4;
export const N_PER_LBF = 4.4482216152605;
export const MPA_PER_PSI = N_PER_LBF / (MM_PER_IN * MM_PER_IN);
export const MPA_PER_KSI = 1000 * MPA_PER_PSI;
export const N_PER_KIP = 1000 * N_PER_LBF;
