import { z } from "zod";
import { Id, Text, positive } from "../schema/quantity.js";
import type { BondLineKind } from "./connector-kind.js";

export const GlueLine = z.strictObject({
  id: Id,
  kind: z.literal("glue"),
  label: Text(80).min(1, "must not be empty"),
  /** Shear strength of the bond line on the job's basis, stress. */
  shearStrength: positive("stress"),
  source: Text(160).default(""),
});
export type GlueLine = z.infer<typeof GlueLine>;

/** A structural adhesive bond line, checked by τ = q/t against the weaker of the adhesive and the adherends. */
export const glueKind: BondLineKind<GlueLine> = {
  kind: "glue",
  mechanism: "bond-line",
  schema: GlueLine,
  describe: (c) => c.label,
  standards: (c) => (c.source ? [`Bond-line strength: ${c.source}`] : []),
  assumptions: (c) => [
    `${c.label}: the bond line is rigid and carries the whole shear flow over the full contact width; its strength is the lower of the value given and the shear strength of each adherend where the material gives one (common practice: qualified structural adhesives are stronger than the wood).`,
  ],
  shearStrength: (c, context) => {
    const steps = [
      { symbol: "f_bond", description: "bond-line shear strength given", value: c.shearStrength, quantity: "stress" as const },
    ];
    let value = c.shearStrength;
    let governing = "bond line (value given)";
    for (const a of context.adherends) {
      if (a.shearStrength === undefined) continue;
      steps.push({ symbol: "f_v", description: `shear strength of ${a.material}`, value: a.shearStrength, quantity: "stress" });
      if (a.shearStrength < value) {
        value = a.shearStrength;
        governing = `adherend ${a.material}`;
      }
    }
    return { value, governing, reference: c.source || "strength given by the user", steps };
  },
};
