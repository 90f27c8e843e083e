import type { DesignResult } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { alongCell, header, table, utilisation } from "./quantities.js";

/** Where a part stops short of the member's ends: the force it must take up by then, and what the connectors there develop. */
export function terminationsBlock(result: DesignResult): HTMLElement | null {
  const ends = result.terminations;
  if (ends.length === 0) return null;
  const u = result.unitLabels;
  return el("div", { className: "terminations" }, [
    el("h3", { text: "Ends of parts that stop short of the member's ends" }),
    table(
      "Part ends",
      ["Part end", header("At", u.span), header("Cut-off", u.span), header("Force", u.force), header("Length available / needed", u.span), header("Developed", u.force), "Utilisation"],
      ends.map((t) => ({
        className: t.passes ? "" : "fails",
        cells: [
          `${t.part}, ${t.end}`,
          alongCell(result, t.at),
          t.cutoff === null ? "—" : alongCell(result, t.cutoff),
          formatNumber(t.force),
          `${formatNumber(t.available)}${t.required === null ? "" : ` / ${formatNumber(t.required)}`}`,
          formatNumber(t.capacity),
          t.utilisation === null ? el("span", { className: t.passes ? "" : "fails-text", text: "no connectors there" }) : utilisation(t.utilisation, t.passes),
        ],
      })),
      { numeric: [1, 2, 3, 4, 5], captionHidden: true },
    ),
    el(
      "ul",
      { className: "termination-notes" },
      ends.map((t) => el("li", { className: t.passes ? "" : "fails-text", text: `${t.part}, ${t.end} end (joint ${t.joint}): ${t.connectors}. ${t.note ? `${t.note} ` : ""}(${t.reference})` })),
    ),
    el("p", { className: "hint", text: "The part's force at the cut-off is M·Q/I of the full section; the connectors between the cut-off and the part's end must develop it." }),
  ]);
}
