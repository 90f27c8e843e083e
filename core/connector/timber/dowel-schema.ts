import { z } from "zod";
import { positive, Text } from "../../schema/quantity.js";
import type { PlacementProblem } from "../connector-kind.js";
import type { RopeEffect } from "./ec5-johansen.js";
import type { DowelSpec, TimberStandard } from "./dowel-joint.js";
import { timberStandards } from "./dowel-joint.js";
import { ndsMoistureConditions, ndsTemperatureRanges } from "./nds-adjustment.js";

/**
 * Fields shared by the timber dowel kinds (nails, screws, lag screws, bolts and dowels): the
 * standard, the shear arrangement, the grain angles and the service conditions of each standard.
 */
export const timberDowelFields = {
  /** Printed name; the trade description is used when absent. */
  label: Text(80).optional(),
  /** Where the fastener's specification comes from (product standard, supplier). */
  source: Text(160).default(""),
  standard: z.enum(timberStandards),
  /** Single shear (two members) or double shear (the fastener crosses two contact lines of the joint). */
  shear: z.enum(["single", "double"]).default("single"),
  /** Angle between the load (along the member) and the grain of the head-side member (both outer members in double shear), degrees. */
  sideAngleToGrainDeg: z.number().min(0).max(180).default(0),
  /** Angle between the load and the grain of the point-side (main) member (the central member in double shear), degrees. */
  mainAngleToGrainDeg: z.number().min(0).max(180).default(0),
  /** NDS-2018 wet service (Table 11.3.3): dry; wet in service (MC over 19 %); fabricated wet, used dry. */
  moisture: z.enum(ndsMoistureConditions).optional(),
  /** NDS-2018 sustained temperature range (Table 11.3.4). */
  temperature: z.enum(ndsTemperatureRanges).optional(),
  /** NDS-2018: fasteners in end grain (C_eg). */
  endGrain: z.boolean().optional(),
  /** EN 1995-1-1 service class (§2.3.1.3). */
  serviceClass: z.union([z.literal(1), z.literal(2), z.literal(3)]).optional(),
  /** EN 1995-1-1: the product of parts of family "panel" (k_mod, embedment). */
  panel: z.enum(["plywood", "osb2", "osb3"]).optional(),
  /** EN 1995-1-1: characteristic withdrawal capacity F_ax,Rk for the rope effect; left out when absent. */
  withdrawalCapacity: positive("connectorForce").optional(),
  /** Fasteners loaded together in one row (a splice rather than a shear-flow row): NDS C_g, EC5 n_ef. */
  groupAction: z
    .strictObject({
      fasteners: z.number().int("must be a whole number").min(2).max(50),
      spacing: positive("length"),
    })
    .optional(),
};

const ndsOnly = ["moisture", "temperature", "endGrain"] as const;
const ec5Only = ["serviceClass", "panel", "withdrawalCapacity"] as const;

/** Refuses options of the other standard, so that a value given is never silently ignored. */
export function refineTimberStandard(value: { standard: TimberStandard } & Record<string, unknown>, ctx: z.RefinementCtx, extraNds: readonly string[] = [], extraEc5: readonly string[] = []) {
  const [foreign, other] = value.standard === "NDS-2018" ? [[...ec5Only, ...extraEc5], "EN1995-1-1"] : [[...ndsOnly, ...extraNds], "NDS-2018"];
  for (const key of foreign) {
    if (value[key] !== undefined) ctx.addIssue({ code: "custom", path: [key], message: `applies to the ${other} only; this connector uses the ${value.standard}` });
  }
}

type Conditions = {
  standard: TimberStandard;
  shear: "single" | "double";
  sideAngleToGrainDeg: number;
  mainAngleToGrainDeg: number;
  moisture?: DowelSpec["nds"]["moisture"] | undefined;
  temperature?: DowelSpec["nds"]["temperature"] | undefined;
  endGrain?: boolean | undefined;
  serviceClass?: 1 | 2 | 3 | undefined;
  panel?: DowelSpec["ec5"]["panel"] | undefined;
  withdrawalCapacity?: number | undefined;
  groupAction?: { fasteners: number; spacing: number } | undefined;
};

