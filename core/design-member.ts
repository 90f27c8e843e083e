import { analyseBeam, type BeamAnalysis } from "./beam/analyse-beam.js";
import { combinationsOf } from "./beam/combinations.js";
import { beamAssumptions } from "./beam/beam-assumptions.js";
import { beamResult } from "./beam/beam-result.js";
import { maxAbsShear, shearAt } from "./beam/member-actions.js";
import { stationsFor } from "./beam/stations.js";
import { checkBondLine } from "./checks/bond-line.js";
import { memberChecks } from "./checks/member-checks.js";
import { governingLimits, type ConnectorContext, type JoinedMember } from "./connector/connector-kind.js";
import { kindOf, type Connector } from "./connector/registry.js";
import type { JobDocument } from "./schema/job.js";
import { RESULT_FORMAT, RESULT_VERSION, type BondLineResult, type Combination, type DesignResult, type JointResult, type Schedule, type WeldResult } from "./schema/result.js";
import { findContacts, geometricTolerance, type ContactLine } from "./section/contacts.js";
import { findJoints, jointForHeldGroup, type JointPlane } from "./section/joints.js";
import { buildSection, extremeFibre, firstMomentAbove, positioned, widthAt, type SectionModel } from "./section/section-model.js";
import { stressProfile } from "./section/stress-profile.js";
import { designSchedule } from "./spacing/design-schedule.js";
import { spacingDefaults } from "./spacing/spacing-defaults.js";
import { toCore, unitLabels } from "./units/quantity.js";
import { PROGRAM } from "./version.js";

/**
 * The whole job: a valid job document in core units (see `prepareJob`) → the result in core units.
 * Pure: no I/O, no clock.
 */
