import { builderDimensions } from "../../../core/draw/builder-dimensions.js";
import { rowAcrossDrawing, rowAcrossLines, rowAcrossOf } from "../../../core/draw/row-across.js";
import { scheduleElevation } from "../../../core/draw/schedule-elevation.js";
import type { DesignResult, Schedule } from "../../../core/schema/result.js";
import { formatNumber, formatRatio } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { spacingDiagram } from "./diagrams.js";
import { figure } from "./figure.js";
import { isSideLoad, partName } from "./joint-demand.js";
import { along, alongCell, header, range, shown, table, tapeAt, utilisation } from "./quantities.js";

/** One joint's schedule: the zones a builder follows, how economical they are, and the row-by-row check. */
export function scheduleBlock(result: DesignResult, schedule: Schedule, width: number): HTMLElement {
  const u = result.unitLabels;
  const e = schedule.efficiency;
  const v = schedule.verification;
  const checked = schedule.mode === "check";
  // In US units the zone ends also in feet and inches, as the field sheet gives them to the builder.
  const zoneEnds = (from: number, to: number) => alongCell(result, from, to);
  const zones = table(
    `${checked ? "Checked schedule" : "Schedule"}, joint ${schedule.joint}`,
    ["Zone", header("From – to", u.span), header(checked ? "Spacing given" : "Spacing", u.length), "Per row", "Count", header("Required", u.length), "Utilisation"],
    schedule.zones.map((z, k) => ({
      className: z.passes ? "" : "fails",
      cells: [
        String(k + 1),
        zoneEnds(z.from, z.to),
        z.note ? el("span", {}, [formatNumber(z.spacing), el("span", { className: "sub", text: `note ${k + 1}` })]) : formatNumber(z.spacing),
        String(z.rows),
        String(z.count),
        z.requiredSpacing === null ? "any" : formatNumber(z.requiredSpacing),
        el("span", {}, [
          utilisation(z.utilisation, z.passes),
          z.failingCombinations.length
            ? el("span", { className: "sub", text: `fails under ${z.failingCombinations.join(", ")}` })
            : result.beam.combinations.length > 1
              ? el("span", { className: "sub", text: z.governingCombination })
              : null,
        ]),
      ],
    })),
    { className: "schedule", numeric: [2, 3, 4, 5] },
  );
  const resistance = resistanceText(result, schedule);
  const l = schedule.limits;
  const limits = [
    `minimum ${shown(result, l.minSpacing, "length")}`,
    `maximum ${shown(result, l.maxSpacing, "length")}`,
    `end distance ${shown(result, l.endDistance, "length")}`,
    l.module !== null ? `module ${shown(result, l.module, "length")}` : null,
    l.edgeDistance ? `edge distance ${shown(result, l.edgeDistance, "length")}` : null,
    l.rowSpacing ? `spacing within a row ${shown(result, l.rowSpacing, "length")}` : null,
    l.penetration ? `penetration ${shown(result, l.penetration.provided, "length")} (at least ${shown(result, l.penetration.required, "length")})` : null,
    l.preferred ? `preferred ${l.preferred.map((p) => formatNumber(p)).join(", ")} ${u.length ?? ""}` : null,
    `shortest zone ${shown(result, l.minZoneLength, "length")}`,
  ].filter(Boolean);
  const fails = !schedule.passes;
  // Where the connectors of a row sit across the contact, as the field sheet gives it to the builder.
  const dims = builderDimensions(result.units);
  const across = rowAcrossOf([schedule.joint], schedule);
  const acrossDrawing = rowAcrossDrawing(across, dims, { width: Math.min(width, 320), height: 110 });
  return el("article", { className: `schedule-block${fails ? " fails" : ""}`, attrs: { "aria-label": `${checked ? "Checked schedule" : "Schedule"} for joint ${schedule.joint}` } }, [
    el("h3", {}, [
      `${checked ? "Checked: joint" : "Joint"} ${schedule.joint}: ${schedule.connectorLabel}, ${schedule.rows} per row on ${schedule.lineCount} line${schedule.lineCount === 1 ? "" : "s"}`,
      el("span", { className: `verdict ${fails ? "fails" : "passes"}`, text: fails ? "fails" : "passes" }),
    ]),
    fails ? el("p", { className: "fails-text", text: checked ? "This schedule does not carry the shear flow everywhere (or breaks a detailing limit): do not build it as given." : "This schedule does not pass: see the red rows and the options above. Do not build it as it stands." }) : null,
    schedule.detailingProblems.length ? el("ul", { className: "fails-text detailing" }, schedule.detailingProblems.map((d) => el("li", { text: d }))) : null,
    demandNote(result, schedule),
    figure(scheduleElevation(result, schedule, { width, height: 92 }), "diagram elevation"),
    zones,
    zoneNotes(schedule),
    el("dl", { className: "figures" }, [
      ...term("Connectors", `${schedule.count} in all (every line of the joint)`),
      ...term("Lower bound", `${formatNumber(e.lowerBound, 4)} (∫ of demand over resistance along the member: no schedule can use fewer)`),
      ...term("Count ÷ lower bound", e.countOverLowerBound === null ? "—" : formatRatio(e.countOverLowerBound)),
      // How a single spacing would compare is a question for a schedule being designed, not one given.
      ...(checked
        ? []
        : term(
            "One uniform spacing",
            e.uniformSpacing === null || e.uniformCount === null ? "none within the limits carries the load" : `${shown(result, e.uniformSpacing, "length")} throughout, ${e.uniformCount} connectors (${e.uniformOverCount === null ? "—" : formatRatio(e.uniformOverCount)} × this schedule)`,
          )),
      ...term("Resistance per connector", resistance),
      ...term("Limits", limits.join(", ")),
      ...term("Across the contact", rowAcrossLines(across, dims).join(" ")),
    ]),
    acrossDrawing ? figure(acrossDrawing, "diagram row-across") : null,
    el("p", { className: `verification${v.passes ? "" : " fails"}` }, [
      el("strong", { text: v.passes ? "Row check passes: " : "Row check fails: " }),
      `largest utilisation ${formatRatio(v.maxUtilisation)} at x = ${along(result, v.at)} (${v.combination}). Method: ${v.method}.`,
    ]),
    perCombination(result, schedule),
    resistanceDetails(result, schedule),
    spacingDiagram(result, schedule, width),
  ]);
}

