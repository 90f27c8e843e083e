import { analyseBeam, selfWeightOf, type BeamAnalysis } from "./beam/analyse-beam.js";
import { beamAssumptions } from "./beam/beam-assumptions.js";
import { beamResult } from "./beam/beam-result.js";
import { memberActions } from "./beam/member-actions.js";
import { combinationSet } from "./beam/combinations.js";
import { stationsFor } from "./beam/stations.js";
import { memberChecks, SUPPORT_BEARING } from "./checks/member-checks.js";
import { plyBearingChecks } from "./checks/ply-bearing.js";
import { kindOf } from "./connector/registry.js";
import { bondLineResult } from "./fastening/bond-line-result.js";
import { compositeDesign } from "./fastening/composite-design.js";
import { contextsFor } from "./fastening/connector-context.js";
import { discreteSchedule, type JointInput } from "./fastening/discrete-schedule.js";
import { globalise, jointDemand, localView, memberJointsOf, type MemberJoint } from "./fastening/member-joints.js";
import { partTerminations } from "./fastening/part-terminations.js";
import { layoutAcross } from "./fastening/layout-across.js";
import { loadedEdgesOf } from "./fastening/loaded-edges.js";
import { rowFit, rowFitProblem } from "./fastening/row-fit.js";
import { interfaceDemandAndBands, interfacesOf, plyStretchesOf, type MultiPly, type PlyStretch } from "./fastening/side-load-transfer.js";
import { weldSchedule } from "./fastening/weld-schedule.js";
import { fastenerReach } from "./multi-ply/ply-detailing.js";
import { arrivalFractions, interfaceTransfer, plyShares } from "./multi-ply/ply-shares.js";
import type { JobDocument } from "./schema/job.js";
import { RESULT_FORMAT, RESULT_VERSION, type BondLineResult, type DesignResult, type JointResult, type MemberCheck, type Schedule, type WeldResult } from "./schema/result.js";
import { MAX_PARTS_FOR_JOINT_SEARCH, type UncoveredContact } from "./section/joints.js";
import { buildSection, positioned } from "./section/section-model.js";
import { sectionResult } from "./section/section-result.js";
import { stressProfile } from "./section/stress-profile.js";
import { sectionStretches } from "./section/stretches.js";
import { inJobUnits } from "./units/format.js";
import { unitLabels } from "./units/quantity.js";
import { PROGRAM } from "./version.js";
import { withFiniteVerdict } from "./finite-verdict.js";
import { designColumn } from "./column/design-column.js";

/**
 * The whole job: a valid job document in core units (see `prepareJob`) → the result in core units.
 * Pure: no I/O, no clock.
 */
