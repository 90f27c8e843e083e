import { el, nextId } from "../dom.js";

/** One numbered step of the form, in the order an engineer thinks through a member. */
export function step(number: number, title: string, intro: string | null, body: (HTMLElement | null)[]): HTMLElement {
  const id = nextId("step");
  return el("section", { className: "step", attrs: { "aria-labelledby": id } }, [
    el("h2", { attrs: { id } }, [el("span", { className: "step-number", text: String(number), attrs: { "aria-hidden": "true" } }), el("span", { text: title })]),
    intro ? el("p", { className: "step-intro", text: intro }) : null,
    ...body,
  ]);
}

/** A row of labelled fields that wraps on narrow screens. */
export const fieldGrid = (children: HTMLElement[], className = "") => el("div", { className: `field-grid ${className}`.trim() }, children);
