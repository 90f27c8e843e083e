import type { DesignResult } from "../../../core/schema/result.js";
import type { JobSchema } from "../job-schema.js";
import type { JobState } from "../job-state.js";
import { checkStep } from "./check-step.js";
import { columnStep } from "./column-step.js";
import { combinationsStep } from "./combinations-step.js";
import { compositeStep } from "./composite-step.js";
import { connectorsStep } from "./connectors-step.js";
import type { FormContext } from "./controls.js";
import type { FieldRegistry } from "./field-registry.js";
import { jointsStep } from "./joints-step.js";
import { loadsStep } from "./loads-step.js";
import { materialsStep } from "./materials-step.js";
import { partsStep } from "./parts-step.js";
import { projectStep } from "./project-step.js";
import { spacingStep } from "./spacing-step.js";

/** In the order a person thinks a member through. */
const steps = [projectStep, materialsStep, partsStep, connectorsStep, jointsStep, loadsStep, columnStep, combinationsStep, checkStep, spacingStep, compositeStep];
/** Steps drawn from the last result (the joints it found; whether the section is side-by-side plies), drawn again when those change. */
const fromResult = new Set<(typeof steps)[number]>([jointsStep, loadsStep, checkStep]);

/** The job form: rebuilt whole when rows are added or removed, edited in place otherwise. */
export class JobForm {
  readonly #ctx: FormContext;
  readonly #root: HTMLElement;
  readonly #afterRender: () => void;
  #drawn: HTMLElement[] = [];
  /** Steps drawn from the result that wait while the user types in them. */
  readonly #pendingResultSteps = new Set<number>();

  constructor(root: HTMLElement, state: JobState, registry: FieldRegistry, schema: JobSchema, result: () => DesignResult | null, afterRender: () => void) {
    this.#root = root;
    this.#afterRender = afterRender;
    this.#ctx = { state, registry, schema, references: [], rerender: (focusPath) => this.render(focusPath), result };
    // Steps drawn from the result wait while the user is typing in them, and catch up when they leave.
    root.addEventListener("focusout", () => {
      if (this.#pendingResultSteps.size) queueMicrotask(() => this.#redraw([...this.#pendingResultSteps]));
    });
  }

  render(focusPath?: string): void {
    const active = document.activeElement;
    const activePath = active instanceof HTMLElement && this.#root.contains(active) ? active.dataset.path : undefined;
    this.#ctx.registry.clearEntries();
    this.#ctx.references.length = 0;
    this.#drawn = steps.map((make, i) => make(this.#ctx, i + 1));
    this.#root.replaceChildren(...this.#drawn);
    this.#pendingResultSteps.clear();
    const target = focusPath ?? activePath;
    if (target) this.#root.querySelector<HTMLElement>(`[data-path="${CSS.escape(target)}"]`)?.focus();
    this.#afterRender();
  }

  /** The joints found changed: draws the steps that list them again, each unless the user is typing in it (that one catches up when they leave). */
  refreshFromResult(): void {
    this.#redraw(steps.flatMap((make, i) => (fromResult.has(make) ? [i] : [])));
  }

  #redraw(indices: number[]): void {
    const active = document.activeElement;
    this.#pendingResultSteps.clear();
    for (const i of indices) {
      if (this.#drawn[i]?.contains(active)) {
        this.#pendingResultSteps.add(i);
        continue;
      }
      const next = steps[i]!(this.#ctx, i + 1);
      this.#drawn[i]?.replaceWith(next);
      this.#drawn[i] = next;
    }
    this.#ctx.registry.forgetDetached();
    this.#afterRender();
  }

  /** Select lists follow the ids and names of materials and connectors as they are typed. */
  refreshReferences(): void {
    for (const fill of this.#ctx.references) fill();
  }
}