export function designMember(input: JobDocument): DesignResult {
  // A column's self-weight acts along it, not across: the beam analysis leaves it out and the column takes it axially.
  const job: JobDocument = input.compression ? { ...input, beam: { ...input.beam, selfWeight: false } } : input;
  const length = job.beam.spans.reduce((sum, l) => sum + l, 0);
  const stretches = sectionStretches(job, length);
  const stepped = stretches.length > 1;
  // The section drawn and reported: every part, wherever along the member it runs.
  const section = stepped ? buildSection(positioned(job.parts), job.materials) : stretches[0]!.section;
  const { joints, uncovered: uncoveredCuts } = memberJointsOf(job, stretches, length);
  // The same self-weight as the analysis and the assumptions take, so that all three see the same categories.
  const axialSelfWeight = input.compression && input.beam.selfWeight ? Math.max(...stretches.map((s) => selfWeightOf(s.section))) * length : 0;
  const axialCategories = [...(input.compression?.loads.filter((l) => l.P !== 0).map((l) => l.category) ?? []), ...(axialSelfWeight > 0 ? ["dead"] : [])];
  const combinationList = combinationSet(job.beam, job.combinations, job.beam.selfWeight ? Math.max(...stretches.map((s) => selfWeightOf(s.section))) : 0, axialCategories);
  // Side-by-side plies stretch by stretch (a plate shorter than the member changes the shares where it stops);
  // `plies` is the stretch with the most of them, for what is said of the member as a whole.
  const plyStretches = plyStretchesOf(stretches);
  const plies = plyStretches ? plyStretches.reduce((a, b) => (b.plies.parts.length > a.plies.parts.length || (b.plies.parts.length === a.plies.parts.length && b.x1 - b.x0 > a.x1 - a.x0) ? b : a)).plies : null;
  // Plies at different levels bend each about its own centroid (no composite action between them): the member's stiffness
  // is Σ E_j·I_j, not the transformed section's I about a common axis.
  const offCentre = plyStretches?.some((s) => s.plies.offCentre) ?? false;
  // Nor does a cut between plies need Q = V·Q/I fastened: a line is short only if no joint fastens it at all.
  const uncovered = plyStretches ? uncoveredCuts.filter((u) => u.cause !== "short-cut") : uncoveredCuts;
  const analysed = offCentre ? stretches.map((s, i) => ({ ...s, section: { ...s.section, secondMoment: plyStretches![i]!.plies.ownSecondMoment } })) : stretches;
  const beam = analyseBeam(job, analysed, combinationList.combinations, axialCategories);
  const stations = stationsFor(beam.length, [...new Set(beam.results.flatMap((r) => r.actions.breaks))]);
  const profile = stressProfile(section);

  const assumptions = new Set<string>();
  const notChecked: string[] = [];
  const standards = new Set<string>();
  const warnings = new Set<string>();
  const jointResults: JointResult[] = [];

  const prepared = joints.map((mj) => {
    const { joint, connector, fastening } = mj;
    const kind = kindOf(connector);
    kind.assumptions(connector).forEach((a) => assumptions.add(a));
    kind.standards(connector).forEach((s) => standards.add(s));
    const lineCount = joint.lines.length;
    // q = V·Q/I is shared equally by every line the cut crosses; this joint fastens the lines it governs.
    const share = kind.mechanism === "bond-line" ? 1 : lineCount / joint.crossed.length;
    const flowFactor = Math.max(...mj.stretches.map((x) => x.flowFactor));
    const stressFactor = Math.max(...mj.stretches.map((x) => x.stressFactor));
    const balanced = (m: number) => m <= 1e-9 * mj.section.transformedArea * (mj.section.bounds.y1 - mj.section.bounds.y0);
    // Between plies at different levels Q ≠ 0, but with no composite action between them no shear flow is passed either.
    const inPlaneOfBending = offCentre || (stepped ? !!plyStretches && mj.stretches.every((x) => balanced(x.firstMoment)) : balanced(joint.firstMoment));
    const jointPlies = plyStretches ? plyStretchAt(plyStretches, mj.stretches[0]!.from).plies : null;
    const plyInterfaces = inPlaneOfBending && jointPlies ? interfacesOf(jointPlies, joint) : null;
    const plyInterface = plyInterfaces && plyInterfaces.length === 1 ? plyInterfaces[0]! : null;
    // A column with no load across it (its self-weight is axial) is not bent: nothing to warn of.
    if (inPlaneOfBending && plyInterfaces === null && !(job.compression && job.beam.loads.length === 0)) {
      warnings.add(
        `Joint ${joint.id}: its held parts are balanced about the neutral axis (Q = 0), so bending in the plane of the member puts no shear flow on it; its connectors are placed by the spacing limits${job.compression ? " and by the column rule's buckling shear where it gives one (see the built-up column)" : " only"}.`,
      );
    }
    jointResults.push({
      id: joint.id,
      held: joint.held,
      found: joint.found,
      lines: joint.lines.map((l) => ({ between: [l.a, l.b], orientation: l.orientation, level: l.level, from: l.from, to: l.to, length: l.length })),
      contactWidth: joint.contactWidth,
      firstMoment: Math.max(...mj.stretches.map((x) => x.firstMoment)),
      flowFactor,
      stressFactor,
      connector: connector.id,
      connectorLabel: kind.describe(connector),
      mechanism: kind.mechanism,
      rows: fastening.rows,
      demand: plyInterfaces === null ? "shear-flow" : "side-load",
      extent: mj.extent,
      stretches: stepped ? mj.stretches.map((x) => ({ from: x.from, to: x.to, firstMoment: x.firstMoment, flowFactor: x.flowFactor })) : [],
      sharing:
        joint.crossed.length > lineCount
          ? `The cut that holds ${joint.held.join(" + ")} crosses ${joint.crossed.length} contact lines; ${
              kind.mechanism === "bond-line" ? "q = V·Q/I is shared by them in proportion to their widths (one stress τ = V·Q/(I·t))" : "q = V·Q/I is shared equally by them (the same connector on each, so equal stiffness)"
            }. This joint fastens ${lineCount} of them; ${fastenedElsewhere(joint, joints)}.`
          : plyInterfaces !== null
          ? `${plyInterfaces.length === 1 ? `Interface ${plyInterfaces[0]! + 1}` : `Interfaces ${plyInterfaces.map((k) => k + 1).join(" and ")}`} of side-by-side plies: ${plyInterfaces.length === 1 ? "its connectors pass" : "its connectors, through the held ply and both its neighbours, pass at each contact line the most either interface passes of"} the loads that arrive on one face (or on top of the plies that reach the top, beyond their share) to the plies beyond, in proportion to each ply's E·I; q = V·Q/I is zero here.`
          : lineCount > 1
            ? `q is shared equally by the ${lineCount} contact lines (the same connector on each, so equal stiffness).`
            : "One contact line carries the whole shear flow.",
    });
    // One context per combination and contact line; a combination's resistance is the least over the lines.
    // Across side-by-side plies the connectors pass the load across the member (perpendicular to the grain of timber plies).
    const direction = plyInterfaces !== null ? "across" : "along";
    const combinations = beam.results.map((r) => r.combination);
    const byLine = joint.lines.map((line) => contextsFor(combinations, job, joint, line, fastening.headSide, fastening.rows, mj.section, direction));
    const contexts = combinations.map((_, i) => byLine.map((line) => line[i]!));
    const common = { job, joint, connector, fastening, contexts };
    let input: JointInput;
    if (plyInterfaces !== null) {
      // The demand is per contact line; the schedule divides by the lines, so the factor restores it.
      const view = mj.extent ? localView(beam, stations, mj.extent) : { beam, stations };
      const local = mj.extent ? { ...common, fastening: shiftProvided(fastening, -mj.extent.from) } : common;
      input = { ...local, ...view, flowFactor: joint.lines.length, stressFactor: 1 / joint.contactWidth, ...demandAndBands(interfaceDemandAndBands(job, beam, plyStretches!, joint.lines, mj.extent)), loadedEdges: loadedEdgesOf(job, beam, plyStretches!, jointPlies!, plyInterfaces, mj.section, mj.extent) };
    } else if (!stepped) {
      input = { ...common, beam, stations, flowFactor: flowFactor * share, stressFactor };
    } else {
      const view = mj.extent ? localView(beam, stations, mj.extent) : { beam, stations };
      const local = mj.extent ? { ...common, fastening: shiftProvided(fastening, -mj.extent.from) } : common;
      input = { ...local, ...view, flowFactor: share, stressFactor: 1 / joint.contactWidth, demandActions: jointDemand(beam, mj) };
    }
    return { joint, kind, input, extent: mj.extent, plyInterface, plyJoint: plyInterfaces !== null, jointPlies, share, section: mj.section, across: plyInterfaces !== null };
  });

  type Run = { schedule?: Schedule; bondLine?: BondLineResult; weld?: WeldResult; warnings: string[]; mirrored: boolean };
  const run = ({ kind, input: jointInput, extent, share }: (typeof prepared)[number], override: Partial<Pick<JointInput, "flowFactor" | "maxSpacingCap" | "extraDemand" | "columnLimits" | "demandActions">> = {}): Run => {
    const inputs = { ...jointInput, ...override, ...(override.flowFactor !== undefined ? { flowFactor: override.flowFactor * share } : {}) };
    const back = <T extends Schedule | WeldResult | BondLineResult>(r: T): T => (extent ? globalise(r, stations, extent) : r);
    if (kind.mechanism === "bond-line") return { bondLine: back(bondLineResult(inputs, kind)), warnings: [], mirrored: false };
    if (kind.mechanism === "weld") {
      const { weld, warnings: w } = weldSchedule(inputs, kind);
      return { weld: back(weld), warnings: w, mirrored: false };
    }
    const { schedule, warnings: w, mirrored } = discreteSchedule(inputs, kind);
    return { schedule: back(schedule), warnings: w, mirrored };
  };
  const runs = new Map(prepared.map((p) => [p.joint.id, run(p)]));
  const composite = compositeDesign({ job, section, beam, prepared, runs, rerun: (id, override) => run(prepared.find((p) => p.joint.id === id)!, override) });
  composite.assumptions.forEach((a) => assumptions.add(a));
  const column = job.compression
    ? designColumn({ job, section, beam, stations, axialSelfWeight, combinations: combinationList.combinations, prepared, runs, rerun: (id, override) => run(prepared.find((p) => p.joint.id === id)!, override) })
    : undefined;
  if (column) {
    standards.add(column.standard);
    if (axialSelfWeight > 0) assumptions.add("The column's self-weight (the whole member's) is an axial dead load, not a load across it.");
    assumptions.add("The column's base is the member's left end; axial loads act at its top, an eccentric one adding P·e there, falling linearly to nothing at the base.");
    assumptions.add("The column's effective lengths come from its own end conditions, K_e and bracing (compression.x and .y), not from the beam's supports, which serve the lateral loads only: keep the two consistent.");
  }

  if (plies) {
    assumptions.add(`Side-by-side plies deflect together, so each carries a share of the load in proportion to its E·I (each ply about its own centroid${offCentre ? "" : ", all on the member's neutral axis"}); connectors at each interface pass what arrives on one side beyond its share, across the member (perpendicular to the grain of timber plies).`);
    assumptions.add(
      plies.plies.every((p) => p.bearsOnTop !== false)
        ? "A load on top bears on each ply in proportion to its thickness (common practice); each ply's self-weight arrives on that ply, and what it weighs beyond its E·I share passes across the interfaces like any other load."
        : `A load on top bears on the plies that reach the top (${plies.parts.filter((_, i) => plies.plies[i]!.bearsOnTop !== false).join(", ")}) in proportion to their thicknesses (common practice), not on the shallower ones (${plies.parts.filter((_, i) => plies.plies[i]!.bearsOnTop === false).join(", ")}); each ply's self-weight arrives on that ply, and what it weighs beyond its E·I share passes across the interfaces like any other load.`,
    );
    if (plies.plies.some((p) => p.bearsAtBottom === false)) {
      assumptions.add(`A ply that does not reach the bottom (${plies.parts.filter((_, i) => plies.plies[i]!.bearsAtBottom === false).join(", ")}) does not bear on the supports: its E·I share of each reaction is handed to the plies that do through the connectors within half the member depth of the support (the concentrated-load rule); the plies that reach the bottom each take their own share there.`);
    }
    assumptions.add("Each ply is checked in bending and shear on its own share of the moment and shear; deflection is that of the combined E·I (Σ E·I of the plies).");
    if (plies.plies.some((_, i) => section.parts.find((p) => p.id === plies.parts[i])!.material.family === "steel")) {
      assumptions.add("A steel plate between the plies is held laterally by the bolts through the timber plies on either side, so its lateral-torsional buckling alone is not checked; the bolts must be placed as scheduled for this to hold.");
    }
    assumptions.add("A concentrated load hung on a face is passed by the connectors within half the member depth each side of it (common practice).");
    if (plyStretches && plyStretches.length > 1) {
      assumptions.add("Where a ply starts or stops along the member the E·I shares change stretch by stretch: a ply that stops hands its share of the shear (its end reaction, s_j·V) and of the moment (s_j·M at the centre of its end bolts) to the plies that continue, and one that starts takes them, through the connectors within half the member depth of its end on the side where it runs: the force spread evenly, the couple by the elastic method for a bolt group (force in proportion to the distance from the group's centre).");
    }
    assumptions.add("A nail or screw at an interface between plies is driven from an outer face: it must pass the plies on that side and still reach its least penetration into the next one; its resistance is taken between the two plies at the interface.");
  }
  const { checks, notChecked: memberNotChecked } = stepped ? steppedChecks(job, stretches, beam, composite.stiffness, plyStretches) : memberChecks(job, section, beam, profile, composite.stiffness, null, true, plies);
  notChecked.push(...(plyStretches ? memberNotChecked.map((n) => (n === SUPPORT_BEARING ? "Bearing under point loads, and the supports' own connections." : n)) : memberNotChecked));
  if (plyStretches) {
    const bearing = plyBearingChecks(job, beam, plyStretches);
    checks.push(...bearing.checks);
    notChecked.push(...bearing.notChecked);
    bearing.assumptions.forEach((a) => assumptions.add(a));
  }
  checks.push(...composite.checks);
  if (column) checks.push(...column.checks);
  const terminationsNow = () =>
    partTerminations({
      job,
      beam,
      stretches,
      // Between side-by-side plies a ply's end hands its reaction back through the connectors there (interfaceDemand); no
      // shear flow develops it.
      joints: joints.filter((mj) => !prepared.find((p) => p.joint.id === mj.joint.id)!.plyJoint).map((mj) => {
        const r = runs.get(mj.joint.id)!;
        const rowResistance = r.schedule ? Math.min(...r.schedule.resistance.map((x) => x.value)) * r.schedule.rows * r.schedule.lineCount : null;
        const weldResistance = r.weld ? Math.min(...r.weld.resistance.map((x) => x.value)) * r.weld.fillets * r.weld.lineCount : null;
        return { joint: mj, schedule: r.schedule, weld: r.weld, rowResistance, weldResistance };
      }),
    });
  let { terminations, notChecked: terminationsNotChecked } = terminationsNow();
  if (job.mode === "design") {
    // Design the rows at a part's ends to develop its force: the force spread over the length from the part's
    // end to its cut-off is one more demand on the rows there, raised in a few rounds until the whole rows
    // that fall inside that length carry it.
    const boost = new Map<string, number>();
    for (let round = 0; round < 4; round++) {
      // More rows help only where the connectors there are too few, not where their kind is refused (§F13.3).
      const short = terminations.filter((t) => !t.passes && t.cutoff !== null && t.cutoff !== t.at && t.force > 0 && (t.utilisation ?? Infinity) > 1 + 1e-9);
      if (short.length === 0) break;
      const byJoint = new Map<string, typeof short>();
      for (const t of short) byJoint.set(t.joint, [...(byJoint.get(t.joint) ?? []), t]);
      for (const t of short) boost.set(`${t.joint}|${t.end}`, (boost.get(`${t.joint}|${t.end}`) ?? 1) * Math.max(1.02, Math.min(t.utilisation ?? 3, 3)));
      for (const [id] of byJoint) {
        const p = prepared.find((x) => x.joint.id === id)!;
        const r = runs.get(id)!;
        if (!r.schedule || !p.extent) continue;
        const origin = p.extent.from;
        const ends = terminations.filter((t) => t.joint === id && t.cutoff !== null && t.cutoff !== t.at && t.force > 0 && boost.has(`${t.joint}|${t.end}`));
        const extraDemand = ends.map((t) => {
          const [a, b] = [Math.min(t.at, t.cutoff!) - origin, Math.max(t.at, t.cutoff!) - origin];
          const flow = (t.force * boost.get(`${t.joint}|${t.end}`)!) / (b - a);
          const set = { points: [{ x: a, P: -flow }, { x: b, P: flow }], moments: [], lines: [] };
          return { id: `develop ${t.part} at its ${t.end} end`, actions: memberActions(p.extent!.to - origin, set, []), resistance: Math.min(...r.schedule!.resistance.map((x) => x.value)) };
        });
        runs.set(id, run(p, { extraDemand }));
      }
      ({ terminations, notChecked: terminationsNotChecked } = terminationsNow());
    }
  }
  notChecked.push(...terminationsNotChecked);

  const schedules: Schedule[] = [];
  const bondLines: BondLineResult[] = [];
  const welds: WeldResult[] = [];
  for (const p of prepared) {
    const r = runs.get(p.joint.id)!;
    // Single shear only: there the penetration provided is the length past the head-side ply.
    const singleShear = (p.input.connector as { shear?: string }).shear !== "double";
    if (r.schedule && p.jointPlies && p.plyInterface !== null && singleShear) {
      const problem = reachProblem(r.schedule, p.jointPlies, p.plyInterface, p.input.contexts[0]![0]!.members[0].thickness, job.units);
      if (problem) r.schedule = { ...r.schedule, detailingProblems: [...r.schedule.detailingProblems, problem], passes: false };
    }
    if (r.schedule) {
      // Connectors side by side must fit across the contact, whatever the kind: shared detailing, not a kind's warning.
      const fit = rowFit(r.schedule.limits, r.schedule.rows, p.joint.lines);
      r.schedule = { ...r.schedule, rowFit: fit };
      if (!fit) {
        const narrowest = Math.min(...p.joint.lines.map((l) => l.widest));
        notChecked.push(`Joint ${p.joint.id}: whether ${r.schedule.rows === 1 ? "a connector" : `${r.schedule.rows} connectors side by side`} fit${r.schedule.rows === 1 ? "s" : ""} across the contact (${inJobUnits(narrowest, "length", job.units)} wide at its narrowest): connector ${r.schedule.connector} gives no edge distance${r.schedule.rows > 1 ? " or spacing across" : ""}.`);
      }
      if (fit && !fit.fits) r.schedule = { ...r.schedule, detailingProblems: [...r.schedule.detailingProblems, rowFitProblem(fit, r.schedule.limits, r.schedule.rows, r.schedule.connectorLabel, job.units)], passes: false };
      const layout = layoutAcross(r.schedule, p.joint.lines, p.section, p.input.contexts[0]?.[0]?.members[0].part ?? null, p.across);
      r.schedule = { ...r.schedule, layoutAcross: layout };
      if (layout?.stagger != null) {
        const stagger = `Across the grain with ${r.schedule.rows} per row: alternate connectors of each row are set ${inJobUnits(layout.stagger, "length", job.units)} (half the least spacing between rows) along the member toward midspan, so that the holes of a row do not all stand in one cross-section of the member [CP].`;
        r.schedule = { ...r.schedule, limits: { ...r.schedule.limits, sources: [...r.schedule.limits.sources, stagger] } };
      }
      schedules.push(r.schedule);
    }
    if (r.bondLine) bondLines.push(r.bondLine);
    if (r.weld) welds.push(r.weld);
    r.warnings.forEach((w) => warnings.add(w));
    if (r.mirrored) assumptions.add("Zones are mirrored about midspan where the connector demand is symmetric.");
  }

  if (terminations.length > 0) {
    assumptions.add("A part that stops short of the member's ends is developed at its theoretical cut-off: the point where the section without it first reaches its elastic bending strength under the largest moment of any combination; its force there is M·Q/I of the section with it (AISC 360-16 §F13.3 [M]).");
  }
  if (plies && plies.parts.some((id) => section.parts.find((p) => p.id === id)!.material.family === "steel")) {
    // The plate's bearing is a limit state of the timber bolts through it (core/connector/timber/plate-bearing.ts).
    const steelIds = new Set(plies.parts.filter((id) => section.parts.find((p) => p.id === id)!.material.family === "steel"));
    const atPlate = schedules.filter((s) => prepared.some((p) => p.joint.id === s.joint && p.joint.lines.some((l) => steelIds.has(l.a) || steelIds.has(l.b))));
    const bearingChecked = atPlate.length > 0 && atPlate.every((s) => s.resistance.every((r) => (r.modes ?? []).some((m) => m.mode.startsWith("bearing on plate"))));
    notChecked.push(
      bearingChecked
        ? "The plate's own edge and end distances at the bolt holes (AISC 360-16 §J3.4; EN 1993-1-8 Table 3.3): the plate's bearing and tear-out take them at their least."
        : "Bearing of the bolts on the steel plate and the plate's own edge and end distances (AISC 360-16 §J3.10, §J3.4; EN 1993-1-8 Table 3.4).",
    );
  }
  if (offCentre) {
    assumptions.add("The plies' mid-depths are not at one level: the connectors carry only the load passed across the member, not shear flow along it (no composite action between the plies), so each ply bends about its own centroid and the member's stiffness is Σ E·I of the plies about their own axes; a connection meant to make them act compositely is not designed here.");
  }
  if (section.parts.length > 1 && joints.length === 0) warnings.add("No joint was found between the parts; check that the parts touch face to face.");
  const failures = [
    ...uncovered.map((u) => `Contact line between ${u.line.a} and ${u.line.b} (${u.line.orientation} at ${inJobUnits(u.line.level, "length", job.units)}${stepped ? `, ${inJobUnits(u.from, "span", job.units)}–${inJobUnits(u.to, "span", job.units)} along the member` : ""}): ${uncoveredReason(u, job.units)}`),
    ...schedules.filter((s) => !s.passes).map((s) => `Joint ${s.joint}: ${scheduleFailure(s)} (utilisation ${s.verification.maxUtilisation.toFixed(2)}).`),
    ...bondLines.filter((b) => !b.passes).map((b) => `Bond line ${b.joint}: stress exceeds the strength (utilisation ${b.utilisation.toFixed(2)}).`),
    ...welds.filter((w) => !w.passes).map((w) => `Weld ${w.joint}: shear flow exceeds the weld's resistance (utilisation ${w.utilisation.toFixed(2)}).${w.sizeNote ? ` ${w.sizeNote}` : ""}`),
    ...checks.filter((c) => !c.passes).map((c) => `${c.title}: utilisation ${c.utilisation.toFixed(2)}.`),
    ...(column && !column.applies ? [`Built-up column: ${column.reason}`] : []),
    ...(composite.result && !composite.result.applies ? [`Slip-aware composite action was asked for but cannot be applied: ${composite.result.reason}`] : []),
    ...terminations.filter((t) => !t.passes).map((t) => `End of ${t.part} (${t.end}, joint ${t.joint}): ${t.note || "the connectors there do not develop the part's force"} (${t.utilisation === null ? "no connectors there to develop it" : `utilisation ${t.utilisation.toFixed(2)}`}).`),
  ];

  return withFiniteVerdict({
    format: RESULT_FORMAT,
    version: RESULT_VERSION,
    program: { ...PROGRAM },
    units: job.units,
    unitLabels: unitLabels(job.units),
    basis: job.basis,
    mode: job.mode,
    project: job.project,
    member: job.member,
    status: {
      passes: failures.length === 0,
      summary: failures.length === 0 ? `Every ${job.mode === "check" ? "checked schedule" : "schedule"}, bond line, weld and member check passes.` : `${failures.length} item(s) fail: see below.`,
      failures,
    },
    section: sectionResult(section, profile),
    multiPly: plies ? multiPlyResult(plies, jointResults, plyStretches!, job, length) : null,
    composite: composite.result,
    stretches: stepped
      ? stretches.map((x) => ({ from: x.x0, to: x.x1, parts: x.parts, area: x.section.area, centroidY: x.section.centroidY, secondMoment: x.section.secondMoment }))
      : [],
    terminations,
    joints: jointResults,
    ...(column ? { column } : {}),
    beam: { ...beamResult(beam, stations), omitted: combinationList.omitted },
    schedules,
    bondLines,
    welds,
    checks,
    notChecked,
    assumptions: [...baseAssumptions(job, beam, combinationList).filter((a) => !(input.compression && a.startsWith("Self-weight is not included"))), ...assumptions],
    standards: [
      "Connector resistances are the values given in the job or computed by the standards listed below; material strengths are the values given in the job, on its stated basis.",
      "Shear flow q = V·Q/I and stresses by elastic beam theory (mechanics of materials, e.g. Gere & Goodno, Mechanics of Materials, ch. 5).",
      ...standards,
    ],
    warnings: [...warnings],
  });
}

