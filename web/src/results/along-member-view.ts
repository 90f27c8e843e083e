import { stretchElevation } from "../../../core/draw/stretch-elevation.js";
import type { DesignResult } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { figure } from "./figure.js";
import { partName } from "./joint-demand.js";
import { header, table } from "./quantities.js";

/**
 * A member whose section changes along it (a part that starts or stops, such as a cover plate): the
 * member in elevation with each part's run and the cut-offs, the section stretch by stretch, and Q/I of
 * every joint in each stretch it crosses.
 */
export function alongMemberPanel(result: DesignResult, width: number): HTMLElement | null {
  const stretches = result.stretches;
  if (stretches.length === 0) return null;
  const u = result.unitLabels;
  const y0 = result.section.bounds.y0;
  const jointsAlong = result.joints.filter((j) => j.stretches.length > 0);
  return el("section", { className: "panel", attrs: { id: "along", "aria-labelledby": "along-title" } }, [
    el("h2", { text: "Section along the member", attrs: { id: "along-title" } }),
    el("p", {
      className: "hint",
      text: "Parts start or stop along this member, so its section changes: the stiffness analysis, the shear flow and the member checks use each stretch's own section. The section panel above shows the full section.",
    }),
    figure(stretchElevation(result, { width }), "diagram elevation along-elevation", "Not to scale across the depth. Dashed lines: the theoretical cut-off of each end of a part (where the section without it carries the moment); the connectors between a cut-off and the part's end must develop the part's force there (see the ends of parts under the schedule)."),
    table(
      "Section stretch by stretch",
      ["Stretch", header("From – to", u.span), "Parts present", header("Area", u.area), header("N.A. above the base", u.length), header("I (transformed)", u.secondMoment)],
      stretches.map((s, k) => ({
        cells: [String(k + 1), `${formatNumber(s.from)} – ${formatNumber(s.to)}`, s.parts.map((id) => partName(result, id)).join(", "), formatNumber(s.area), formatNumber(s.centroidY - y0), el("strong", { text: formatNumber(s.secondMoment) })],
      })),
      { className: "stretches", numeric: [1, 3, 4, 5] },
    ),
    jointsAlong.length
      ? table(
          "Joints stretch by stretch",
          ["Joint", header("Runs", u.span), header("Stretch", u.span), header("Q", u.firstMoment), header("Q/I", u.perLength)],
          jointsAlong.flatMap((j) =>
            j.stretches.map((s, k) => ({
              cells: [
                k === 0 ? el("span", {}, [el("strong", { text: j.id }), el("span", { className: "sub", text: `holds ${j.held.map((id) => partName(result, id)).join(", ")}` })]) : "",
                k === 0 ? (j.extent ? `${formatNumber(j.extent.from)} – ${formatNumber(j.extent.to)}` : "whole member") : "",
                `${formatNumber(s.from)} – ${formatNumber(s.to)}`,
                formatNumber(s.firstMoment),
                formatNumber(s.flowFactor),
              ],
            })),
          ),
          { className: "joint-stretches", numeric: [1, 2, 3, 4] },
        )
      : null,
  ]);
}
