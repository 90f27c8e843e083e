import { z } from "zod";
import { Id, Text, positive } from "../schema/quantity.js";
import type { BondLineKind, BondStrength, ConnectorContext, PlacementProblem } from "./connector-kind.js";

export const GlueLine = z.strictObject({
  id: Id,
  kind: z.literal("glue"),
  label: Text(80).min(1, "must not be empty"),
  /** Shear strength of the adhesive itself on the job's basis, where it limits (a qualified structural adhesive is stronger than the wood: leave it out). */
  shearStrength: positive("stress").optional(),
  source: Text(160).default(""),
});
export type GlueLine = z.infer<typeof GlueLine>;

/**
 * A structural adhesive bond line, checked by τ = q/t against the weakest of the adhesive (where
 * given) and each adherend: its rolling shear strength where the material has cross-layers (a
 * rolling shear strength is given), its shear strength otherwise.
 */
export const glueKind: BondLineKind<GlueLine> = {
  kind: "glue",
  mechanism: "bond-line",
  schema: GlueLine,
  describe: (c) => c.label,
  standards: (c) => (c.source ? [`Bond-line strength: ${c.source}`] : []),
  assumptions: (c) => [
    `${c.label}: the bond line is rigid and carries the whole shear flow over the full contact width; its strength is the lowest of ${c.shearStrength !== undefined ? "the adhesive value given and " : ""}each adherend's shear strength, or its rolling shear strength where the material has cross-layers (common practice [CP]: structural adhesives qualified to EN 301, EN 15425 or ASTM D2559 are stronger than the wood).`,
  ],
  problems: (c, context: ConnectorContext): PlacementProblem[] => {
    const known = context.adherends.some((a) => a.shearStrength !== undefined || a.rollingShear !== undefined);
    return c.shearStrength === undefined && !known
      ? [{ on: "connector", field: "shearStrength", message: "is needed: neither the adhesive nor the joined materials give a shear strength to check the bond line against" }]
      : [];
  },
  shearStrength: (c, context) => {
    const steps: BondStrength["steps"] = [];
    let value = Infinity;
    let governing = "";
    if (c.shearStrength !== undefined) {
      steps.push({ symbol: "f_bond", description: "adhesive shear strength given", value: c.shearStrength, quantity: "stress" });
      value = c.shearStrength;
      governing = "bond line (value given)";
    }
    for (const a of context.adherends) {
      const rolling = a.rollingShear !== undefined;
      const f = rolling ? a.rollingShear! : a.shearStrength;
      if (f === undefined) continue;
      steps.push({ symbol: rolling ? "f_r" : "f_v", description: rolling ? `rolling shear strength of ${a.material} (cross-layers meet the bond line)` : `shear strength of ${a.material}`, value: f, quantity: "stress" });
      if (f < value) {
        value = f;
        governing = rolling ? `rolling shear in ${a.material}` : `adherend ${a.material}`;
      }
    }
    return { value, governing, reference: c.source || "strengths given in the job", steps };
  },
};
