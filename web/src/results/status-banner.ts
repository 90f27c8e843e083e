import type { DesignResult } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { demandName } from "./joint-demand.js";
import { range, shown } from "./quantities.js";

/** Passes or fails, in words, with every failure and every joint no spacing can fasten. */
export function statusBanner(result: DesignResult): HTMLElement {
  const { status } = result;
  const infeasible = result.schedules.filter((s) => s.infeasible);
  return el("section", { className: `status-banner ${status.passes ? "passes" : "fails"}`, attrs: { "aria-labelledby": "status-title", id: "status" } }, [
    el("h2", { attrs: { id: "status-title" }, text: status.passes ? "Passes every check made" : "Does not pass" }),
    el("p", { className: "status-summary", text: status.summary }),
    status.failures.length ? el("ul", { className: "failures" }, status.failures.map((f) => el("li", { text: f }))) : null,
    ...infeasible.map((s) => {
      const where = s.infeasible!.where.map((w) => range(result, w.from, w.to)).join(" and ");
      return el("div", { className: "infeasible" }, [
        el("h3", { text: `Joint ${s.joint}: no spacing within the limits carries the ${demandName(result, s.joint)}` }),
        el("p", {
          text: `${
            s.infeasible!.reason
              ? `Over ${where}: ${s.infeasible!.reason}`
              : `Over ${where} the required spacing falls to ${shown(result, s.infeasible!.smallestRequired, "length")}, below the minimum spacing of ${shown(result, s.infeasible!.minSpacing, "length")}.`
          } The schedule below is placed at the minimum there and fails. Options, each designed again with the change:`,
        }),
        el("ul", {}, s.infeasible!.options.map((o) => el("li", { text: o }))),
      ]);
    }),
    el("p", {
      className: "status-meta",
      text: `${result.member.mark} rev ${result.member.revision} · ${result.mode === "check" ? "check of the schedule given" : "schedule designed"} · ${result.basis} basis · ${result.units === "us" ? "US customary" : "SI"} units · ${result.program.name} ${result.program.version} · ${connectorTotal(result)}`,
    }),
  ]);
}

function connectorTotal(result: DesignResult): string {
  const count = result.schedules.reduce((n, s) => n + s.count, 0);
  const weld = result.welds.reduce((n, w) => n + w.weldLength, 0);
  const parts = [
    result.schedules.length ? `${formatNumber(count)} connectors in all` : null,
    result.welds.length ? `${formatNumber(weld)} ${result.unitLabels.span ?? ""} of fillet weld` : null,
    result.bondLines.length ? `${result.bondLines.length} glue line${result.bondLines.length === 1 ? "" : "s"}` : null,
  ].filter(Boolean);
  return parts.join(", ") || "no fastened joints";
}
