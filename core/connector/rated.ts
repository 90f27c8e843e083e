import { z } from "zod";
import { Id, Text, positive, quantity } from "../schema/quantity.js";
import type { ConnectorContext, DiscreteConnectorKind, PlacementProblem, WorkingStep } from "./connector-kind.js";

export const RatedConnector = z
  .strictObject({
    id: Id,
    kind: z.literal("rated"),
    label: Text(80).min(1, "must not be empty"),
    /** Resistance of one connector on its basis (below), connectorForce. */
    resistance: positive("connectorForce"),
    /**
     * What the resistance is: an allowable (ASD) value, a design (LRFD or limit-state) value, or a
     * characteristic value turned into a design value by the partial factor. The job's basis when absent.
     */
    resistanceBasis: z.enum(["allowable", "design", "characteristic"]).optional(),
    /** γ_M for a characteristic resistance: R_d = k_mod R_k/γ_M. */
    partialFactor: z.number().min(1, "must be at least 1").max(3).optional(),
    /** k_mod (or another modification factor) for a characteristic resistance; 1.0 when absent. */
    modificationFactor: z.number().positive().max(2).optional(),
    /** Slip modulus of one connector at serviceability, K_ser. */
    slipModulus: positive("slipModulus").optional(),
    /** Slip modulus at the ultimate limit state, K_u; 2/3 K_ser when absent (EN 1995-1-1 eq. 2.1). */
    ultimateSlipModulus: positive("slipModulus").optional(),
    /** Where the rating comes from: an evaluation report, a table, a test. */
    source: Text(160).default(""),
    minSpacing: positive("length"),
    maxSpacing: positive("length").optional(),
    endDistance: quantity("length", z.number().nonnegative()).default(0),
  })
  .superRefine((c, ctx) => {
    if (c.resistanceBasis === "characteristic" && c.partialFactor === undefined) ctx.addIssue({ code: "custom", path: ["partialFactor"], message: "is required for a characteristic resistance (R_d = k_mod R_k/γ_M)" });
    if (c.resistanceBasis !== "characteristic") {
      for (const key of ["partialFactor", "modificationFactor"] as const) if (c[key] !== undefined) ctx.addIssue({ code: "custom", path: [key], message: "applies to a characteristic resistance only" });
    }
    if (c.ultimateSlipModulus !== undefined && c.slipModulus === undefined) ctx.addIssue({ code: "custom", path: ["slipModulus"], message: "is required when the ultimate slip modulus is given" });
  });
export type RatedConnector = z.infer<typeof RatedConnector>;

const designValue = (c: RatedConnector) => (c.resistanceBasis === "characteristic" ? ((c.modificationFactor ?? 1) * c.resistance) / c.partialFactor! : c.resistance);

/** A connector whose resistance the user rates: proprietary screws, evaluation-report values. */
export const ratedKind: DiscreteConnectorKind<RatedConnector> = {
  kind: "rated",
  mechanism: "discrete",
  schema: RatedConnector,
  describe: (c) => c.label,
  standards: (c) => (c.source ? [`Connector rating: ${c.source}`] : []),
  assumptions: (c) => [
    c.resistanceBasis === "characteristic"
      ? `${c.label}: design resistance k_mod R_k/γ_M from the characteristic rating (k_mod = ${c.modificationFactor ?? 1}, γ_M = ${c.partialFactor}), applied unchanged to every load combination.`
      : `${c.label}: the resistance per connector is the user's rating on the job's basis, applied unchanged to every load combination.`,
  ],
  problems: (c, context: ConnectorContext): PlacementProblem[] => {
    const basis = c.resistanceBasis;
    if (basis === "allowable" && context.basis === "factored") return [{ on: "connector", field: "resistanceBasis", message: `an allowable (ASD) rating cannot be compared with factored loads; give a design or characteristic rating, or set the job's basis to "allowable"` }];
    if ((basis === "design" || basis === "characteristic") && context.basis === "allowable") return [{ on: "connector", field: "resistanceBasis", message: `a ${basis} rating cannot be compared with service (allowable-basis) loads; give an allowable rating, or set the job's basis to "factored"` }];
    return [];
  },
  resistance: (c) => {
    const steps: WorkingStep[] = [{ symbol: c.resistanceBasis === "characteristic" ? "R_k" : "R", description: `rated resistance per connector${c.resistanceBasis ? ` (${c.resistanceBasis})` : ""}`, value: c.resistance, quantity: "connectorForce" }];
    if (c.resistanceBasis === "characteristic") {
      steps.push({ symbol: "k_mod", description: "modification factor given", value: c.modificationFactor ?? 1, quantity: "ratio" });
      steps.push({ symbol: "γ_M", description: "partial factor given", value: c.partialFactor!, quantity: "ratio" });
      steps.push({ symbol: "R_d", description: "design resistance k_mod R_k/γ_M", value: designValue(c), quantity: "connectorForce" });
    }
    const slip = c.slipModulus === undefined ? null : { serviceability: c.slipModulus, ultimate: c.ultimateSlipModulus ?? (2 / 3) * c.slipModulus, reference: c.ultimateSlipModulus === undefined ? "K_ser given; K_u = 2/3 K_ser (EN 1995-1-1 eq. 2.1)" : "given" };
    return {
      value: designValue(c),
      governing: "user rating",
      reference: c.source || "rating given by the user",
      steps,
      modes: [],
      slip,
      warnings: [],
    };
  },
  detailing: (c) => ({
    minSpacing: c.minSpacing,
    maxSpacing: c.maxSpacing ?? null,
    endDistance: c.endDistance,
    sources: ["spacing and end distance as given by the user"],
  }),
};
