import { palette } from "../../../core/draw/drawing.js";
import { lineDiagram } from "../../../core/draw/line-diagram.js";
import type { DesignResult, Schedule } from "../../../core/schema/result.js";
import { NOISE_FLOOR, formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { figure } from "./figure.js";
import { demandName, demandSymbol, isSideLoad } from "./joint-demand.js";
import { spacingPlot } from "./spacing-plot.js";

const combinationLabel = (result: DesignResult, id: string) => result.beam.combinations.find((c) => c.id === id)?.name ?? id;

/** Up to this many combinations are drawn one curve each; beyond it the envelope is drawn, with one chosen combination over it. */
const MAX_CURVES = 3;

/**
 * V and M (M drawn on the tension side, positive downward): every combination when there are few,
 * else the envelope, with the combination `chosen` drawn over it.
 */
export function shearAndMoment(result: DesignResult, width: number, chosen?: string): HTMLElement[] {
  const { beam, unitLabels: u } = result;
  const common = { xUnit: u.span ?? "", x: beam.stations, width, height: 190 };
  const few = beam.perCombination.length <= MAX_CURVES;
  const picked = beam.perCombination.find((c) => c.combination === chosen);
  const curves = (pick: (c: (typeof beam.perCombination)[number]) => number[], envelope: [number[], number[]]) =>
    few
      ? beam.perCombination.map((c) => ({ label: combinationLabel(result, c.combination), values: pick(c), fill: true }))
      : [
          { label: "envelope, largest", values: envelope[0], fill: true, colour: palette.series[0] },
          { label: "smallest", values: envelope[1], fill: true, colour: palette.series[0] },
          ...(picked ? [{ label: picked.combination, values: pick(picked), colour: palette.series[1], dash: [5, 3] }] : []),
        ];
  const extreme = (values: number[], governing: string[], sign: 1 | -1) => {
    let k = 0;
    values.forEach((v, i) => {
      if (sign * v > sign * (values[k] ?? 0)) k = i;
    });
    return { value: values[k] ?? 0, x: beam.stations[k] ?? 0, combination: governing[k] ?? "" };
  };
  const g = beam.envelope.governing;
  const vMax = extreme(beam.envelope.shearMax, g.shearMax, 1);
  const vMin = extreme(beam.envelope.shearMin, g.shearMin, -1);
  const v = Math.abs(vMax.value) >= Math.abs(vMin.value) ? vMax : vMin;
  const mMax = extreme(beam.envelope.momentMax, g.momentMax, 1);
  const mMin = extreme(beam.envelope.momentMin, g.momentMin, -1);
  // A value within the noise floor of the largest of its kind is rounding: shown as 0, and no hogging moment.
  const mScale = Math.max(Math.abs(mMax.value), Math.abs(mMin.value));
  const vScale = Math.abs(v.value);
  const at = (e: { value: number; x: number; combination: string }, unit: string | undefined, scale: number) =>
    `${formatNumber(e.value, 4, scale)} ${unit ?? ""} at x = ${formatNumber(e.x)} ${u.span ?? ""} (${combinationLabel(result, e.combination)})`;
  return [
    figure(lineDiagram({ ...common, title: "Shear force V", yUnit: u.force ?? "", role: "shear", series: curves((c) => c.shear, [beam.envelope.shearMax, beam.envelope.shearMin]) }), "diagram", `Largest |V|: ${at(v, u.force, vScale)}.`),
    figure(
      lineDiagram({ ...common, title: "Bending moment M", yUnit: u.moment ?? "", role: "moment", invert: true, series: curves((c) => c.moment, [beam.envelope.momentMax, beam.envelope.momentMin]) }),
      "diagram",
      `Largest sagging M: ${at(mMax, u.moment, mScale)}.${mMin.value < -NOISE_FLOOR * mScale ? ` Largest hogging M: ${at(mMin, u.moment, mScale)}.` : ""}`,
    ),
  ];
}

/**
 * Envelope of q along each discrete joint, per connector line. Between side-by-side plies the demand is
 * the force a load on one face passes across the interface, and the diagram is captioned so.
 */
export function shearFlow(result: DesignResult, width: number): HTMLElement | null {
  const joints = [...result.schedules.map((s) => s.joint), ...result.welds.map((w) => w.joint)];
  const across = joints.filter((j) => isSideLoad(result, j));
  // Marked one by one only where both kinds of demand share the diagram; otherwise the title says it.
  const side = (joint: string) => (across.length < joints.length && isSideLoad(result, joint) ? " (interface)" : "");
  const lines = coinciding([
    ...result.schedules.map((s) => ({ label: `joint ${s.joint}${side(s.joint)}`, values: s.shearFlow })),
    ...result.welds.map((w) => ({ label: `joint ${w.joint} (weld)${side(w.joint)}`, values: w.shearFlow })),
  ]);
  if (lines.length === 0) return null;
  const u = result.unitLabels;
  const title = across.length === joints.length ? "Force passed across each ply interface, per length" : across.length ? "Shear flow q, and force passed across ply interfaces, per line" : "Shear flow q per contact line";
  const caption = [
    across.length < joints.length ? "q = V·Q/I shared among the joint's contact lines, the largest over the load combinations at each point." : null,
    across.length
      ? `${across.length === 1 ? `Joint ${across[0]}` : `Joints ${across.join(", ")}`}: not shear flow (Q = 0 between plies of one depth) but the force per length that the connectors pass across the interface from a load on one face to the plies beyond, by each ply's E·I share; the largest over the load combinations.`
      : null,
  ]
    .filter(Boolean)
    .join(" ");
  return figure(
    lineDiagram({
      title,
      xUnit: u.span ?? "",
      yUnit: u.shearFlow ?? "",
      x: result.beam.stations,
      width,
      height: 190,
      role: across.length === joints.length ? "interface-force" : "shear-flow",
      series: lines,
      legend: true,
    }),
    "diagram",
    caption,
  );
}

/**
 * Curves that lie on each other (the two flange joints of a symmetric box or I) drawn once under both
 * names, so that no joint seems to be missing from the diagram.
 */
export function coinciding(series: { label: string; values: number[] }[]): { label: string; values: number[] }[] {
  const out: { label: string; values: number[] }[] = [];
  for (const s of series) {
    const scale = Math.max(1e-300, ...s.values.map(Math.abs));
    const same = out.find((o) => o.values.length === s.values.length && o.values.every((v, i) => Math.abs(v - s.values[i]!) <= 1e-9 * scale));
    if (same) same.label = `${same.label} = ${s.label}`;
    else out.push({ ...s });
  }
  return out;
}

/** Required spacing against the zone spacing provided, with the minimum spacing as a floor. */
export function spacingDiagram(result: DesignResult, schedule: Schedule, width: number): HTMLElement {
  const u = result.unitLabels;
  const plot = spacingPlot(result.beam.stations, schedule);
  return figure(
    lineDiagram({
      title: `Joint ${schedule.joint}: spacing`,
      xUnit: u.span ?? "",
      yUnit: u.length ?? "",
      x: plot.x,
      width,
      height: 200,
      yMax: plot.cap,
      role: `spacing ${schedule.joint}`,
      series: [
        { label: "required", values: plot.required, colour: palette.series[1] },
        { label: "zone spacing", values: plot.provided, steps: true, colour: palette.joint },
        { label: "minimum", values: plot.x.map(() => schedule.limits.minSpacing), colour: palette.fail, dash: [4, 3] },
      ],
    }),
    "diagram",
    `Required spacing n·R/${demandSymbol(result, schedule.joint)}, ${demandSymbol(result, schedule.joint)} the ${demandName(result, schedule.joint)} per line (drawn no higher than the largest allowed spacing, ${formatNumber(plot.cap)} ${u.length ?? ""}), against the zone spacing provided. Where the required line dips below the minimum, no spacing within the limits works.`,
  );
}

/** The load combinations the results refer to by id, with their factors; folded away when there are many. */
export function combinations(result: DesignResult): HTMLElement {
  const list = el("dl", { className: "figures combinations" }, [
    ...result.beam.combinations.flatMap((c) => {
      const factors = Object.entries(c.factors)
        .filter(([, f]) => f !== 0)
        .map(([category, f]) => `${formatNumber(f, 3)} × ${category}`)
        .join(" + ");
      const pattern = c.pattern ? `; ${result.beam.patterned.join(", ")} on ${c.pattern.length ? `span${c.pattern.length === 1 ? "" : "s"} ${c.pattern.join(", ")}` : "no span"} only` : "";
      return [el("dt", { text: c.id }), el("dd", { text: `${c.name}: ${factors || "no loads"} (load duration: ${c.duration}${pattern})` })];
    }),
  ]);
  const count = result.beam.combinations.length;
  if (count <= MAX_CURVES) return el("div", {}, [el("h3", { className: "minor", text: "Load combinations" }), list]);
  return el("details", { className: "combinations-fold" }, [el("summary", { text: `${count} load combinations and live-load patterns` }), list]);
}
