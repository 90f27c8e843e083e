import { z } from "zod";
import type { ConnectorKind } from "./connector-kind.js";
import { FilletWeld, filletWeldKind } from "./fillet-weld.js";
import { GlueLine, glueKind } from "./glue-line.js";
import { LagScrew, lagScrewKind } from "./lag-screw.js";
import { Nail, nailKind } from "./nail.js";
import { RatedConnector, ratedKind } from "./rated.js";
import { SteelBolt, steelBoltKind } from "./steel-bolt.js";
import { TimberBolt, timberBoltKind } from "./timber-bolt.js";
import { WoodScrew, woodScrewKind } from "./wood-screw.js";

/** Every connector kind the job document accepts: add a kind's object and its schema here, nowhere else. */
export const connectorKinds = [ratedKind, glueKind, nailKind, woodScrewKind, lagScrewKind, timberBoltKind, steelBoltKind, filletWeldKind] as const;

export const Connector = z.discriminatedUnion("kind", [RatedConnector, GlueLine, Nail, WoodScrew, LagScrew, TimberBolt, SteelBolt, FilletWeld], {
  error: (issue) => (issue.code === "invalid_union" ? `kind must be one of: ${connectorKinds.map((k) => k.kind).join(", ")}` : undefined),
});
export type Connector = z.infer<typeof Connector>;

export function kindOf(connector: Connector): ConnectorKind<Connector> {
  const found = connectorKinds.find((k) => k.kind === connector.kind);
  if (!found) throw new Error(`no connector kind registered for "${connector.kind}"`);
  return found as unknown as ConnectorKind<Connector>;
}
