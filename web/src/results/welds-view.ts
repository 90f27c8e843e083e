import { palette } from "../../../core/draw/drawing.js";
import { lineDiagram } from "../../../core/draw/line-diagram.js";
import type { DesignResult, WeldResult } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { figure } from "./figure.js";
import { along, alongCell, header, shown, table, utilisation } from "./quantities.js";

type WeldZone = WeldResult["zones"][number];

const zoneWeld = (result: DesignResult, z: WeldZone) =>
  z.pattern === "continuous" ? "continuous" : `${formatNumber(z.segmentLength ?? 0)} ${result.unitLabels.length ?? ""} long @ ${formatNumber(z.pitch ?? 0)} ${result.unitLabels.length ?? ""}`;

/** Carrying capacity per contact line in a zone: fillets × resistance per length × the welded share of the length. */
const zoneCapacity = (w: WeldResult, z: WeldZone, perLength: number) => w.fillets * perLength * (z.pattern === "continuous" || !z.segmentLength || !z.pitch ? 1 : z.segmentLength / z.pitch);

/** One welded joint: the zones of weld along the member, how much each is used, and the size a failing weld needs. */
export function weldBlock(result: DesignResult, w: WeldResult, width: number): HTMLElement {
  const u = result.unitLabels;
  const checked = w.mode === "check";
  const zones = table(
    `${checked ? "Checked welds" : "Welds"}, joint ${w.joint}`,
    ["Zone", header("From – to", u.span), "Weld (each fillet)", "Utilisation"],
    w.zones.map((z, k) => ({
      className: z.passes ? "" : "fails",
      cells: [
        String(k + 1),
        alongCell(result, z.from, z.to),
        zoneWeld(result, z),
        el("span", {}, [utilisation(z.utilisation, z.passes), z.failingCombinations.length ? el("span", { className: "sub", text: `fails under ${z.failingCombinations.join(", ")}` }) : null]),
      ],
    })),
    { className: "schedule welds", numeric: [1] },
  );
  const leastResistance = Math.min(...w.resistance.map((r) => r.value));
  const groups = new Map<string, string[]>();
  for (const r of w.resistance) {
    const text = `${shown(result, r.value, "shearFlow")} per fillet (${r.governing}; ${r.reference})`;
    groups.set(text, [...(groups.get(text) ?? []), r.combination]);
  }
  const resistance = [...groups].map(([text, ids]) => (groups.size === 1 ? `${text}${w.resistance.length > 1 ? ", every combination" : ""}` : `${text} for ${ids.join(", ")}`)).join("; ");
  const l = w.limits;
  const limits = [
    `size ${shown(result, l.size, "length")} (least ${shown(result, l.minSize, "length")}, most ${shown(result, l.maxSize, "length")})`,
    w.pattern === "intermittent" ? `segments at least ${shown(result, l.minSegmentLength, "length")}` : null,
    l.maxPitch !== null ? `pitch at most ${shown(result, l.maxPitch, "length")}` : null,
    l.maxGap !== null ? `gap at most ${shown(result, l.maxGap, "length")}` : null,
  ].filter(Boolean);
  const warnings = [...new Set(w.resistance.flatMap((r) => r.warnings ?? []))];
  const capacity = result.beam.stations.map((x) => {
    const zone = w.zones.find((z) => x >= z.from && x <= z.to);
    return zone ? zoneCapacity(w, zone, leastResistance) : null;
  });
  const fails = !w.passes;
  return el("article", { className: `schedule-block weld-block${fails ? " fails" : ""}`, attrs: { "aria-label": `${checked ? "Checked welds" : "Welds"} for joint ${w.joint}` } }, [
    el("h3", {}, [
      `${checked ? "Checked: joint" : "Joint"} ${w.joint}: ${w.connectorLabel}, ${w.fillets} fillet${w.fillets === 1 ? "" : "s"} on ${w.lineCount} line${w.lineCount === 1 ? "" : "s"}`,
      el("span", { className: `verdict ${fails ? "fails" : "passes"}`, text: fails ? "fails" : "passes" }),
    ]),
    fails ? el("p", { className: "fails-text", text: w.sizeNote ?? "These welds do not carry the shear flow everywhere; do not build them as they stand." }) : null,
    fails && w.sizeNeeded !== null ? el("p", { className: "fails-text", text: `A continuous fillet of ${shown(result, w.sizeNeeded, "length")} would carry it.` }) : null,
    zones,
    el("dl", { className: "figures" }, [
      ...term("Weld deposited", `${shown(result, w.weldLength, "span")} of fillet in all (every fillet on every line)`),
      ...(w.pattern === "intermittent" ? term("Both sides of a web", w.arrangement === "chain" ? "chain: segments opposite each other" : "staggered: segments alternate, with one at each end on both sides") : []),
      ...term("Largest shear flow", `${shown(result, w.maxShearFlow, "shearFlow")} per line at x = ${along(result, w.at)} (${w.combination}), utilisation ${formatNumber(w.utilisation, 3)}`),
      ...term("Resistance", resistance),
      ...term("Limits", limits.join(", ")),
    ]),
    warnings.length ? el("div", { className: "confirm" }, [el("strong", { text: "To confirm: " }), el("ul", {}, warnings.map((t) => el("li", { text: t })))]) : null,
    figure(
      lineDiagram({
        title: `Joint ${w.joint}: shear flow per line against the welds`,
        xUnit: u.span ?? "",
        yUnit: u.shearFlow ?? "",
        x: result.beam.stations,
        width,
        height: 200,
        role: `weld ${w.joint}`,
        series: [
          { label: "q per line", values: w.shearFlow, colour: palette.series[1] },
          { label: "weld capacity", values: capacity, colour: palette.joint, steps: true },
        ],
      }),
      "diagram",
      `Capacity per line = fillets × least resistance per length${w.pattern === "intermittent" ? " × segment ÷ pitch" : ""}; where q rises above it the weld fails.`,
    ),
  ]);
}

const term = (name: string, value: string) => [el("dt", { text: name }), el("dd", { text: value })];
