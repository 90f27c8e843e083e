import type { WeldResult } from "../../core/schema/result.js";
import type { WorksheetContext } from "./worksheet-context.js";

export type WeldJoint = WeldResult;
export type WeldZone = WeldResult["zones"][number];

/** Share of a zone's line that is welded: segment ÷ pitch for an intermittent zone, 1 for a continuous one. */
export const weldedShare = (z: WeldZone) => (z.pattern === "intermittent" && z.segmentLength !== null && z.pitch !== null ? z.segmentLength / z.pitch : 1);

/** A zone as it is built: "continuous", "2 in @ 5 in". */
export function weldZoneText(c: WorksheetContext, z: WeldZone): string {
  return z.pattern === "intermittent" && z.segmentLength !== null && z.pitch !== null ? `${c.text.of(z.segmentLength, "length")} @ ${c.text.of(z.pitch, "length")}` : "continuous";
}

/** The zone holding x: from its start up to its end, the last zone including the member end. */
export const zoneAt = (w: WeldJoint, x: number): WeldZone | undefined =>
  w.zones.find((z, i) => x >= z.from - 1e-9 && (i === w.zones.length - 1 ? x <= z.to + 1e-9 : x < z.to - 1e-9)) ?? w.zones[0];