/** The joints that fasten the other lines a joint's cut crosses, because their cuts load those lines more. */
function fastenedElsewhere(joint: MemberJoint["joint"], joints: MemberJoint[]): string {
  const key = (l: { a: string; b: string; orientation: string; level: number }) => `${l.a}|${l.b}|${l.orientation}|${l.level}`;
  const mine = new Set(joint.lines.map(key));
  const others = joint.crossed.filter((l) => !mine.has(key(l)));
  const owners = [...new Set(others.map((l) => joints.find((j) => j.joint.lines.some((m) => key(m) === key(l)))?.joint.id).filter((id): id is string => id !== undefined))];
  const lines = `the other${others.length === 1 ? " line" : ` ${others.length} lines`} (${others.map((l) => `${l.a}–${l.b}`).join(", ")})`;
  return owners.length > 0 ? `${lines} ${others.length === 1 ? "is" : "are"} fastened for joint ${owners.join(", joint ")}, whose cut loads ${others.length === 1 ? "it" : "them"} more` : `${lines} belong to no joint`;
}

function uncoveredReason(u: UncoveredContact, units: JobDocument["units"]): string {
  if (u.cause === "too-many-parts") return `no joint fastens it: the section has ${u.parts} parts and joints are searched among at most ${MAX_PARTS_FOR_JOINT_SEARCH}. Name the held groups in the fastening.`;
  if (u.cause === "no-cut") return "no joint fastens it: no split of the section into two touching groups crosses it.";
  const q = (v: number) => inJobUnits(v, "firstMoment", units);
  return `the cut that holds ${u.held.join(" + ")} has Q = ${q(u.firstMoment)}, but the joints named in the fastening fasten its ${u.lines} contact lines for ${q(u.carried)} in all. Name that held group in the fastening, or fasten its lines for it.`;
}

