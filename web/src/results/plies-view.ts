import type { DesignResult } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { partName } from "./joint-demand.js";
import { header, shown, table } from "./quantities.js";

type MultiPly = NonNullable<DesignResult["multiPly"]>;

/** A share or fraction to three figures, with float noise shown as the zero it is. */
const fraction = (v: number) => formatNumber(Math.abs(v) < 1e-9 ? 0 : v, 3);

/** A fraction of a unit load passed across an interface, with the way it goes (positive: from the left ply towards the right). */
function passed(v: number): HTMLElement {
  if (Math.abs(v) < 1e-9) return el("span", { className: "passed none", text: "0" });
  return el("span", { className: "passed" }, [formatNumber(Math.abs(v), 3), el("span", { className: "direction", text: v > 0 ? " →" : " ←", attrs: { title: v > 0 ? "passed towards the right" : "passed towards the left" } })]);
}

/**
 * Side-by-side plies of one depth: each ply's share of every load by E·I, and per interface the
 * fraction of a unit load it passes by the face the load arrives on, with the largest force per length
 * it passes in this job and the connectors that do it.
 */
export function pliesPanel(result: DesignResult): HTMLElement | null {
  const m = result.multiPly;
  if (!m) return null;
  const u = result.unitLabels;
  return el("section", { className: "panel plies", attrs: { id: "plies", "aria-labelledby": "plies-title" } }, [
    el("h2", { text: "Side-by-side plies: load shares and what each interface passes", attrs: { id: "plies-title" } }),
    el("p", {
      className: "hint",
      text: "Plies of one depth deflect together, so each carries its E·I share of every load. A load that arrives on one face (joists hung on one side) must be passed across the interfaces to the plies beyond; the connectors of each interface are scheduled for that force, not for a shear flow (Q = 0 between plies of one depth).",
    }),
    table(
      "Share of each load by ply",
      ["Ply", "Share of each load (E·I)"],
      m.plies.map((p) => ({ cells: [el("span", {}, [partName(result, p.part), el("span", { className: "sub", text: p.part })]), `${fraction(p.share)} (${formatNumber(p.share * 100, 3)} %)`] })),
      { className: "ply-shares", numeric: [1] },
    ),
    table(
      "What each interface passes: the fraction of a unit load, by the face it arrives on, and the largest force in this job",
      ["Interface", "Left face", "Right face", "On top", header("Largest here", `${u.shearFlow ?? ""} per line`), "Connectors"],
      m.interfaces.map((i) => interfaceRow(result, i)),
      { className: "ply-interfaces", numeric: [1, 2, 3, 4] },
    ),
    el("p", { className: "hint", text: "Fractions of a unit load; → passed from the left ply towards the right, ← the other way. “Largest here” is this job's force per length across the interface, the largest over the load combinations; the diagrams and schedules of these joints show it along the member." }),
  ]);
}

function interfaceRow(result: DesignResult, i: MultiPly["interfaces"][number]): { cells: (string | Node)[]; className?: string } {
  const schedule = result.schedules.find((s) => s.joint === i.joint);
  const weld = result.welds.find((w) => w.joint === i.joint);
  const flow = schedule?.shearFlow ?? weld?.shearFlow ?? [];
  const largest = flow.reduce((m, v) => Math.max(m, Math.abs(v ?? 0)), 0);
  const fails = (schedule && !schedule.passes) || (weld && !weld.passes);
  return {
    className: fails ? "fails" : "",
    cells: [
      el("span", {}, [el("strong", { text: i.between.join(" / ") }), el("span", { className: "sub", text: i.joint ? `joint ${i.joint}` : "no joint found here" })]),
      passed(i.fromLeftFace),
      passed(i.fromRightFace),
      passed(i.fromTop),
      i.joint && (schedule || weld) ? formatNumber(largest) : "—",
      schedule
        ? el("span", {}, [`${schedule.count} × ${schedule.connectorLabel}`, el("span", { className: "sub", text: schedule.passes ? "passes" : "FAILS: see its schedule" })])
        : weld
          ? el("span", {}, [`${shown(result, weld.weldLength, "span")} of weld`, el("span", { className: "sub", text: weld.passes ? "passes" : "FAILS: see its welds" })])
          : "—",
    ],
  };
}