/** Why a zone is closer than the shear flow along it needs, beside its number. */
function zoneNotes(schedule: Schedule): HTMLElement | null {
  const notes = schedule.zones.map((z, k) => (z.note ? `Zone ${k + 1}: ${z.note}` : null)).filter((n): n is string => n !== null);
  return notes.length ? el("ul", { className: "zone-notes" }, notes.map((n) => el("li", { text: n }))) : null;
}

const term = (name: string, value: string) => [el("dt", { text: name }), el("dd", { text: value })];

/** What the joint's connectors carry, where it is not the plain shear flow over the whole member. */
function demandNote(result: DesignResult, schedule: Schedule): HTMLElement | null {
  const joint = result.joints.find((j) => j.id === schedule.joint);
  if (!joint) return null;
  const notes: string[] = [];
  if (isSideLoad(result, joint.id)) {
    const between = joint.lines[0]?.between.map((id) => partName(result, id)).join(" and ");
    notes.push(`Force passed across the interface${between ? ` between ${between}` : ""}, not shear flow: ${joint.sharing}`);
  }
  if (joint.extent) {
    const { from, to } = joint.extent;
    notes.push(`Rows only over the part's run, ${range(result, from, to)}${tapeAt(result, from) ? ` (${tapeAt(result, from)} – ${tapeAt(result, to)})` : ""}.`);
  }
  return notes.length ? el("p", { className: "demand-note", text: notes.join(" ") }) : null;
}

/** The worst row under each combination, folded when there are many. */
function perCombination(result: DesignResult, schedule: Schedule): HTMLElement | null {
  if (schedule.perCombination.length < 2) return null;
  const rows = table(
    `Worst row per combination, joint ${schedule.joint}`,
    ["Combination", header("At", result.unitLabels.span), "Utilisation"],
    schedule.perCombination.map((c) => ({ className: c.maxUtilisation > 1 ? "fails" : "", cells: [c.combination, alongCell(result, c.at), utilisation(c.maxUtilisation, c.maxUtilisation <= 1)] })),
    { numeric: [1], captionHidden: true },
  );
  return el("details", { className: "result-fold" }, [el("summary", { text: `Worst row under each of the ${schedule.perCombination.length} combinations` }), rows]);
}

/** Every mode the connector's resistance was checked for, its slip moduli and the conditions a reviewer must confirm. */
function resistanceDetails(result: DesignResult, schedule: Schedule): HTMLElement | null {
  const first = schedule.resistance[0];
  if (!first) return null;
  const warnings = [...new Set(schedule.resistance.flatMap((r) => r.warnings ?? []))];
  const modes = first.modes ?? [];
  const body: (HTMLElement | null)[] = [
    modes.length
      ? table(
          `Resistance modes, joint ${schedule.joint} (${first.combination})`,
          ["Mode", header("Resistance", result.unitLabels.connectorForce), "Reference"],
          modes.map((m) => ({ className: m.value === first.value ? "selected" : "", cells: [m.mode, formatNumber(m.value), m.reference ?? ""] })),
          { numeric: [1] },
        )
      : null,
    first.slip ? el("p", { className: "hint", text: `Slip modulus per connector and shear plane: K_ser = ${shown(result, first.slip.serviceability, "slipModulus")}, K_u = ${shown(result, first.slip.ultimate, "slipModulus")} (${first.slip.reference}).` }) : null,
    warnings.length ? el("div", { className: "confirm" }, [el("strong", { text: "To confirm: " }), el("ul", {}, warnings.map((w) => el("li", { text: w })))]) : null,
  ];
  if (body.every((b) => b === null)) return null;
  return el("details", { className: `result-fold${warnings.length ? " has-warnings" : ""}`, attrs: warnings.length ? { open: true } : {} }, [
    el("summary", { text: `Resistance: ${modes.length ? `${modes.length} modes checked` : "from the rating"}${warnings.length ? `, ${warnings.length} condition${warnings.length === 1 ? "" : "s"} to confirm` : ""}` }),
    ...body,
  ]);
}

/** Resistance per connector, once for every group of combinations that share the same value and reason. */
function resistanceText(result: DesignResult, schedule: Schedule): string {
  const groups = new Map<string, string[]>();
  for (const r of schedule.resistance) {
    const text = `${shown(result, r.value, "connectorForce")} (${r.governing}; ${r.reference})`;
    groups.set(text, [...(groups.get(text) ?? []), r.combination]);
  }
  const all = schedule.resistance.length;
  return [...groups]
    .map(([text, ids]) => (groups.size === 1 ? `${text}${all > 1 ? `, every combination` : `, ${ids[0]}`}` : `${text} for ${ids.join(", ")}`))
    .join("; ");
}
