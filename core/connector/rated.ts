import { z } from "zod";
import { Id, Text, positive, quantity } from "../schema/quantity.js";
import type { DiscreteConnectorKind } from "./connector-kind.js";

export const RatedConnector = z.strictObject({
  id: Id,
  kind: z.literal("rated"),
  label: Text(80).min(1, "must not be empty"),
  /** Resistance of one connector on the job's basis (allowable or design value), connectorForce. */
  resistance: positive("connectorForce"),
  /** Where the rating comes from: an evaluation report, a table, a test. */
  source: Text(160).default(""),
  minSpacing: positive("length"),
  maxSpacing: positive("length").optional(),
  endDistance: quantity("length", z.number().nonnegative()).default(0),
});
export type RatedConnector = z.infer<typeof RatedConnector>;

/** A connector whose resistance the user rates: proprietary screws, evaluation-report values. */
export const ratedKind: DiscreteConnectorKind<RatedConnector> = {
  kind: "rated",
  mechanism: "discrete",
  schema: RatedConnector,
  describe: (c) => c.label,
  standards: (c) => (c.source ? [`Connector rating: ${c.source}`] : []),
  assumptions: (c) => [
    `${c.label}: the resistance per connector is the user's rating on the job's basis, applied unchanged to every load combination.`,
  ],
  resistance: (c) => ({
    value: c.resistance,
    governing: "user rating",
    reference: c.source || "rating given by the user",
    steps: [{ symbol: "R", description: "rated resistance per connector", value: c.resistance, quantity: "connectorForce" }],
  }),
  detailing: (c) => ({
    minSpacing: c.minSpacing,
    maxSpacing: c.maxSpacing ?? null,
    endDistance: c.endDistance,
    sources: ["spacing and end distance as given by the user"],
  }),
};
