import type { Beam } from "../schema/beam.js";
import type { MemberCheck } from "../schema/result.js";
import type { BeamAnalysis, CombinationActions } from "./analyse-beam.js";
import { deflectionExtremes } from "./member-actions.js";

export interface DeflectionChecks {
  checks: MemberCheck[];
  notChecked: string[];
}

/**
 * Deflection of each span and overhang under service loads against span/ratio: the total limit under
 * every load as entered, the live limit under the categories of `liveCategories` alone. The measure is
 * the largest deflection, down or up, inside the region. A cantilever or overhang is checked on twice
 * its length (common practice [CP]; codes state limits for spans between supports).
 */
export function deflectionChecks(
  beam: BeamAnalysis,
  limits: Beam["deflectionLimits"],
  spanUnit: (mm: number) => string,
  /** Slip of mechanical connectors: deflections scale by (EI)_rigid/(EI)_ef, and by the final stiffness for the long-term check. */
  stiffness: { factor: number; finalFactor: number | null; note: string } | null = null,
): DeflectionChecks {
  if (!beam.service) {
    return {
      checks: [],
      notChecked: [
        "Deflection: the loads were entered factored (combination set \"unfactored\" on the factored basis), so no service-load deflection is checked.",
        "Long-term deflection (creep) and the extra deflection from slip of mechanical connectors.",
      ],
    };
  }
  const checks: MemberCheck[] = [];
  const many = beam.regions.length > 1;
  const cases = [
    { key: "total", ratio: limits.total, entries: beam.service.total, what: "all loads" },
    { key: "live", ratio: limits.live, entries: beam.service.live, what: beam.service.liveCategories.join(" + ") || limits.liveCategories.join(" + ") },
  ] as const;
  for (const c of cases) {
    if (c.entries.length === 0) continue;
    beam.regions.forEach((region, i) => {
      const length = region.x1 - region.x0;
      const measured = region.kind === "overhang" ? 2 * length : length;
      const limit = measured / c.ratio;
      const measuredWorst = largestIn(c.entries, region.x0, region.x1);
      const worst = { ...measuredWorst, value: measuredWorst.value * (stiffness?.factor ?? 1) };
      const basis = region.kind === "overhang" ? `2 × ${spanUnit(length)}/${c.ratio}` : `span/${c.ratio}`;
      checks.push({
        id: `deflection-${c.key}${many ? `-${region.spans[0]}` : ""}`,
        title: `Deflection under ${c.what}${many ? `, ${region.label}` : ""}, limit ${basis}${stiffness ? ` (${stiffness.note})` : ""}`,
        quantity: "deflection",
        demand: worst.value,
        capacity: limit,
        utilisation: worst.value / limit,
        passes: worst.value <= limit * (1 + 1e-9),
        combination: worst.combination,
        at: worst.x,
        reference:
          region.kind === "overhang"
            ? `limit set in the job, on twice the overhang length (common practice for cantilevers)`
            : `limit set in the job (span/${c.key === "total" ? 240 : 360} is the common default for ${c.key === "total" ? "total" : "live"} load, e.g. IBC Table 1604.3)`,
      });
    });
  }
  if (stiffness?.finalFactor) {
    beam.regions.forEach((region) => {
      const length = region.x1 - region.x0;
      const measured = region.kind === "overhang" ? 2 * length : length;
      const limit = measured / limits.total;
      const w = largestIn(beam.service!.total, region.x0, region.x1);
      const value = w.value * stiffness.finalFactor!;
      checks.push({
        id: `deflection-final${many ? `-${region.spans[0]}` : ""}`,
        title: `Final (long-term) deflection under all loads${many ? `, ${region.label}` : ""}, limit span/${limits.total}`,
        quantity: "deflection",
        demand: value,
        capacity: limit,
        utilisation: value / limit,
        passes: value <= limit * (1 + 1e-9),
        combination: w.combination,
        at: w.x,
        reference: "every load with the final stiffness (E/(1 + ψ2·k_def), K_ser/(1 + ψ2·k_def,c)), EN 1995-1-1 §2.3.2.2 [M]: conservative for permanent loads, which take ψ2 = 1",
      });
    });
  }
  const notChecked: string[] = [
    ...(stiffness?.finalFactor ? [] : ["Long-term deflection (creep)" + (stiffness ? "; give ψ2 and k_def under compositeAction.longTerm to check it." : " and the extra deflection from slip of mechanical connectors (choose the slip-aware model).")]),
  ];
  if (beam.service.live.length === 0) notChecked.push(`Deflection under ${limits.liveCategories.join(", ")} alone: the job has no such loads.`);
  return { checks, notChecked };
}

function largestIn(entries: CombinationActions[], a: number, b: number): { value: number; x: number; combination: string } {
  let worst = { value: 0, x: a, combination: entries[0]?.combination.id ?? "" };
  for (const e of entries) {
    const { down, up } = deflectionExtremes(e.curve, a, b);
    for (const d of [down, up]) if (d.value > worst.value) worst = { value: d.value, x: d.x, combination: e.combination.id };
  }
  return worst;
}