export function designMember(job: JobDocument): DesignResult {
  const section = buildSection(positioned(job.parts), job.materials);
  const contacts = findContacts(section);
  const joints = jointsOf(job, section, contacts);
  const combinations = combinationsOf(job);
  const beam = analyseBeam(job, section, combinations);
  const stations = stationsFor(beam.length, [...new Set(beam.results.flatMap((r) => r.actions.breaks))]);
  const profile = stressProfile(section);
  const I = section.secondMoment;

  const schedules: Schedule[] = [];
  const bondLines: BondLineResult[] = [];
  const welds: WeldResult[] = [];
  const jointResults: JointResult[] = [];
  const assumptions = new Set<string>();
  const standards = new Set<string>();
  const warnings: string[] = [];

  for (const { joint, connector, rows, headSide } of joints) {
    const kind = kindOf(connector);
    kind.assumptions(connector).forEach((a) => assumptions.add(a));
    kind.standards(connector).forEach((s) => standards.add(s));
    const lineCount = joint.lines.length;
    const flowFactor = joint.firstMoment / I;
    const stressFactor = joint.firstMoment / (I * joint.contactWidth);
    jointResults.push({
      id: joint.id,
      held: joint.held,
      found: joint.found,
      lines: joint.lines.map((l) => ({ between: [l.a, l.b], orientation: l.orientation, level: l.level, from: l.from, to: l.to, length: l.length })),
      contactWidth: joint.contactWidth,
      firstMoment: joint.firstMoment,
      flowFactor,
      stressFactor,
      connector: connector.id,
      connectorLabel: kind.describe(connector),
      mechanism: kind.mechanism,
      rows,
      sharing:
        lineCount > 1
          ? `q is shared equally by the ${lineCount} contact lines (the same connector on each, so equal stiffness).`
          : "One contact line carries the whole shear flow.",
    });
    // One context per combination and contact line; a combination's resistance is the least over the lines.
    const contexts = beam.results.map((r) => joint.lines.map((line) => contextFor(r.combination, job, joint, line, headSide, rows, section)));
    const leastOf = <T extends { value: number }>(values: T[]) => values.reduce((a, b) => (b.value < a.value ? b : a));

    if (kind.mechanism === "bond-line") {
      const strengths = contexts.map((lines) => leastOf(lines.map((c) => kind.shearStrength(connector, c))));
      const check = checkBondLine(beam, stressFactor, strengths, stations);
      bondLines.push({
        joint: joint.id,
        connector: connector.id,
        connectorLabel: kind.describe(connector),
        width: joint.contactWidth,
        strength: strengths.map((s, i) => ({ combination: beam.results[i]!.combination.id, value: s.value, governing: s.governing, reference: s.reference, steps: s.steps })),
        maxStress: check.maxStress,
        at: check.at,
        combination: check.combination,
        utilisation: check.utilisation,
        passes: check.passes,
        stress: check.stress,
      });
      continue;
    }

    if (kind.mechanism === "weld") {
      // A continuous (or given intermittent) weld checked against the shear flow per line; the zoned intermittent schedule comes later.
      const strengths = contexts.map((lines) => leastOf(lines.map((c) => kind.resistancePerLength(connector, c))));
      const layout = kind.layout(connector);
      const fraction = layout.pattern === "intermittent" && layout.segmentLength !== null && layout.pitch !== null ? layout.segmentLength / layout.pitch : 1;
      const weldLimits = kind.detailing(connector, contexts[0]!.reduce((a, b) => (Math.min(b.members[0].thickness, b.members[1].thickness) < Math.min(a.members[0].thickness, a.members[1].thickness) ? b : a)));
      let worst = { utilisation: 0, flow: 0, at: 0, combination: beam.results[0]?.combination.id ?? "" };
      beam.results.forEach((r, i) => {
        const v = maxAbsShear(r.actions, 0, beam.length);
        const flow = (v.value * flowFactor) / lineCount;
        const u = flow / (rows * strengths[i]!.value * fraction);
        if (u > worst.utilisation) worst = { utilisation: u, flow, at: v.x, combination: r.combination.id };
      });
      strengths.forEach((s) => s.warnings?.forEach((w) => warnings.includes(w) || warnings.push(w)));
      welds.push({
        joint: joint.id,
        connector: connector.id,
        connectorLabel: kind.describe(connector),
        fillets: rows,
        lineCount,
        pattern: layout.pattern,
        segmentLength: layout.segmentLength,
        pitch: layout.pitch,
        resistance: strengths.map((s, i) => ({ combination: beam.results[i]!.combination.id, value: s.value, governing: s.governing, reference: s.reference, steps: s.steps, modes: s.modes ?? [], warnings: s.warnings ?? [] })),
        limits: weldLimits,
        maxShearFlow: worst.flow,
        at: worst.at,
        combination: worst.combination,
        utilisation: worst.utilisation,
        passes: worst.utilisation <= 1 + 1e-9,
        shearFlow: stations.map((s) => (Math.max(...beam.results.map((r) => Math.abs(shearAt(r.actions, s.x, s.side)))) * flowFactor) / lineCount),
      });
      continue;
    }

    const resistances = contexts.map((lines) => leastOf(lines.map((c) => kind.resistance(connector, c))));
    resistances.forEach((r) => r.warnings?.forEach((w) => warnings.includes(w) || warnings.push(w)));
    const limits = governingLimits(contexts[0]!.map((c) => kind.detailing(connector, c)));
    const defaults = spacingDefaults(job.units);
    const coreDefault = (v: number) => toCore(v, "length", job.units);
    const minSpacing = Math.max(limits.minSpacing, job.spacing.minimum ?? 0);
    const maxSpacing = Math.min(limits.maxSpacing ?? coreDefault(defaults.maxSpacing), job.spacing.maximum ?? Infinity);
    const module = job.spacing.preferred ? null : job.spacing.module ?? coreDefault(defaults.module);
    const minZoneLength = job.spacing.minZoneLength ?? coreDefault(defaults.minZoneLength);
    const sources = [...limits.sources];
    if (limits.maxSpacing === null && job.spacing.maximum === undefined) sources.push(`maximum spacing ${defaults.maxSpacing} ${job.units === "si" ? "mm" : "in"} (common practice; the connector sets none)`);
    const design = designSchedule({
      length: beam.length,
      combinations: beam.results.map((r, i) => ({ id: r.combination.id, actions: r.actions, resistance: resistances[i]!.value })),
      flowFactor,
      lines: lineCount,
      rows,
      minSpacing,
      maxSpacing,
      module,
      preferred: job.spacing.preferred ?? null,
      endDistance: limits.endDistance,
      minZoneLength,
      maxZones: job.spacing.maxZonesPerSpan * beam.spans.length,
      symmetric: job.spacing.symmetric,
      system: job.units,
    });
    const worst = design.rowChecks.reduce((w, r) => (r.utilisation > w.utilisation ? r : w));
    const label = kind.describe(connector);
    const options = design.infeasible
      ? [
          `${design.infeasible.connectorsPerRowNeeded} connectors per row at the minimum spacing of ${fmtLen(design.spacings[0]!, job)}.`,
          `A connector with at least ${(design.infeasible.resistanceFactorNeeded).toFixed(2)} × the resistance of ${label} at the same spacing.`,
          `A glued joint: the bond-line stress would peak at ${(maxShearOverall(beam) * stressFactor).toPrecision(3)} MPa (τ = q/t over t = ${joint.contactWidth.toPrecision(4)} mm).`,
        ]
      : [];
    schedules.push({
      joint: joint.id,
      connector: connector.id,
      connectorLabel: label,
      rows,
      lineCount,
      resistance: resistances.map((r, i) => ({ combination: beam.results[i]!.combination.id, value: r.value, governing: r.governing, reference: r.reference, steps: r.steps, modes: r.modes ?? [], slip: r.slip ?? null, warnings: r.warnings ?? [] })),
      limits: {
        minSpacing,
        maxSpacing,
        endDistance: limits.endDistance,
        module,
        preferred: job.spacing.preferred ?? null,
        minZoneLength,
        edgeDistance: limits.edgeDistance ?? null,
        rowSpacing: limits.rowSpacing ?? null,
        penetration: limits.penetration ?? null,
        sources,
      },
      zones: design.zones,
      positions: design.positions,
      count: design.count,
      efficiency: {
        lowerBound: design.lowerBound,
        demandIntegral: design.demandIntegral,
        uniformSpacing: design.uniform?.spacing ?? null,
        uniformCount: design.uniform?.count ?? null,
        countOverLowerBound: design.lowerBound > 0 ? design.count / design.lowerBound : null,
        uniformOverCount: design.uniform ? design.uniform.count / design.count : null,
      },
      verification: {
        maxUtilisation: worst.utilisation,
        at: worst.x,
        combination: worst.combination,
        passes: worst.utilisation <= 1 + 1e-9,
        method: "each row: tributary length (halfway to its neighbours or to the member end) × the largest shear flow over that length ÷ (connectors per row × R)",
      },
      passes: !design.infeasible && worst.utilisation <= 1 + 1e-9,
      infeasible: design.infeasible
        ? { where: design.infeasible.where, smallestRequired: design.infeasible.smallestRequired, minSpacing: design.spacings[0]!, options }
        : null,
      shearFlow: stations.map((s) => Math.max(...beam.results.map((r) => Math.abs(shearAt(r.actions, s.x, s.side)))) * flowFactor / lineCount),
      requiredSpacing: stations.map((s) => {
        const d = design.demand.at(s.x, s.side).value;
        return d > 0 ? 1 / d : null;
      }),
    });
    if (design.mirrored) assumptions.add("Zones are mirrored about midspan where the connector demand is symmetric.");
  }

  const { checks, notChecked } = memberChecks(job, section, beam, profile);
  if (section.parts.length > 1 && joints.length === 0) warnings.push("No joint was found between the parts; check that the parts touch face to face.");
  const failures = [
    ...schedules.filter((s) => !s.passes).map((s) => `Joint ${s.joint}: ${s.infeasible ? "no spacing within the limits carries the shear flow" : "a row is over-utilised"} (utilisation ${s.verification.maxUtilisation.toFixed(2)}).`),
    ...bondLines.filter((b) => !b.passes).map((b) => `Bond line ${b.joint}: stress exceeds the strength (utilisation ${b.utilisation.toFixed(2)}).`),
    ...welds.filter((w) => !w.passes).map((w) => `Weld ${w.joint}: shear flow exceeds the weld's resistance (utilisation ${w.utilisation.toFixed(2)}).`),
    ...checks.filter((c) => !c.passes).map((c) => `${c.title}: utilisation ${c.utilisation.toFixed(2)}.`),
  ];

  return {
    format: RESULT_FORMAT,
    version: RESULT_VERSION,
    program: { ...PROGRAM },
    units: job.units,
    unitLabels: unitLabels(job.units),
    basis: job.basis,
    project: job.project,
    member: job.member,
    status: {
      passes: failures.length === 0,
      summary: failures.length === 0 ? "Every schedule, bond line and member check passes." : `${failures.length} item(s) fail: see below.`,
      failures,
    },
    section: sectionResult(section, profile),
    joints: jointResults,
    beam: beamResult(beam, stations),
    schedules,
    bondLines,
    welds,
    checks,
    notChecked,
    assumptions: [...baseAssumptions(job, beam), ...assumptions],
    standards: [
      "Connector resistances are the values given in the job or computed by the standards listed below; material strengths are the values given in the job, on its stated basis.",
      "Shear flow q = V·Q/I and stresses by elastic beam theory (mechanics of materials, e.g. Gere & Goodno, Mechanics of Materials, ch. 5).",
      ...standards,
    ],
    warnings,
  };
}

