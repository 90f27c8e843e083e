import type { Drawing } from "../../../core/draw/drawing.js";
import { renderSvg } from "../../../core/draw/render-svg.js";
import { el } from "../dom.js";

/** A core drawing on the page. renderSvg escapes every text it writes, so its string is safe to insert. */
export function figure(drawing: Drawing, className = "diagram", caption?: string): HTMLElement {
  const box = el("figure", { className });
  box.innerHTML = renderSvg(drawing);
  if (caption) box.append(el("figcaption", { text: caption }));
  return box;
}

/** Drawing width for a container: its inner width, within reason. */
export const drawingWidth = (container: HTMLElement, max = 760) => Math.round(Math.max(300, Math.min(container.clientWidth || 640, max)));