/** The condition part of a DowelSpec from the shared fields. */
export function dowelConditions(c: Conditions, ropeCap: number, ropeName: string, toeNailed = false) {
  const rope: RopeEffect = { axialCapacity: c.withdrawalCapacity ?? 0, cap: ropeCap };
  return {
    standard: c.standard,
    shear: c.shear,
    angles: { side: c.sideAngleToGrainDeg, main: c.mainAngleToGrainDeg },
    nds: { moisture: c.moisture ?? "dry", temperature: c.temperature ?? "up-to-100F", endGrain: c.endGrain ?? false, toeNailed },
    ec5Conditions: {
      serviceClass: c.serviceClass ?? 1,
      panel: c.panel ?? "plywood",
      rope,
      ropeNote: c.withdrawalCapacity ? `F_ax,Rk given, ${ropeName}` : "not given: rope effect left out",
    },
    groupAction: c.groupAction ?? null,
  } as const;
}

/** Assumptions common to the timber dowel kinds, for the worksheet. */
export function timberAssumptions(name: string, c: Conditions): string[] {
  const out = [`${name}: loaded laterally along the member by the shear flow; one row's connectors each carry an equal share.`];
  if (c.shear === "double") {
    out.push(`${name}: in double shear the central (main) member is the part between the joint's two contact lines; each outer member is checked with it, both outer members taken alike as the double-shear equations assume, and the weaker governs${c.standard === "NDS-2018" ? " (NDS-2018 Table 12.3.1A, double shear)" : " (EN 1995-1-1 eq. 8.7, 8.11–8.13)"}; a fastener driven from one face may be driven from either, so the shorter penetration into the far outer member is used.`);
  }
  if (c.standard === "NDS-2018") {
    out.push(`${name}: C_D of each combination from its shortest-duration load (dead 0.9, live 1.0, snow 1.15, roof live 1.25, wind 1.6; at most 1.6 for connections) under ASD; λ by the combination's form (its principal load) under LRFD (NDS-2018 §2.3.2, §11.3.2, Table N3).`);
    out.push(`${name}: spacings and distances for full design value (C_Δ = 1.0); ${c.groupAction ? "group action C_g from the row given" : "no group action reduction (C_g = 1.0): each row carries its own tributary shear flow"}.`);
  } else {
    out.push(`${name}: k_mod of each combination from its load-duration class, that of its shortest-duration load as the member's load-duration assumption classes them (EN 1995-1-1 §3.1.3(2), Table 2.2; the working names the class of each combination); γ_M = 1.3 (recommended value; check the national annex); service class ${c.serviceClass ?? 1}.`);
    out.push(`${name}: ${c.withdrawalCapacity ? "rope effect from the withdrawal capacity given, capped per EN 1995-1-1 §8.2.2(2)" : "rope effect left out (no withdrawal capacity given)"}; parts of family "panel" taken as ${c.panel ?? "plywood"}; parts with ρ_k over 500 kg/m³ taken as hardwood for k_90.`);
  }
  return out;
}

export const ndsStandardText = "ANSI/AWC NDS-2018 National Design Specification for Wood Construction: dowel-type fasteners, yield limit equations (§12.3.1, Tables 12.3.1A–B), dowel bearing strength (§12.3.3), adjustment factors (Table 11.3.1)";
export const ec5StandardText = "EN 1995-1-1:2004+A1:2008 Eurocode 5: laterally loaded dowel-type fasteners (§8.2–8.7: Johansen equations eq. 8.6–8.13, embedment strength, yield moment), k_mod (Table 3.1), γ_M (Table 2.3), slip moduli (Table 7.1)";

/** Problems about the diameter or length belong to the size field when the connector was given by its trade size. */
export function onSizeField(problems: PlacementProblem[], sizeField: "size" | "gauge" | null, fields: readonly string[] = ["diameter", "length"]): PlacementProblem[] {
  if (!sizeField) return problems;
  return problems.map((p) => (p.on === "connector" && fields.includes(p.field) ? { ...p, field: sizeField } : p));
}
