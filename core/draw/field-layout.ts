import type { BondLineResult, DesignResult, Schedule, WeldResult } from "../schema/result.js";
import { builderDimensions } from "./builder-dimensions.js";
import type { RowAcrossOfJoint } from "./row-across.js";

/** One zone of a joint as built: numbers in the result's units (positions in span units, spacings in length units). */
export interface FieldZone {
  from: number;
  to: number;
  /** Spacing of the rows, or pitch of the weld segments; null for a continuous weld or a bond line. */
  spacing: number | null;
  /** Length of each weld segment; null for connectors, continuous welds and bond lines. */
  segment: number | null;
  /** Rows of connectors (or weld segments) whose position falls in the zone, on one line. */
  rows: number;
  /** Connectors in the zone, all lines; null for welds and bond lines. */
  connectors: number | null;
  /** The zone's first and last row from END A (span units): rows go at the spacing from the first, the last where given; null without rows. */
  firstRow: number | null;
  lastRow: number | null;
  /**
   * How the builder sets the zone's rows out (setOutRows): at the spacing from its first row, back from its last,
   * or from both toward the middle; where none gives the rows, every row is listed.
   */
  setOut: "from-first" | "from-last" | "from-both" | "listed" | null;
  passes: boolean;
  failingCombinations: string[];
}

export type FieldJointKind = "connectors" | "weld" | "bond-line";

/** A joint (or joints built alike) as the builder lays it out along the member. */
export interface FieldJoint {
  joints: string[];
  kind: FieldJointKind;
  mode: "design" | "check";
  /** The connector as the builder names it; a weld by its leg, as its zones set the segments and pitch. */
  connectorLabel: string;
  /** Connectors side by side in one row (gauge lines), or fillets on each line; 1 for a bond line. */
  across: number;
  lineCount: number;
  zones: FieldZone[];
  /** Rows (connectors) or segment centres (intermittent weld) from END A, span units; empty when continuous. */
  positions: number[];
  /** Distance of the first and last row from the ends of the joint's run, length units; null when there are no rows. */
  endDistance: { start: number; end: number } | null;
  /** Where the joint runs when a part it holds starts or stops along the member (a cover plate), span units; null: the whole member. */
  run: { from: number; to: number; part: string } | null;
  /** Intermittent segments on the two sides of a web: opposite each other or alternating. */
  arrangement: "chain" | "staggered" | null;
  /** Least distances across the line, length units, where the connector has them: between the connectors of a row, and to an edge. */
  acrossLine: { spacing: number | null; edge: number | null };
  /**
   * Where a row's connectors sit across the contact, joint by joint (the schedule's layoutAcross, and the contact's width
   * there, length units); none for a joint whose result gives none. Joints gathered into one entry may differ here (the
   * part driven from), so this is not part of what makes two joints the same along the member.
   */
  acrossLayouts: RowAcrossOfJoint[];
  /** Contact width of a bond line, length units. */
  bondWidth: number | null;
  passes: boolean;
}

export interface FieldLayoutOptions {
  /** A weld's electrode by connector id ("E70"), for its name on the sheet. */
  electrodeOf?: (connector: string) => string | undefined;
}

type Source = { kind: "schedule"; item: Schedule } | { kind: "weld"; item: WeldResult } | { kind: "bond-line"; item: BondLineResult };

/**
 * The joints of a result as the builder lays them out (those that can be built), in the result's joint order, with joints
 * whose layout is the same in every number (the top and bottom joints of a symmetric box beam)
 * gathered into one entry so the sheet shows them once.
 */