function multiPlyResult(plies: MultiPly, joints: JointResult[], stretches: PlyStretch[], job: JobDocument, length: number): DesignResult["multiPly"] {
  const transfer = (face: "left" | "right" | "top") => interfaceTransfer(plies.plies, [{ face, magnitude: 1 }]);
  const shares = plyShares(plies.plies);
  return {
    plies: plies.parts.map((part, i) => ({ part, share: shares[i]!, bearsTopLoad: plies.plies[i]!.bearsOnTop !== false })),
    interfaces: plies.parts.slice(0, -1).map((left, k) => ({
      between: [left, plies.parts[k + 1]!] as [string, string],
      // A joint may fasten several interfaces (a plate held between two plies, bolted through both): any of its lines on this one.
      joint: joints.find((j) => j.lines.some((l) => l.between.includes(left) && l.between.includes(plies.parts[k + 1]!)))?.id ?? null,
      fromLeftFace: transfer("left").interfaces[k]!.force,
      fromRightFace: transfer("right").interfaces[k]!.force,
      fromTop: transfer("top").interfaces[k]!.force,
    })),
    stretches: stretches.length > 1 ? stretches.map((s) => ({ from: s.x0, to: s.x1, plies: s.plies.parts.map((part, j) => ({ part, share: plyShares(s.plies.plies)[j]! })) })) : [],
    loads: job.beam.loads.flatMap((load, i) => {
      if (load.type === "moment") return [];
      const face = load.face ?? "top";
      const [a, b] = load.type === "point" ? [load.at, load.at] : [load.from ?? 0, load.to ?? length];
      const on = stretches.filter((s) => s.x1 >= a && s.x0 <= b && (a === b || (s.x1 > a && s.x0 < b)));
      const parts = on.flatMap((s) => arrivalFractions(s.plies.plies, face).flatMap((f, j) => (f > 0 ? [s.plies.parts[j]!] : [])));
      return [{ load: i, face, plies: [...new Set(parts)] }];
    }),
  };
}

