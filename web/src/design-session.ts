import type { MaterialFamily } from "../../core/units/shown-units.js";
import type { JobIssue } from "../../core/schema/job-issues.js";
import type { DesignResult } from "../../core/schema/result.js";
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
  /** The joints of the last result (and whether its section is side-by-side plies), as the form last listed them. */
  #jointsSeen = "";
  #keepResults = false;
  readonly #designedListeners: ((result: DesignResult) => void)[] = [];

  constructor(formRoot: HTMLElement, resultsRoot: HTMLElement, job: JobDraft, schema: JobSchema) {
    this.state = new JobState(job);
    this.#results = new ResultsView(resultsRoot, (path) => this.registry.focus(path));
    this.#form = new JobForm(formRoot, this.state, this.registry, schema, () => this.#results.result, () => this.registry.show(this.#issues));
    this.#design = new DebouncedDesign((signal) => this.#compute(signal));
    this.state.onChange((change, path) => {
      storeJob(this.state.job);
      if (change !== "field") this.#issues = this.#serviceIssues = [];
      if (change === "replace") {
        if (!this.#keepResults) this.#results.clear();
        this.#jointsSeen = "";
        this.#form.render();
      }
      if (change === "field" && REFERENCED_TEXT.test(path)) this.#form.refreshReferences();
      this.#results.markUpdating();
      this.#design.schedule();
    });
    this.#form.render();
    storeJob(this.state.job);
  }

  get result(): DesignResult | null {
    return this.#results.result;
  }

  /** The result shown matches the input now entered: no edit is waiting and the last answer was a result. */
  get resultsCurrent(): boolean {
    return this.#results.isCurrent;
  }

  /** Called with every new result (the toolbar's exports follow it). */
  onDesigned(listener: (result: DesignResult) => void): void {
    this.#designedListeners.push(listener);
  }

  /** Draws the form again, e.g. after the units changed. */
  redrawForm(): void {
    this.#form.render();
  }

  /** Designs now, without waiting for the pause after typing. */
  designNow(): Promise<void> {
    return this.#design.now();
  }

  /** Another job, or the same job rewritten (units converted): with `keepResults` the last results stay, marked as updating, until the new ones come. */
  replaceJob(job: JobDraft, options: { keepResults?: boolean } = {}): void {
    this.#keepResults = options.keepResults ?? false;
    this.state.replaceAll(job);
    this.#keepResults = false;
    void this.designNow();
  }

  /** Shows issues from elsewhere (the worksheet request) at their fields. */
  showIssues(issues: JobIssue[]): void {
    this.#issues = this.#serviceIssues = issues;
    const placed = this.registry.show(issues);
    this.#results.showNotice({ freshness: "invalid", issues: placed });
  }

  async #compute(signal: AbortSignal): Promise<void> {
    const job = this.state.job;
    const answer = await requestDesign(job, signal);
    if (signal.aborted) return;
    if (answer.kind === "designed") {
      this.#serviceIssues = [];
      this.#issues = [];
      this.registry.show([]);
      this.#results.showResult(answer.result, Array.isArray(job.materials) ? (job.materials as MaterialFamily[]) : []);
      this.#results.showNotice({ freshness: "current", issues: [] });
      // Whether the section is side-by-side plies decides whether the loads table offers the face a load arrives on.
      const joints = JSON.stringify([answer.result.multiPly !== null, answer.result.joints.map((j) => [j.id, j.connector, j.connectorLabel, j.rows, j.mechanism, j.contactWidth])]);
      if (joints !== this.#jointsSeen) {
        this.#jointsSeen = joints;
        this.#form.refreshFromResult();
      }
      for (const listener of this.#designedListeners) listener(answer.result);
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
