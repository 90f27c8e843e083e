import { palette } from "../../../core/draw/drawing.js";
import { lineDiagram } from "../../../core/draw/line-diagram.js";
import type { DesignResult, Schedule } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { figure } from "./figure.js";
import { spacingPlot } from "./spacing-plot.js";

const combinationLabel = (result: DesignResult, id: string) => result.beam.combinations.find((c) => c.id === id)?.name ?? id;

/** V for each combination, and M drawn on the tension side (positive downward). */
export function shearAndMoment(result: DesignResult, width: number): HTMLElement[] {
  const { beam, unitLabels: u } = result;
  const common = { xUnit: u.span ?? "", x: beam.stations, width, height: 190 };
  return [
    figure(lineDiagram({ ...common, title: "Shear force V", yUnit: u.force ?? "", role: "shear", series: beam.perCombination.map((c) => ({ label: combinationLabel(result, c.combination), values: c.shear, fill: true })) })),
    figure(lineDiagram({ ...common, title: "Bending moment M", yUnit: u.moment ?? "", role: "moment", invert: true, series: beam.perCombination.map((c) => ({ label: combinationLabel(result, c.combination), values: c.moment, fill: true })) })),
  ];
}

/** Envelope of q along each discrete joint, per connector line. */
export function shearFlow(result: DesignResult, width: number): HTMLElement | null {
  if (result.schedules.length === 0) return null;
  const u = result.unitLabels;
  return figure(
    lineDiagram({
      title: "Shear flow q per contact line",
      xUnit: u.span ?? "",
      yUnit: u.shearFlow ?? "",
      x: result.beam.stations,
      width,
      height: 190,
      role: "shear-flow",
      series: result.schedules.map((s) => ({ label: `joint ${s.joint}`, values: s.shearFlow })),
    }),
    "diagram",
    "q = V·Q/I shared among the joint's contact lines, the largest over the load combinations at each point.",
  );
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
    `Required spacing n·R/q (drawn no higher than the largest allowed spacing, ${formatNumber(plot.cap)} ${u.length ?? ""}) against the zone spacing provided. Where the required line dips below the minimum, no spacing within the limits works.`,
  );
}

/** The load combinations the results refer to by id, with their factors. */
export function combinations(result: DesignResult): HTMLElement {
  return el("dl", { className: "figures combinations" }, [
    ...result.beam.combinations.flatMap((c) => {
      const factors = Object.entries(c.factors)
        .filter(([, f]) => f !== 0)
        .map(([category, f]) => `${formatNumber(f, 3)} × ${category}`)
        .join(" + ");
      return [el("dt", { text: c.id }), el("dd", { text: `${c.name}: ${factors || "no loads"} (load duration: ${c.duration})` })];
    }),
  ]);
}
