import type { Drawing, PathItem } from "../../../core/draw/drawing.js";
import { sectionDrawing } from "../../../core/draw/section-drawing.js";
import { spreadSectionLabels } from "../../../core/draw/section-labels.js";
import { shearStressProfile } from "../../../core/draw/shear-stress-profile.js";
import type { DesignResult, JointResult } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { drawingWidth, figure } from "./figure.js";
import { jointName } from "./joint-names.js";
import { header, shown, table } from "./quantities.js";

/** The section to scale with a joint chooser: the chosen joint's held area is shaded and its width t marked. */
export class SectionView {
  #joint: string | undefined;

  get selectedJoint(): string | undefined {
    return this.#joint;
  }

  render(result: DesignResult, container: HTMLElement): HTMLElement {
    if (!result.joints.some((j) => j.id === this.#joint)) this.#joint = result.joints[0]?.id;
    const box = el("section", { className: "panel", attrs: { id: "section", "aria-labelledby": "section-title" } });
    const draw = () => {
      // Room for the τ profile beside the section when the column is wide enough.
      const size = drawingSize(result, Math.max(260, Math.min(400, drawingWidth(container) - 230)));
      const drawing = spreadSectionLabels(sectionDrawing(result, { ...size, ...(this.#joint ? { joint: this.#joint } : {}) }));
      const section = figure(drawing, "section-figure");
      const frame = partsFrame(drawing);
      const profile = shearStressProfile(result, { width: 210, height: size.height, ...(frame ? { frame } : {}) });
      return el("div", { className: "section-pair" }, [section, profile ? figure(profile, "section-figure stress-figure") : null]);
    };
    const picture = el("div", { className: "section-picture" }, [draw()]);
    const chooser = el("div", { className: "joint-chooser", attrs: { role: "group", "aria-label": "Joint shown on the section" } });
    const jointTable = el("div");
    const words = el("p", { className: "joint-chosen" });
    const refresh = () => {
      picture.replaceChildren(draw());
      const chosen = result.joints.find((j) => j.id === this.#joint);
      words.textContent = chosen ? `Joint ${chosen.id}: ${jointName(chosen, result.section.parts)}.` : "";
      chooser.replaceChildren(
        ...result.joints.map((j) =>
          el("button", {
            className: "joint-button",
            text: `Joint ${j.id}`,
            attrs: { title: jointName(j, result.section.parts), type: "button", "aria-pressed": j.id === this.#joint ? "true" : "false" },
            on: {
              click: () => {
                this.#joint = j.id;
                refresh();
              },
            },
          }),
        ),
      );
      jointTable.replaceChildren(jointsTable(result, this.#joint));
    };
    refresh();
    const s = result.section;
    box.append(
      el("h2", { text: "Section and joint planes", attrs: { id: "section-title" } }),
      el("div", { className: "section-layout" }, [
        picture,
        el("div", { className: "section-side" }, [
          chooser,
          words,
          el("p", { className: "hint", text: "The shaded area is the part held by the chosen joint's connectors; Q is its first moment about the neutral axis, t the width of the joint plane." }),
          el("dl", { className: "properties" }, [
            ...property("Depth", shown(result, s.depth, "length")),
            ...property("Neutral axis above the base", shown(result, s.centroidY, "length")),
            ...property("I (transformed)", shown(result, s.secondMoment, "secondMoment")),
            ...property("Reference E", shown(result, s.referenceModulus, "modulus")),
            ...property("Area / transformed", `${shown(result, s.area, "area")} / ${shown(result, s.transformedArea, "area")}`),
          ]),
        ]),
      ]),
      jointTable,
    );
    return box;
  }
}

/** A drawing no wider than the section needs at a readable height, so a deep narrow member leaves no empty band. */
function drawingSize(result: DesignResult, maxWidth: number): { width: number; height: number } {
  const { x0, x1, y0, y1 } = result.section.bounds;
  const aspect = (x1 - x0) / (y1 - y0 || 1);
  const labels = 150; // the drawing's own margins and the t, Q and N.A. labels beside the section
  const fullHeight = 300;
  const width = aspect * (fullHeight - 52) + labels;
  if (width <= maxWidth) return { width: Math.round(Math.max(260, width)), height: fullHeight };
  return { width: maxWidth, height: Math.round(Math.max(170, (maxWidth - labels) / aspect + 52)) };
}

/** Drawing y of the top and bottom of the parts, from their outlines, so the τ profile lines up with the section. */
function partsFrame(drawing: Drawing): { top: number; bottom: number } | null {
  const ys = drawing.items
    .filter((i) => i.type === "path" && (i.role ?? "").startsWith("part "))
    .flatMap((i) => [...(i as PathItem).d.matchAll(/[ML]\s*(-?[\d.]+)[ ,](-?[\d.]+)/g)].map((m) => Number(m[2])));
  return ys.length ? { top: Math.min(...ys), bottom: Math.max(...ys) } : null;
}

const property = (term: string, value: string) => [el("dt", { text: term }), el("dd", { text: value })];

function jointsTable(result: DesignResult, selected: string | undefined): HTMLElement {
  const u = result.unitLabels;
  const lines = (j: JointResult) => {
    const first = j.lines[0];
    if (!first) return "none";
    const pairs = j.lines.map((l) => l.between.join(" / "));
    const alike = j.lines.every((l) => l.orientation === first.orientation && Math.abs(l.length - first.length) <= 1e-9 * first.length);
    if (alike) return `${j.lines.length} ${first.orientation}, ${formatNumber(first.length)} ${u.length ?? ""}${j.lines.length > 1 ? " each" : ""}: ${pairs.join(", ")}`;
    return j.lines.map((l, k) => `${pairs[k]} (${l.orientation}, ${formatNumber(l.length)} ${u.length ?? ""})`).join(", ");
  };
  return table(
    "Joint planes",
    ["Joint", "Contact lines and connector", header("t", u.length), header("Q", u.firstMoment), header("Q/I", u.perLength), header("Q/(I·t)", u.perArea)],
    result.joints.map((j) => ({
      className: j.id === selected ? "selected" : "",
      cells: [
        el("span", {}, [el("strong", { text: j.id }), el("span", { className: "sub", text: `holds ${j.held.join(", ")}` })]),
        el("span", {}, [
          // A held group named in the job (found: false) has its lines all the same; only a joint with none touches nothing.
          j.lines.length > 0 ? `${lines(j)}${j.found ? "" : " (held group named in the job)"}` : "no contact found",
          el("span", { className: "sub", text: `${j.connectorLabel}${j.mechanism === "discrete" ? `, ${j.rows} per row` : " (bond line)"}` }),
        ]),
        formatNumber(j.contactWidth),
        formatNumber(j.firstMoment),
        formatNumber(j.flowFactor),
        formatNumber(j.stressFactor),
      ],
    })),
    { className: "joints", numeric: [2, 3, 4, 5] },
  );
}