export function jointsOf(job: JobDocument, section: SectionModel, contacts: ReturnType<typeof findContacts>) {
  const connectors = new Map(job.connectors.map((c) => [c.id, c]));
  const custom = job.fastening.joints.map((j) => ({ joint: jointForHeldGroup(section, contacts, j.held), connector: connectors.get(j.connector)!, rows: j.rows, headSide: j.headSide }));
  const claimed = new Set(custom.flatMap((c) => c.joint.lines.map(lineKey)));
  const found = findJoints(section, contacts)
    .filter((j) => !j.lines.some((l) => claimed.has(lineKey(l))))
    .map((joint) => ({ joint, connector: connectors.get(job.fastening.default.connector)! as Connector, rows: job.fastening.default.rows, headSide: job.fastening.default.headSide }));
  return [...custom, ...found];
}

const lineKey = (l: { a: string; b: string; level: number }) => `${l.a}|${l.b}|${l.level}`;

/** Context of a connector at one contact line of a joint, for one combination. */
export function contextFor(combination: Combination, job: Pick<JobDocument, "basis" | "units">, joint: JointPlane, line: ContactLine, headSide: "auto" | "held" | "other", rows: number, section: SectionModel): ConnectorContext {
  const parts = new Map(section.parts.map((p) => [p.id, p]));
  const member = (id: string): JoinedMember => {
    const part = parts.get(id)!;
    const tol = geometricTolerance(section);
    const at = (v: number) => Math.abs(v - line.level) <= tol;
    const touching = part.rects.filter((r) => (line.orientation === "horizontal" ? at(r.y0) || at(r.y1) : at(r.x0) || at(r.x1)));
    const rects = touching.length > 0 ? touching : part.rects;
    const thickness = Math.max(...rects.map((r) => (line.orientation === "horizontal" ? r.y1 - r.y0 : r.x1 - r.x0)));
    const width = Math.max(...rects.map((r) => (line.orientation === "horizontal" ? r.x1 - r.x0 : r.y1 - r.y0)));
    return { part: id, material: part.material, thickness, width };
  };
  const held = new Set(joint.held);
  const inside = member(held.has(line.a) ? line.a : line.b);
  const outside = member(held.has(line.a) ? line.b : line.a);
  const headIsHeld = headSide === "held" || (headSide === "auto" && inside.thickness <= outside.thickness);
  const ids = new Set(joint.lines.flatMap((l) => [l.a, l.b]));
  const materials = new Map(section.parts.filter((p) => ids.has(p.id)).map((p) => [p.material.id, p.material]));
  return {
    duration: combination.duration,
    categories: combination.categories,
    combinationName: combination.name,
    basis: job.basis,
    rows,
    units: job.units,
    members: headIsHeld ? [inside, outside] : [outside, inside],
    adherends: [...materials.values()].map((m) => ({ material: m.name, shearStrength: m.strength.shear, rollingShear: m.strength.rollingShear })),
  };
}

