import type { JobIssue } from "../../core/schema/job-issues.js";
import { requestDesign } from "./api.js";
import { DebouncedDesign } from "./debounced-design.js";
import { FieldRegistry } from "./form/field-registry.js";
import { JobForm } from "./form/job-form.js";
import type { JobSchema } from "./job-schema.js";
import { storeJob } from "./job-storage.js";
import { JobState, type JobDraft } from "./job-state.js";
import { ResultsView } from "./results/results-view.js";

const REFERENCED_TEXT = /^(materials|connectors|parts)\[\d+\]\.(id|name|label)$/;

/** Ties the job, its form and its results together: every edit is kept, stored, and designed again. */
export class DesignSession {
  readonly state: JobState;
  readonly registry = new FieldRegistry();
  readonly #form: JobForm;
  readonly #results: ResultsView;
  readonly #design: DebouncedDesign;
  /** Issues shown at the fields now, and the part of them the service reported. */
  #issues: JobIssue[] = [];
  #serviceIssues: JobIssue[] = [];

  constructor(formRoot: HTMLElement, resultsRoot: HTMLElement, job: JobDraft, schema: JobSchema) {
    this.state = new JobState(job);
    this.#results = new ResultsView(resultsRoot, (path) => this.registry.focus(path));
    this.#form = new JobForm(formRoot, this.state, this.registry, schema, () => this.registry.show(this.#issues));
    this.#design = new DebouncedDesign((signal) => this.#compute(signal));
    this.state.onChange((change, path) => {
      storeJob(this.state.job);
      if (change !== "field") this.#issues = this.#serviceIssues = [];
      if (change === "replace") {
        this.#results.clear();
        this.#form.render();
      }
      if (change === "field" && REFERENCED_TEXT.test(path)) this.#form.refreshReferences();
      this.#results.markUpdating();
      this.#design.schedule();
    });
    this.#form.render();
    storeJob(this.state.job);
  }

  /** Designs now, without waiting for the pause after typing. */
  designNow(): Promise<void> {
    return this.#design.now();
  }

  replaceJob(job: JobDraft): void {
    this.state.replaceAll(job);
    void this.designNow();
  }

  /** Shows issues from elsewhere (the worksheet request) at their fields. */
  showIssues(issues: JobIssue[]): void {
    this.#issues = this.#serviceIssues = issues;
    const placed = this.registry.show(issues);
    this.#results.showNotice({ freshness: "invalid", issues: placed });
  }

  async #compute(signal: AbortSignal): Promise<void> {
    const answer = await requestDesign(this.state.job, signal);
    if (signal.aborted) return;
    if (answer.kind === "designed") {
      this.#serviceIssues = [];
      this.#issues = [];
      this.registry.show([]);
      this.#results.showResult(answer.result);
      this.#results.showNotice({ freshness: "current", issues: [] });
      return;
    }
    // When the service cannot answer, its last word on the other fields still stands.
    if (answer.kind === "invalid") this.#serviceIssues = answer.issues;
    // Text that is not a number is explained here; the service would only say a number is required.
    const local = this.registry.localIssues((path) => this.state.read(path));
    const localPaths = new Set(local.map((i) => i.path));
    this.#issues = [...local, ...this.#serviceIssues.filter((i) => !localPaths.has(i.path))];
    const placed = this.registry.show(this.#issues);
    this.#results.showNotice({ freshness: answer.kind === "invalid" ? "invalid" : "unreachable", issues: placed, message: answer.message });
  }
}
