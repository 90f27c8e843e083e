import { maxAbsShear } from "../beam/member-actions.js";
import type { WeldKind, WeldResistance } from "../connector/connector-kind.js";
import type { Connector } from "../connector/registry.js";
import type { WeldResult } from "../schema/result.js";
import { allowedSpacings } from "../spacing/allowed-spacings.js";
import { checkSchedule } from "../spacing/check-schedule.js";
import { staggeredSide } from "../spacing/place-rows.js";
import type { RowUtilisation } from "../spacing/verify-rows.js";
import type { DemandCurve } from "../spacing/demand.js";
import { demandCurve, designSchedule } from "../spacing/design-schedule.js";
import { spacingPractice } from "../spacing/spacing-defaults.js";
import { inJobUnits } from "../units/format.js";
import { toCore } from "../units/quantity.js";
import { demandActionsOf, lineFlow, type JointInput } from "./discrete-schedule.js";
import { memoisedByLoading } from "./connector-context.js";

const leastOf = <T extends { value: number }>(values: T[]) => values.reduce((a, b) => (b.value < a.value ? b : a));

type CheckedZone = { from: number; to: number; spacing: number; utilisation: number; passes: boolean; failingCombinations: string[] };

/**
 * The weld of a joint. An intermittent weld is laid out like rows of connectors: each segment of
 * length L_s carries R_w·L_s per fillet over its pitch, so zones of pitch are chosen for the least
 * weld (pitch = L_s is a continuous weld). A continuous weld is checked along the member; where even
 * a continuous weld of the given size cannot carry the flow, the leg size that would is reported.
 */