export function fieldLayout(
  result: Pick<DesignResult, "joints" | "schedules" | "welds" | "bondLines" | "beam" | "units">,
  options: FieldLayoutOptions,
): FieldJoint[] {
  const sources: { source: Source; run: FieldJoint["run"] }[] = [];
  for (const j of result.joints) {
    const schedule = result.schedules.find((s) => s.joint === j.id);
    const weld = (result.welds ?? []).find((w) => w.joint === j.id);
    const bond = result.bondLines.find((b) => b.joint === j.id);
    // Named by part id, as the section sketch names the parts.
    const run = j.extent ? { ...j.extent, part: j.held.join(", ") } : null;
    // A row that does not fit across its contact cannot be built: no layout is drawn for it (the sheet says why).
    if (schedule && schedule.rowFit && !schedule.rowFit.fits) continue;
    if (schedule) sources.push({ source: { kind: "schedule", item: schedule }, run });
    else if (weld) sources.push({ source: { kind: "weld", item: weld }, run });
    else if (bond) sources.push({ source: { kind: "bond-line", item: bond }, run });
  }
  const groups = new Map<string, FieldJoint>();
  for (const { source, run } of sources) {
    const joint = fieldJointOf(result, source, run, options);
    const key = JSON.stringify({ ...joint, joints: [], acrossLayouts: [] }, (_k, v: unknown) => (typeof v === "number" ? Number(v.toPrecision(9)) : v));
    const same = groups.get(key);
    if (same) {
      same.joints.push(...joint.joints);
      same.acrossLayouts.push(...joint.acrossLayouts);
    }
    else groups.set(key, joint);
  }
  return [...groups.values()];
}

function fieldJointOf(result: Pick<DesignResult, "beam" | "units">, source: Source, run: FieldJoint["run"], options: FieldLayoutOptions): FieldJoint {
  const start = run?.from ?? 0;
  const end = run?.to ?? result.beam.length;
  const k = builderDimensions(result.units).spanToLength;
  const ends = (positions: number[]) =>
    positions.length > 0 ? { start: (positions[0]! - start) * k, end: (end - positions[positions.length - 1]!) * k } : null;

  if (source.kind === "schedule") {
    const s = source.item;
    return {
      joints: [s.joint],
      kind: "connectors",
      mode: s.mode,
      connectorLabel: s.connectorLabel,
      across: s.rows,
      lineCount: s.lineCount,
      zones: s.zones.map((z, i) => ({
        from: z.from,
        to: z.to,
        spacing: z.spacing,
        segment: null,
        rows: s.positions.filter(inZone(z, i === s.zones.length - 1)).length,
        connectors: z.count,
        ...rowsAtEnds(s.positions.filter(inZone(z, i === s.zones.length - 1)), z.spacing / k, z),
        passes: z.passes,
        failingCombinations: z.failingCombinations,
      })),
      positions: s.positions,
      endDistance: ends(s.positions),
      run,
      arrangement: null,
      acrossLine: { spacing: s.rows > 1 ? (s.limits.rowSpacing ?? null) : null, edge: s.limits.edgeDistance ?? null },
      acrossLayouts: s.layoutAcross ? [{ joint: s.joint, layout: s.layoutAcross, contact: s.rowFit?.available ?? null }] : [],
      bondWidth: null,
      passes: s.passes,
    };
  }

  if (source.kind === "weld") {
    const w = source.item;
    const segment = w.zones.find((z) => z.segmentLength !== null)?.segmentLength ?? w.segmentLength;
    const intermittent = w.zones.some((z) => z.pattern === "intermittent") && segment !== null;
    // The segments where the weld was designed or checked: a segment at each end of its run, the rest at each zone's pitch.
    const positions = intermittent ? w.positions : [];
    return {
      joints: [w.joint],
      kind: "weld",
      mode: w.mode,
      connectorLabel: weldName(w, result.units, options.electrodeOf?.(w.connector)),
      across: w.fillets,
      lineCount: w.lineCount,
      zones: w.zones.map((z, i) => ({
        from: z.from,
        to: z.to,
        spacing: z.pattern === "intermittent" ? z.pitch : null,
        segment: z.pattern === "intermittent" ? z.segmentLength : null,
        rows: z.pattern === "intermittent" ? positions.filter(inZone(z, i === w.zones.length - 1)).length : 0,
        connectors: null,
        ...rowsAtEnds(z.pattern === "intermittent" ? positions.filter(inZone(z, i === w.zones.length - 1)) : [], (z.pitch ?? 0) / k, z),
        passes: z.passes,
        failingCombinations: z.failingCombinations,
      })),
      positions,
      endDistance: intermittent ? { start: 0, end: 0 } : null,
      run,
      // Sides to stagger only with an even number of fillets (one each side of a web, or two pairs).
      arrangement: intermittent && w.fillets % 2 === 0 ? w.arrangement : null,
      acrossLine: { spacing: null, edge: null },
      acrossLayouts: [],
      bondWidth: null,
      passes: w.passes,
    };
  }

  const b = source.item;
  return {
    joints: [b.joint],
    kind: "bond-line",
    mode: "design",
    connectorLabel: b.connectorLabel,
    across: 1,
    lineCount: 1,
    zones: [{ from: start, to: end, spacing: null, segment: null, rows: 0, connectors: null, firstRow: null, lastRow: null, setOut: null, passes: b.passes, failingCombinations: b.passes ? [] : [b.combination] }],
    positions: [],
    endDistance: null,
    run,
    arrangement: null,
    acrossLine: { spacing: null, edge: null },
    acrossLayouts: [],
    bondWidth: b.width,
    passes: b.passes,
  };
}

