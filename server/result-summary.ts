import type { DesignResult } from "../core/index.js";
import type { ResultSummary } from "../core/schema/store-contract.js";

export type { ResultSummary };


/** Utilisations and counts are pure numbers, so a result in any unit system gives the same summary. */
export function summariseResult(result: DesignResult): ResultSummary {
  const items: { item: string; utilisation: number }[] = [
    ...result.schedules.map((s) => ({ item: `joint ${s.joint}: ${s.connectorLabel || s.connector}`, utilisation: s.verification.maxUtilisation })),
    ...result.bondLines.map((b) => ({ item: `joint ${b.joint}: bond line`, utilisation: b.utilisation })),
    ...(result.welds ?? []).map((w) => ({ item: `joint ${w.joint}: ${w.connectorLabel || "weld"}`, utilisation: w.utilisation })),
    ...result.checks.map((c) => ({ item: c.title, utilisation: c.utilisation })),
  ];
  let governing: ResultSummary["governing"] = null;
  for (const candidate of items) {
    const u = Number.isFinite(candidate.utilisation) ? candidate.utilisation : Number.MAX_VALUE;
    if (!governing || u > governing.utilisation) governing = { item: candidate.item, utilisation: u };
  }
  return {
    passes: result.status.passes,
    status: result.status.summary,
    governing,
    connectors: result.schedules.reduce((n, s) => n + s.count, 0),
  };
}