function maxShearOverall(beam: BeamAnalysis): number {
  return Math.max(...beam.results.map((r) => maxAbsShear(r.actions, 0, beam.length).value));
}

const fmtLen = (mm: number, job: JobDocument) => (job.units === "si" ? `${Number(mm.toPrecision(4))} mm` : `${Number((mm / 25.4).toPrecision(4))} in`);

function sectionResult(section: SectionModel, profile: ReturnType<typeof stressProfile>): DesignResult["section"] {
  const { bounds } = section;
  return {
    referenceModulus: section.referenceModulus,
    area: section.area,
    transformedArea: section.transformedArea,
    centroidY: section.centroidY,
    secondMoment: section.secondMoment,
    depth: bounds.y1 - bounds.y0,
    width: bounds.x1 - bounds.x0,
    bounds,
    firstMomentAtNeutralAxis: Math.abs(firstMomentAbove(section, section.centroidY)),
    widthAtNeutralAxis: widthAt(section, section.centroidY, "at") || widthAt(section, section.centroidY, "above"),
    parts: section.parts.map((p) => {
      const f = extremeFibre(section, p);
      return { id: p.id, name: p.name, material: p.material.id, materialName: p.material.name, modularRatio: p.n, area: p.area, rects: p.rects, topFibre: f.top, bottomFibre: f.bottom };
    }),
    stressProfile: profile.map(({ y, firstMoment, width, factor }) => ({ y, firstMoment, width, factor })),
    materialModuli: materialModuli(section),
    shearStress: shearStressSummary(section, profile),
  };
}