/** A weld by its leg and electrode: "3/16 in E70 fillet weld", "fillet weld, leg 6 mm"; its zones give the segments and pitch. */
function weldName(w: WeldResult, units: DesignResult["units"], electrode: string | undefined): string {
  const leg = builderDimensions(units).length(w.limits.size);
  return units === "us" ? `${leg}${electrode ? ` ${electrode}` : ""} fillet weld` : `fillet weld, leg ${leg}${electrode ? `, ${electrode}` : ""}`;
}

/** Whether x falls in a zone: from its start up to (not including) its end, the last zone including the member end. */
/**
 * The rows a builder sets out in a zone from its first and last rows at its spacing (span units): from the first
 * (the last row where given), back from the last (the first where given), or from both toward the middle of the
 * zone, with a row in the middle where the gap left there is more than the spacing.
 */
export function setOutRows(first: number, last: number, spacing: number, rule: "from-first" | "from-last" | "from-both", middle = (first + last) / 2): number[] {
  const tol = 1e-6 * Math.max(1, spacing, Math.abs(last));
  if (spacing <= 0 || last - first <= tol) return last - first <= tol ? [first] : [first, last];
  const forward = (to: number) => {
    const out: number[] = [];
    for (let k = 0, x = first; x <= to + tol; x = first + ++k * spacing) out.push(x);
    return out;
  };
  const back = (to: number) => {
    const out: number[] = [];
    for (let k = 0, x = last; x >= to - tol; x = last - ++k * spacing) out.unshift(x);
    return out;
  };
  if (rule === "from-first") {
    const out = forward(last).filter((x) => x < last - tol);
    return [...out, last];
  }
  if (rule === "from-last") {
    const out = back(first).filter((x) => x > first + tol);
    return [first, ...out];
  }
  const left = forward(middle);
  const right = back(middle).filter((x) => x > left[left.length - 1]! + tol);
  const gap = right.length > 0 ? right[0]! - left[left.length - 1]! : 0;
  return gap > spacing + tol ? [...left, middle, ...right] : [...left, ...right];
}

/** First and last row of a zone and how its rows are set out; spacing in span units. */
function rowsAtEnds(xs: number[], spacing: number, zone: { from: number; to: number }): Pick<FieldZone, "firstRow" | "lastRow" | "setOut"> {
  if (xs.length === 0) return { firstRow: null, lastRow: null, setOut: null };
  const first = xs[0]!;
  const last = xs[xs.length - 1]!;
  const same = (ys: number[]) => ys.length === xs.length && ys.every((y, i) => Math.abs(y - xs[i]!) <= 1e-6 * Math.max(1, Math.abs(y)));
  const rule = (["from-first", "from-last", "from-both"] as const).find((r) => same(setOutRows(first, last, spacing, r, (zone.from + zone.to) / 2)));
  return { firstRow: first, lastRow: last, setOut: rule ?? "listed" };
}

const inZone = (z: { from: number; to: number }, last: boolean) => (x: number) => x >= z.from - 1e-9 && (last ? x <= z.to + 1e-9 : x < z.to - 1e-9);
