import { pathInWords, plainMessage } from "../form/issue-words.js";
import type { DesignResult } from "../../../core/schema/result.js";
import { el } from "../dom.js";
import type { PlacedIssue } from "../form/field-registry.js";
import { alongMemberPanel } from "./along-member-view.js";
import { bondLines, columnTables, memberChecks } from "./checks-view.js";
import { compositePanel } from "./composite-view.js";
import { combinations, shearAndMoment, shearFlow } from "./diagrams.js";
import { drawingWidth } from "./figure.js";
import { notes } from "./notes-view.js";
import { pliesPanel } from "./plies-view.js";
import { scheduleBlock } from "./schedule-view.js";
import { SectionView } from "./section-view.js";
import { statusBanner } from "./status-banner.js";
import { terminationsBlock } from "./terminations-view.js";
import { weldBlock } from "./welds-view.js";

/** How the results shown relate to the input in the form. */
export type Freshness = "current" | "updating" | "invalid" | "unreachable";

export interface ResultsNotice {
  freshness: Freshness;
  issues: PlacedIssue[];
  /** Why the service gave no result (unreachable, or its message for bad input). */
  message?: string;
}

/** The results column: a notice about the input on top, the last valid result below it. */
export class ResultsView {
  readonly #notice = el("div", { className: "results-notice", attrs: { "aria-live": "polite" } });
  readonly #state = el("p", { className: "results-state", attrs: { role: "status" } });
  readonly #body = el("div", { className: "results-body" });
  /** On narrow screens, where the results sit far below the form: the verdict kept in view while editing. */
  readonly #summary = el("div", { className: "results-summary", attrs: { "aria-hidden": "true" } });
  readonly #section = new SectionView();
  readonly #nav = el("nav", { className: "results-nav", attrs: { "aria-label": "Results sections" } });
  #result: DesignResult | null = null;
  #freshness: Freshness = "updating";
  #drawnWidth = 0;
  /** Combination drawn over the envelope, kept across recomputes. */
  #combination: string | undefined;

