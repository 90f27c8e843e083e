import type { JobSchema } from "../job-schema.js";
import type { JobState } from "../job-state.js";
import { basisStep } from "./basis-step.js";
import { connectorsStep } from "./connectors-step.js";
import type { FormContext } from "./controls.js";
import { fasteningStep } from "./fastening-step.js";
import type { FieldRegistry } from "./field-registry.js";
import { loadsStep } from "./loads-step.js";
import { materialsStep } from "./materials-step.js";
import { partsStep } from "./parts-step.js";
import { projectStep } from "./project-step.js";
import { spacingStep } from "./spacing-step.js";

const steps = [projectStep, basisStep, materialsStep, partsStep, loadsStep, connectorsStep, fasteningStep, spacingStep];

/** The job form: rebuilt whole when rows are added or removed, edited in place otherwise. */
export class JobForm {
  readonly #ctx: FormContext;
  readonly #root: HTMLElement;
  readonly #afterRender: () => void;

  constructor(root: HTMLElement, state: JobState, registry: FieldRegistry, schema: JobSchema, afterRender: () => void) {
    this.#root = root;
    this.#afterRender = afterRender;
    this.#ctx = { state, registry, schema, references: [], rerender: (focusPath) => this.render(focusPath) };
  }

  render(focusPath?: string): void {
    const active = document.activeElement;
    const activePath = active instanceof HTMLElement && this.#root.contains(active) ? active.dataset.path : undefined;
    this.#ctx.registry.clearEntries();
    this.#ctx.references.length = 0;
    this.#root.replaceChildren(...steps.map((make, i) => make(this.#ctx, i + 1)));
    const target = focusPath ?? activePath;
    if (target) this.#root.querySelector<HTMLElement>(`[data-path="${CSS.escape(target)}"]`)?.focus();
    this.#afterRender();
  }

  /** Select lists follow the ids and names of materials and connectors as they are typed. */
  refreshReferences(): void {
    for (const fill of this.#ctx.references) fill();
  }
}