/** The plies of the stretch at x. */
function plyStretchAt(stretches: PlyStretch[], x: number): PlyStretch {
  return stretches.find((s) => x >= s.x0 && x < s.x1) ?? stretches[stretches.length - 1]!;
}

/** A fastening's provided schedule moved along the member by dx (into a joint's own coordinate). */
function shiftProvided(fastening: JobDocument["fastening"]["default"], dx: number): JobDocument["fastening"]["default"] {
  const p = fastening.provided;
  if (!p) return fastening;
  return {
    ...fastening,
    provided: p.type === "zones" ? { ...p, zones: p.zones.map((z) => ({ ...z, from: z.from + dx, to: z.to + dx })) } : { ...p, positions: p.positions.map((x) => x + dx) },
  };
}

/** Member checks stretch by stretch, where the section changes along the member; the worst stretch of each check stands. */
function steppedChecks(job: JobDocument, stretches: ReturnType<typeof sectionStretches>, beam: BeamAnalysis, stiffness: Parameters<typeof memberChecks>[4], plyStretches: PlyStretch[] | null) {
  const worst = new Map<string, MemberCheck>();
  const notChecked = new Set<string>();
  stretches.forEach((s, i) => {
    const label = `${inJobUnits(s.x0, "span", job.units)}–${inJobUnits(s.x1, "span", job.units)}`;
    const part = memberChecks(job, s.section, beam, stressProfile(s.section), stiffness, { from: s.x0, to: s.x1, label }, i === 0, plyStretches?.[i]!.plies ?? null);
    for (const c of part.checks) {
      const before = worst.get(c.id);
      if (!before || c.utilisation > before.utilisation) worst.set(c.id, c);
    }
    part.notChecked.forEach((n) => notChecked.add(n));
  });
  return { checks: [...worst.values()], notChecked: [...notChecked] };
}

