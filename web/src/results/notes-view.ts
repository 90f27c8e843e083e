import type { DesignResult } from "../../../core/schema/result.js";
import { el } from "../dom.js";

const list = (items: string[], empty: string) => (items.length ? el("ul", {}, items.map((t) => el("li", { text: t }))) : el("p", { className: "hint", text: empty }));

/** What the result rests on: warnings, limits of the check, assumptions, standards, and the input's fingerprint. */
export function notes(result: DesignResult): HTMLElement[] {
  return [
    result.warnings.length ? el("section", { className: "panel warnings", attrs: { "aria-label": "Warnings" } }, [el("h2", { text: "Warnings" }), list(result.warnings, "")]) : null,
    el("section", { className: "panel", attrs: { id: "basis", "aria-labelledby": "not-checked-title" } }, [
      el("h2", { text: "Not checked by stitchplan", attrs: { id: "not-checked-title" } }),
      list(result.notChecked, "Nothing listed."),
      el("h2", { text: "Assumptions" }),
      list(result.assumptions, "None listed."),
      el("h2", { text: "Standards and sources used" }),
      list(result.standards, "None listed."),
      el("h2", { text: "Input fingerprint" }),
      el("p", { className: "hint", text: "SHA-256 of the job as entered, with the schema and program versions. The worksheet prints the same value, so a reviewer can match a sheet to its input." }),
      el("p", { className: "fingerprint", text: result.fingerprint ?? "(not given by the service)" }),
    ]),
  ].filter((x): x is HTMLElement => x !== null);
}
