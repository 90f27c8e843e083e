import type { DesignResult, MemberCheck } from "../schema/result.js";
import { DesignResult as DesignResultSchema, Schedule, WeldResult } from "../schema/result.js";
import { rescale } from "./convert.js";
import { formatNumber } from "./format.js";
import { fromCore, unitLabel, quantities, type Quantity, type UnitSystem } from "./quantity.js";

/**
 * What a shown quantity belongs to. US practice writes steel in kips and ksi (AISC 360 and its manual)
 * and timber in pounds and psi (the NDS); SI is the same for both. Only the page and the worksheet
 * show these units: the job and the result stay in the job's own units.
 */
export type Owner = "steel" | "timber";

interface ShownUnit {
  label: string;
  /** Job units (US: lbf, psi) in one shown unit. */
  per: number;
}

const KIP = 1000;
const US_STEEL: Partial<Record<Quantity, ShownUnit>> = {
  force: { label: "kips", per: KIP },
  connectorForce: { label: "kips", per: KIP },
  lineLoad: { label: "kip/ft", per: KIP },
  shearFlow: { label: "kip/in", per: KIP },
  slipModulus: { label: "kip/in", per: KIP },
  stress: { label: "ksi", per: KIP },
  modulus: { label: "ksi", per: KIP },
  moment: { label: "kip·ft", per: KIP },
  flexuralRigidity: { label: "kip·in²", per: KIP },
};
const US_TIMBER: Partial<Record<Quantity, ShownUnit>> = {
  force: { label: "lb", per: 1 },
  connectorForce: { label: "lb", per: 1 },
  lineLoad: { label: "lb/ft", per: 1 },
  shearFlow: { label: "lb/in", per: 1 },
  slipModulus: { label: "lb/in", per: 1 },
  moment: { label: "lb·ft", per: 1 },
  flexuralRigidity: { label: "lb·in²", per: 1 },
};

/** The unit a quantity of the job's system is shown in, for what it belongs to. */
export function shownUnit(quantity: Quantity, system: UnitSystem, owner: Owner): ShownUnit {
  const us = system === "us" ? (owner === "steel" ? US_STEEL : US_TIMBER)[quantity] : undefined;
  return us ?? { label: unitLabel(quantity, system), per: 1 };
}

/** A value in the job's units → the shown unit (kips from lbf for steel in US units). */
export const shownValue = (value: number, quantity: Quantity, system: UnitSystem, owner: Owner) => value / shownUnit(quantity, system, owner).per;

/** A core-unit value in a sentence, in the unit shown for what it belongs to: "9.492 kips" for a steel bolt in a US job. */
export function inShownUnits(value: number, quantity: Quantity, system: UnitSystem, owner: Owner): string {
  return `${formatNumber(shownValue(fromCore(value, quantity, system), quantity, system, owner))} ${shownUnit(quantity, system, owner).label}`;
}

/** Unit labels keyed by quantity kind, as shown for `owner`. */
export function shownLabels(system: UnitSystem, owner: Owner): Record<Quantity, string> {
  return Object.fromEntries(quantities.map((q) => [q, shownUnit(q, system, owner).label])) as Record<Quantity, string>;
}

/** Steel when every material named is steel; anything with timber (or another material) in it is shown as timber. */
export function ownerOfFamilies(families: readonly string[]): Owner {
  return families.length > 0 && families.every((f) => f === "steel") ? "steel" : "timber";
}

export interface MaterialFamily {
  id: string;
  family?: string;
}

/** What each part of a result belongs to: the member as a whole, each joint (by the parts it joins), each member check (by its part or material). */
export interface ResultOwners {
  member: Owner;
  joint: (jointId: string) => Owner;
  check: (check: Pick<MemberCheck, "id">) => Owner;
}

export function resultOwners(result: Pick<DesignResult, "section" | "joints">, materials: readonly MaterialFamily[]): ResultOwners {
  const familyOf = new Map(materials.map((m) => [m.id, m.family ?? "other"]));
  const partFamily = new Map(result.section.parts.map((p) => [p.id, familyOf.get(p.material) ?? "other"]));
  const member = ownerOfFamilies([...partFamily.values()]);
  const jointOwners = new Map(
    result.joints.map((j) => [j.id, ownerOfFamilies(j.lines.flatMap((l) => l.between).map((id) => partFamily.get(id) ?? "other"))]),
  );
  // A check's id ends with the part or the material it is about (bending-ply-plate, bending-A36).
  const checkOwner = (id: string): Owner => {
    for (const p of result.section.parts) {
      if (id.endsWith(`-${p.id}`)) return ownerOfFamilies([partFamily.get(p.id) ?? "other"]);
    }
    for (const [material, family] of familyOf) if (id.endsWith(`-${material}`)) return ownerOfFamilies([family]);
    return member;
  };
  return { member, joint: (id) => jointOwners.get(id) ?? member, check: (c) => checkOwner(c.id) };
}

/**
 * The result as the page and the worksheet show it: every number in the unit of what it belongs to.
 * The member's forces, moments and stresses take the member's owner; each schedule and weld its joint's;
 * each member check its part's. `labels(owner)` gives the unit labels for a part shown with another owner.
 */
export interface ShownResult {
  result: DesignResult;
  owners: ResultOwners;
  labels: (owner: Owner) => Record<string, string>;
}

export function shownResult(result: DesignResult, materials: readonly MaterialFamily[]): ShownResult {
  const owners = resultOwners(result, materials);
  const system = result.units;
  const by = (owner: Owner) => (v: number, q: Quantity) => shownValue(v, q, system, owner);
  const whole = rescale(DesignResultSchema, result, by(owners.member));
  const shown: DesignResult = {
    ...whole,
    unitLabels: { ...result.unitLabels, ...shownLabels(system, owners.member) },
    schedules: result.schedules.map((s, i) => (owners.joint(s.joint) === owners.member ? whole.schedules[i]! : rescale(Schedule, s, by(owners.joint(s.joint))))),
    welds: result.welds.map((w, i) => (owners.joint(w.joint) === owners.member ? whole.welds[i]! : rescale(WeldResult, w, by(owners.joint(w.joint))))),
    checks: result.checks.map((k, i) => {
      const owner = owners.check(k);
      if (owner === owners.member || k.quantity === "ratio") return whole.checks[i]!;
      const q = k.quantity as Quantity;
      return { ...k, demand: shownValue(k.demand, q, system, owner), capacity: shownValue(k.capacity, q, system, owner) };
    }),
  };
  return { result: shown, owners, labels: (owner) => ({ ...result.unitLabels, ...shownLabels(system, owner) }) };
}