export function weldSchedule(input: JointInput, kind: WeldKind<Connector>): { weld: WeldResult; warnings: string[] } {
  const { job, beam, stations, joint, connector, fastening, contexts, flowFactor } = input;
  const fillets = fastening.rows;
  const lineCount = joint.lines.length;
  const strengths: WeldResistance[] = memoisedByLoading(contexts, (c) => kind.resistancePerLength(connector, c)).map(leastOf);
  const warnings = [...new Set(strengths.flatMap((s) => s.warnings ?? []))];
  const thinnest = contexts[0]!.reduce((a, b) => (Math.min(b.members[0].thickness, b.members[1].thickness) < Math.min(a.members[0].thickness, a.members[1].thickness) ? b : a));
  const limits = kind.detailing(connector, thinnest);
  const layout = kind.layout(connector);
  const len = (mm: number) => inJobUnits(mm, "length", job.units);
  const actions = demandActionsOf(input);

  // Ratio of the flow per line to what a continuous weld of the given size carries, per combination.
  const continuousRatio = Math.max(
    ...actions.map((a, i) => (maxAbsShear(a, 0, beam.length).value * flowFactor) / lineCount / (fillets * strengths[i]!.value)),
  );
  const defaults = spacingPractice(job);
  const sizeStep = defaults.system === "us" ? 25.4 / 16 : 1;
  const sizeNeeded = continuousRatio > 1 + 1e-9 ? Math.ceil((limits.size * continuousRatio) / sizeStep - 1e-9) * sizeStep : null;

  const segment = layout.pattern === "intermittent" ? layout.segmentLength! : Math.max(limits.minSegmentLength, sizeStep);
  const module = job.spacing.module ?? defaults.module;
  const pitchLimits = [limits.maxPitch, limits.maxGap !== null ? limits.maxGap + segment : null, layout.pattern === "intermittent" ? layout.pitch : null].filter((v): v is number => v !== null);
  const maxPitch = Math.max(segment, Math.min(...pitchLimits, defaults.maxSpacing));
  const pitches = [...new Set([segment, ...allowedSpacings({ module, preferred: null, min: segment, max: maxPitch })])].sort((a, b) => a - b);
  const problem = {
    length: beam.length,
    combinations: beam.results.map((r, i) => ({ id: r.combination.id, actions: actions[i]!, resistance: strengths[i]!.value * segment })),
    flowFactor,
    lines: lineCount,
    rows: fillets,
  };
  const toZones = (zones: CheckedZone[]) =>
    zones.map((z) => ({
      from: z.from,
      to: z.to,
      pattern: z.spacing <= segment * (1 + 1e-9) ? ("continuous" as const) : ("intermittent" as const),
      segmentLength: z.spacing <= segment * (1 + 1e-9) ? null : segment,
      pitch: z.spacing <= segment * (1 + 1e-9) ? null : z.spacing,
      utilisation: z.utilisation,
      passes: z.passes,
      failingCombinations: z.failingCombinations,
    }));

  // A staggered weld has half its fillets at the near-side segments and half at the far side's
  // (staggeredSide): each side is checked on its own segments, and the zones take the worse of the two.
  const staggered = layout.arrangement === "staggered" && fillets >= 2 && fillets % 2 === 0;
  const withOtherSide = (near: { positions: number[]; rowChecks: RowUtilisation[]; zones: CheckedZone[] }, demand: DemandCurve) => {
    const nearWorst = near.rowChecks.reduce((w, r) => (r.utilisation > w.utilisation ? r : w));
    const intermittent = near.zones.some((z) => z.spacing > segment * (1 + 1e-9));
    if (!staggered || !intermittent) {
      return { positions: near.positions, zones: near.zones, worst: { utilisation: nearWorst.utilisation, at: nearWorst.x, combination: nearWorst.combination }, perLine: Math.min(beam.length, near.positions.length * segment) };
    }
    const far = checkSchedule({ demand, rows: fillets, lines: lineCount, endDistance: segment / 2, provided: { zones: near.zones, positions: staggeredSide(near.positions) } });
    const farWorst = far.rowChecks.reduce((w, r) => (r.utilisation > w.utilisation ? r : w));
    const worst = farWorst.utilisation > nearWorst.utilisation ? farWorst : nearWorst;
    const zones = near.zones.map((z, i) => {
      const f = far.zones[i]!;
      const u = Math.max(z.utilisation, f.utilisation);
      return { ...z, utilisation: u, passes: u <= 1 + 1e-9, failingCombinations: [...new Set([...z.failingCombinations, ...f.failingCombinations])] };
    });
    // Weld per line, as an average over the two sides' fillets.
    const perLine = (Math.min(beam.length, near.positions.length * segment) + Math.min(beam.length, far.positions.length * segment)) / 2;
    return { positions: near.positions, zones, worst: { utilisation: worst.utilisation, at: worst.x, combination: worst.combination }, perLine };
  };

  const mode: WeldResult["mode"] = job.mode === "check" ? "check" : "design";
  let zones: WeldResult["zones"];
  let utilisation: number;
  let at = 0;
  let combination = beam.results[0]?.combination.id ?? "";
  let weldPerLine: number;
  let positions: number[] = [];
  // A continuous weld is checked as one; an intermittent one is zoned (design) or checked as provided.
  if (layout.pattern === "continuous" && !(job.mode === "check" && fastening.provided)) {
    const worst = beam.results
      .map((r, i) => {
        const v = maxAbsShear(actions[i]!, 0, beam.length);
        return { u: (v.value * flowFactor) / lineCount / (fillets * strengths[i]!.value), x: v.x, id: r.combination.id };
      })
      .reduce((a, b) => (b.u > a.u ? b : a));
    utilisation = worst.u;
    at = worst.x;
    combination = worst.id;
    zones = [{ from: 0, to: beam.length, pattern: "continuous", segmentLength: null, pitch: null, utilisation, passes: utilisation <= 1 + 1e-9, failingCombinations: utilisation > 1 + 1e-9 ? [worst.id] : [] }];
    weldPerLine = beam.length;
  } else if (job.mode === "check") {
    const provided = fastening.provided?.type === "zones" ? fastening.provided.zones : [{ from: 0, to: beam.length, spacing: layout.pitch ?? segment }];
    const demand = demandCurve(problem);
    const check = withOtherSide(checkSchedule({ demand, rows: fillets, lines: lineCount, endDistance: segment / 2, provided: { zones: provided } }), demand);
    ({ utilisation, at, combination } = check.worst);
    zones = toZones(check.zones);
    positions = check.positions;
    weldPerLine = check.perLine;
  } else {
    const design = designSchedule({
      ...problem,
      minSpacing: segment,
      maxSpacing: maxPitch,
      module: null,
      preferred: pitches,
      endDistance: segment / 2,
      minZoneLength: job.spacing.minZoneLength ?? defaults.minZoneLength,
      maxZones: job.spacing.maxZonesPerSpan * beam.spans.length,
      symmetric: job.spacing.symmetric,
      system: defaults.system,
    });
    const checked = withOtherSide(design, design.demand);
    ({ utilisation, at, combination } = checked.worst);
    zones = toZones(checked.zones);
    positions = checked.positions;
    weldPerLine = checked.perLine;
  }

  return {
    warnings,
    weld: {
      mode,
      joint: joint.id,
      connector: connector.id,
      connectorLabel: kind.describe(connector),
      fillets,
      lineCount,
      pattern: layout.pattern,
      segmentLength: layout.segmentLength,
      pitch: layout.pitch,
      arrangement: layout.arrangement,
      resistance: strengths.map((s, i) => ({ combination: beam.results[i]!.combination.id, value: s.value, governing: s.governing, reference: s.reference, steps: s.steps, modes: s.modes ?? [], warnings: s.warnings ?? [] })),
      limits,
      zones,
      // Segments only where some zone is intermittent; zones all at pitch = segment make a continuous weld.
      positions: zones.some((z) => z.pattern === "intermittent") ? positions : [],
      weldLength: weldPerLine * fillets * lineCount,
      sizeNeeded,
      sizeNote:
        sizeNeeded === null
          ? null
          : `A continuous weld of ${len(limits.size)} carries ${(1 / continuousRatio).toFixed(2)} of the peak flow; a leg of ${len(sizeNeeded)} is needed${sizeNeeded > limits.maxSize ? `, above the largest ${len(limits.maxSize)} the parts allow: use a stronger electrode, more fillets or thicker parts` : ""}.`,
      maxShearFlow: Math.max(...lineFlow(actions, stations, flowFactor, lineCount)),
      at,
      combination,
      utilisation,
      passes: utilisation <= 1 + 1e-9,
      shearFlow: lineFlow(actions, stations, flowFactor, lineCount),
    },
  };
}