/**
 * A face-driven fastener (nail, screw) at interface k of side-by-side plies is driven from an outer
 * face: it must pass every ply on that side and still reach the least penetration into the next. Its
 * length is the penetration provided plus the side ply it was sized through. null when a face reaches it.
 */
function reachProblem(s: Schedule, plies: MultiPly, k: number, sidePly: number, units: JobDocument["units"]): string | null {
  const penetration = s.limits.penetration;
  if (!penetration) return null;
  const length = penetration.provided + sidePly;
  const thicknesses = plies.plies.map((p) => p.thickness);
  const reach = fastenerReach({ thicknesses, length, minPenetration: penetration.required }).interfaces[k];
  if (!reach || reach.fromLeft || reach.fromRight) return null;
  const fromLeft = thicknesses.slice(0, k + 1).reduce((a, b) => a + b, 0);
  const fromRight = thicknesses.slice(k + 1).reduce((a, b) => a + b, 0);
  const len = (mm: number) => inJobUnits(mm, "length", units);
  return `${s.connectorLabel}, ${len(length)} long, driven from either outer face does not reach interface ${k + 1} of the plies: it needs ${len(Math.min(fromLeft, fromRight) + penetration.required)} (${len(Math.min(fromLeft, fromRight))} of plies, then the least penetration of ${len(penetration.required)}). Use through-bolts or longer screws at this interface.`;
}

