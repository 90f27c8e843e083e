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
export function deflectionChecks(beam: BeamAnalysis, limits: Beam["deflectionLimits"], spanUnit: (mm: number) => string): DeflectionChecks {
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
      const worst = largestIn(c.entries, region.x0, region.x1);
      const basis = region.kind === "overhang" ? `2 × ${spanUnit(length)}/${c.ratio}` : `span/${c.ratio}`;
      checks.push({
        id: `deflection-${c.key}${many ? `-${region.spans[0]}` : ""}`,
        title: `Deflection under ${c.what}${many ? `, ${region.label}` : ""}, limit ${basis}`,
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
  const notChecked: string[] = ["Long-term deflection (creep) and the extra deflection from slip of mechanical connectors."];
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