  constructor(
    root: HTMLElement,
    private readonly onIssue: (path: string) => void,
  ) {
    root.append(
      el("div", { className: "results-head" }, [
        el("h2", { text: "Results" }),
        this.#state,
        this.#nav,
      ]),
      this.#notice,
      this.#body,
    );
    this.#renderNav(null);
    this.#body.append(el("p", { className: "hint", text: "Computing the example…" }));
    document.body.append(this.#summary);
    let timer: number | undefined;
    window.addEventListener("resize", () => {
      clearTimeout(timer);
      timer = window.setTimeout(() => {
        if (drawingWidth(this.#body) !== this.#drawnWidth) this.#renderBody();
      }, 200);
    });
  }

  get result(): DesignResult | null {
    return this.#result;
  }

  /** Whether the result shown was computed from the input as it stood at the last answer. */
  get isCurrent(): boolean {
    return this.#result !== null && this.#freshness === "current";
  }

  /** An edit is waiting to be designed: says so, and keeps any red notice until the answer comes. */
  markUpdating(): void {
    if (this.#freshness === "current") this.#freshness = "updating";
    this.#state.textContent = "Updating…";
    this.#state.className = "results-state updating";
    this.#renderSummary();
  }

  #renderSummary(): void {
    const result = this.#result;
    const verdict = !result ? "No results yet" : result.status.passes ? "Passes" : "Does not pass";
    const count = result ? result.schedules.reduce((n, s) => n + s.count, 0) : 0;
    this.#summary.className = `results-summary ${this.#state.className.replace("results-state", "").trim()} ${result && !result.status.passes ? "fails" : ""}`.trim();
    this.#summary.replaceChildren(
      el("span", { className: "summary-state", text: this.#state.textContent ?? "" }),
      el("span", { className: "summary-verdict", text: result && count ? `${verdict} · ${count} connectors` : verdict }),
      el("a", { text: "Results ↓", attrs: { href: "#results", tabindex: -1 } }),
    );
  }

  /** A different job was opened: results of the one before must not be shown as if they were its own. */
  clear(): void {
    this.#result = null;
    this.#renderNav(null);
    this.#body.classList.remove("stale");
    this.#body.replaceChildren(el("p", { className: "hint", text: "Computing the job just opened…" }));
  }

  showResult(result: DesignResult): void {
    this.#result = result;
    this.#renderBody();
  }

  showNotice(notice: ResultsNotice): void {
    this.#freshness = notice.freshness;
    const stale = notice.freshness === "invalid" || notice.freshness === "unreachable";
    this.#body.classList.toggle("stale", stale && this.#result !== null);
    this.#state.textContent = { current: "Up to date with the input", updating: "Updating…", invalid: "Input has problems", unreachable: "Service not answering" }[notice.freshness];
    this.#state.className = `results-state ${notice.freshness}`;
    this.#renderSummary();
    if (!stale) {
      this.#notice.replaceChildren();
      return;
    }
    if (!this.#result) this.#body.replaceChildren(el("p", { className: "hint", text: "Results appear here as soon as the input is complete and valid." }));
    const count = notice.issues.length;
    const headline =
      notice.freshness === "unreachable"
        ? notice.message ?? "The service did not answer."
        : `The input has ${count === 1 ? "a problem" : `${count} problems`}; each is marked at its field.`;
    this.#notice.replaceChildren(
      el("div", { className: "stale-banner", attrs: { role: "alert" } }, [
        el("p", { className: "stale-headline", text: headline }),
        el("p", {
          text: this.#result
            ? "The results below are from the last valid input, not from what is entered now. Your entries are kept."
            : "No results yet. Your entries are kept; fix the fields marked in red.",
        }),
        count
          ? el(
              "ul",
              { className: "issue-list" },
              notice.issues.map((issue) =>
                el("li", {}, [
                  el("button", {
                    className: "issue-link",
                    attrs: { type: "button" },
                    on: { click: () => this.onIssue(issue.path) },
                    text: `${issue.fieldLabel ?? pathInWords(issue.path)}: ${plainMessage(issue.message)}`,
                  }),
                ]),
              ),
            )
          : null,
      ]),
    );
  }

  /** V and M; with many combinations, the envelope and a chooser for one combination to draw over it. */
  #actions(result: DesignResult, width: number): HTMLElement {
    const box = el("div");
    const ids = result.beam.perCombination.map((c) => c.combination);
    if (!ids.includes(this.#combination ?? "")) this.#combination = undefined;
    const draw = () => box.replaceChildren(...(chooser ? [chooser] : []), ...shearAndMoment(result, width, this.#combination));
    const chooser =
      ids.length > 3
        ? el("label", { className: "combination-chooser" }, [
            "Also draw ",
            el(
              "select",
              {
                on: {
                  change: (event) => {
                    this.#combination = (event.target as HTMLSelectElement).value || undefined;
                    draw();
                    box.querySelector("select")?.focus();
                  },
                },
              },
              [el("option", { text: "no single combination", attrs: { value: "" } }), ...ids.map((id) => el("option", { text: id, attrs: { value: id, selected: id === this.#combination } }))],
            ),
          ])
        : null;
    draw();
    return box;
  }

  /** Links to the panels the result has: plies, the section along the member and composite action only where they apply. */
  #renderNav(result: DesignResult | null): void {
    const links: [string, string, boolean][] = [
      ["#status", "Status", true],
      ["#section", "Section", true],
      ["#plies", "Plies", Boolean(result?.multiPly)],
      ["#along", "Along", Boolean(result?.stretches.length)],
      ["#composite", "Composite", Boolean(result?.composite)],
      ["#diagrams", "Diagrams", true],
      ["#schedules", "Schedule", true],
      ["#checks", "Checks", true],
      ["#basis", "Basis", true],
    ];
    this.#nav.replaceChildren(...links.filter(([, , shown]) => shown).map(([href, text]) => el("a", { text, attrs: { href } })));
  }

  #renderBody(): void {
    const result = this.#result;
    if (!result) return;
    this.#renderNav(result);
    const width = drawingWidth(this.#body);
    this.#drawnWidth = width;
    const checked = result.mode === "check";
    const fastened = result.schedules.length + result.welds.length;
    const schedules = el("section", { className: `panel${checked ? " checked-mode" : ""}`, attrs: { id: "schedules", "aria-labelledby": "schedules-title" } }, [
      el("h2", { text: checked ? "Checked schedule (given in the job)" : "Connector schedule", attrs: { id: "schedules-title" } }),
      checked ? el("p", { className: "hint", text: "Check mode: the zones below are the ones entered in step 8, checked against the shear flow; nothing was laid out by stitchplan." }) : null,
      ...result.schedules.map((s) => scheduleBlock(result, s, width)),
      ...result.welds.map((w) => weldBlock(result, w, width)),
      terminationsBlock(result),
      fastened ? null : el("p", { className: "hint", text: "No joint is fastened with discrete connectors or welds." }),
    ]);
    const bond = bondLines(result, width);
    this.#body.replaceChildren(
      statusBanner(result),
      this.#section.render(result, this.#body),
      pliesPanel(result) ?? "",
      alongMemberPanel(result, width) ?? "",
      compositePanel(result) ?? "",
      el("section", { className: "panel", attrs: { id: "diagrams", "aria-labelledby": "diagrams-title" } }, [
        el("h2", { text: result.joints.length > 0 && result.joints.every((j) => j.demand === "side-load") ? "Shear, moment and force across the ply interfaces" : "Shear, moment and shear flow", attrs: { id: "diagrams-title" } }),
        combinations(result),
        this.#actions(result, width),
        shearFlow(result, width),
      ]),
      schedules,
      bond.length ? el("section", { className: "panel", attrs: { "aria-labelledby": "bond-title" } }, [el("h2", { text: "Bond lines", attrs: { id: "bond-title" } }), ...bond]) : "",
      el("section", { className: "panel", attrs: { id: "checks", "aria-labelledby": "checks-title" } }, [el("h2", { text: "Member checks", attrs: { id: "checks-title" } }), memberChecks(result), ...columnTables(result)]),
      ...notes(result),
    );
    this.#body.classList.toggle("stale", this.#freshness === "invalid" || this.#freshness === "unreachable");
  }
}