function scheduleFailure(s: Schedule): string {
  if (s.rowFit && !s.rowFit.fits) return `a row does not fit across the contact (${s.detailingProblems.join("; ")})`;
  // Every row passing by its tributary length while the joint fails: too few rows stand within d/2 of a concentrated force.
  if (s.infeasible?.reason && s.verification.passes) return "at the least spacing too few rows stand within half the member depth of a concentrated force to carry what it passes there";
  if (s.infeasible) return "no spacing within the limits carries the shear flow";
  if (s.detailingProblems.length > 0 && s.verification.passes && s.mode === "design") return `the connectors cannot be placed as designed (${s.detailingProblems.join("; ")})`;
  if (s.detailingProblems.length > 0 && s.verification.passes) return `the given spacing is outside the detailing limits (${s.detailingProblems.join("; ")})`;
  if (s.mode === "check" && s.verification.passes && s.detailingProblems.length === 0) return "too few rows of the given schedule stand within half the member depth of a concentrated force to carry what it passes there";
  return s.mode === "check" ? "a row of the given schedule is over-utilised" : "a row is over-utilised";
}

function baseAssumptions(job: JobDocument, beam: BeamAnalysis, combinations: Parameters<typeof beamAssumptions>[2]): string[] {
  return [
    "Linear-elastic member; plane sections remain plane; the parts act as one section (rigid connection), so q = V·Q/I about the transformed section's neutral axis.",
    "Parts of different stiffness are transformed by the modular ratio n = E/E_ref to the first part's material.",
    job.combinations.set === "unfactored"
      ? `Loads are taken as entered, on the ${job.basis === "allowable" ? "allowable-stress (service load)" : "factored (strength)"} basis; resistances and strengths are compared on the same basis.`
      : `Loads are entered as nominal values by category and combined by the factors of each load combination; resistances and strengths are on the ${job.basis === "allowable" ? "allowable-stress" : "factored (design)"} basis.`,
    job.beam.selfWeight ? "Self-weight of the parts (area × density × g) is added as a dead load over the whole member." : "Self-weight is not included (switched off in the job).",
    ...beamAssumptions(job, beam, combinations),
    "Shear stress at a level is averaged over the full width cut at that level.",
    "Zone boundaries are on a round grid from the left end; the first and last rows sit at the end distance from the member ends.",
  ];
}

/** The demand between side-by-side plies, with the bands of concentrated transfer where there are any. */
function demandAndBands({ actions, bands }: ReturnType<typeof interfaceDemandAndBands>): Pick<JointInput, "demandActions" | "concentratedBands"> {
  return bands.length > 0 ? { demandActions: actions, concentratedBands: bands } : { demandActions: actions };
}