function materialModuli(section: SectionModel): DesignResult["section"]["materialModuli"] {
  const byMaterial = new Map<string, SectionModel["parts"]>();
  for (const p of section.parts) byMaterial.set(p.material.id, [...(byMaterial.get(p.material.id) ?? []), p]);
  return [...byMaterial.values()].map((parts) => {
    const first = parts[0]!;
    const top = Math.max(...parts.flatMap((p) => p.rects.map((r) => r.y1))) - section.centroidY;
    const bottom = section.centroidY - Math.min(...parts.flatMap((p) => p.rects.map((r) => r.y0)));
    const modulus = (c: number) => (c > 0 ? section.secondMoment / (first.n * c) : null);
    return { material: first.material.id, name: first.material.name, modularRatio: first.n, topFibre: top, bottomFibre: bottom, topModulus: modulus(top), bottomModulus: modulus(bottom) };
  });
}

function shearStressSummary(section: SectionModel, profile: ReturnType<typeof stressProfile>): DesignResult["section"]["shearStress"] {
  const peak = profile.reduce((a, b) => (b.factor > a.factor ? b : a));
  const single = section.parts.length === 1 && section.parts[0]!.rects.length === 1;
  const webApproximations = section.parts.flatMap((p) => {
    const rects = [...p.rects].sort((a, b) => a.y0 - b.y0);
    const web = rects[1];
    if (rects.length !== 3 || !web) return [];
    const d = rects[2]!.y1 - rects[0]!.y0;
    const tw = web.x1 - web.x0;
    const hw = web.y1 - web.y0;
    return [
      { part: p.id, label: "V/(d·t_w), AISC 360 §G2.1 shear area", factor: 1 / (d * tw) },
      { part: p.id, label: "V/(h_w·t_w), web between flanges", factor: 1 / (hw * tw) },
    ];
  });
  return { maxFactor: peak.factor, atY: peak.y, rectangleClosedForm: single ? 1.5 / section.area : null, webApproximations };
}

function baseAssumptions(job: JobDocument, beam: BeamAnalysis): string[] {
  return [
    "Linear-elastic member; plane sections remain plane; the parts act as one section (rigid connection), so q = V·Q/I about the transformed section's neutral axis.",
    "Parts of different stiffness are transformed by the modular ratio n = E/E_ref to the first part's material.",
    job.combinations.set === "unfactored"
      ? `Loads are taken as entered, on the ${job.basis === "allowable" ? "allowable-stress (service load)" : "factored (strength)"} basis; resistances and strengths are compared on the same basis.`
      : `Loads are entered as nominal values by category and combined by the factors of each load combination; resistances and strengths are on the ${job.basis === "allowable" ? "allowable-stress" : "factored (design)"} basis.`,
    job.beam.selfWeight ? "Self-weight of the parts (area × density × g) is added as a dead load over the whole member." : "Self-weight is not included (switched off in the job).",
    ...beamAssumptions(job, beam),
    "Shear stress at a level is averaged over the full width cut at that level.",
    "Zone boundaries are on a round grid from the left end; the first and last rows sit at the end distance from the member ends.",
  ];
}
