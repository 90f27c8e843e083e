import { el } from "../dom.js";

/** Folds the user opened, by a key such as "connectors[1].seldom", kept open when the form is drawn again. */
const opened = new Set<string>();

/** A fold for fields a person rarely changes; it opens by itself when one of them has a problem (see FieldRegistry). */
export function fold(key: string, summary: string, children: (HTMLElement | null)[]): HTMLDetailsElement {
  const details = el("details", { className: "fold", attrs: { "data-fold": key } }, [el("summary", { text: summary }), ...children]);
  details.open = opened.has(key);
  details.addEventListener("toggle", () => (details.open ? opened.add(key) : opened.delete(key)));
  return details;
}
