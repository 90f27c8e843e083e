import { el } from "../dom.js";
import { lookUpFingerprint } from "./store-api.js";
import { when } from "./store-view.js";

interface LookUpOptions {
  say: (text: string, tone?: "info" | "problem" | "caution") => void;
  open: (projectId: number, memberId: number, revision: number) => void;
}

/** Finds the issued worksheets and saved revisions behind a fingerprint printed on a sheet (8 or more of its digits). */
export function fingerprintLookUp(options: LookUpOptions): HTMLElement {
  const input = el("input", { attrs: { type: "text", id: "fingerprint-query", autocomplete: "off", spellcheck: "false", placeholder: "e.g. 3f9a0c12", maxlength: 64 } });
  const found = el("div", { className: "lookup-found", attrs: { "aria-live": "polite" } });
  const form = el("form", { className: "lookup-form" }, [
    el("label", { text: "Fingerprint from the sheet's footer", attrs: { for: "fingerprint-query" } }),
    el("div", { className: "with-button" }, [input, el("button", { text: "Find", attrs: { type: "submit" } })]),
  ]);
  form.addEventListener("submit", async (event) => {
    event.preventDefault();
    const text = input.value.replace(/\s+/g, "");
    if (!/^[0-9a-fA-F]{8,64}$/.test(text)) {
      found.replaceChildren(el("p", { className: "field-issue", text: "A fingerprint is hexadecimal digits (0–9, a–f); the first 8 or more are enough." }));
      return;
    }
    const answer = await lookUpFingerprint(text);
    if (!answer.ok) {
      found.replaceChildren(el("p", { className: answer.problem.status === 404 ? "hint" : "field-issue", text: answer.problem.message }));
      return;
    }
    const { issues, revisions } = answer.value;
    found.replaceChildren(
      el("p", { className: "fingerprint", text: answer.value.fingerprint }),
      issues.length
        ? el("div", {}, [
            el("h4", { text: `Issued as (${issues.length})` }),
            el(
              "ul",
              {},
              issues.map((i) =>
                el("li", {}, [
                  `Worksheet #${i.id}: ${i.projectName} › ${i.mark}, revision ${i.revision} (title block ${i.titleRevision || "—"}), issued ${when(i.issuedAt)}, ${i.fileName} `,
                  el("button", { className: "row-button", text: "Open", attrs: { type: "button", "aria-label": `Open revision ${i.revision} of ${i.mark}` }, on: { click: () => options.open(i.projectId, i.memberId, i.revision) } }),
                ]),
              ),
            ),
          ])
        : el("p", { className: "hint", text: "No worksheet with this fingerprint has been issued from this store." }),
      revisions.length
        ? el("div", {}, [
            el("h4", { text: `Saved revisions with this input (${revisions.length})` }),
            el(
              "ul",
              {},
              revisions.map((r) =>
                el("li", {}, [
                  `${r.projectName} › ${r.mark}, revision ${r.revision}, saved ${when(r.savedAt)} `,
                  el("button", { className: "row-button", text: "Open", attrs: { type: "button", "aria-label": `Open revision ${r.revision} of ${r.mark} (saved)` }, on: { click: () => options.open(r.projectId, r.memberId, r.revision) } }),
                ]),
              ),
            ),
          ])
        : "",
    );
  });
  return el("section", { className: "store-panel lookup-panel", attrs: { "aria-labelledby": "lookup-title" } }, [el("h3", { text: "Find a worksheet", attrs: { id: "lookup-title" } }), form, found]);
}
