import type { DesignResult } from "../core/index.js";

/** What a list of members shows for one result: pass or fail, what governs, how many connectors. */
export interface ResultSummary {
  passes: boolean;
  /** The result's one-sentence status. */
  status: string;
  /** The most utilised item: a schedule, a bond line, a weld or a member check; null when the result has none. */
  governing: { item: string; utilisation: number } | null;
  /** Connectors placed (or checked) in every schedule, all lines. */
  connectors: number;
}

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
