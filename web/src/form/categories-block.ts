import type { LoadCategory } from "../../../core/schema/job.js";
import { el } from "../dom.js";
import { addButton, numberControl, recordTable, rowButton, selectControl, textControl, type FormContext } from "./controls.js";
import { renameReferences, uniqueId } from "./references.js";

type Item = Record<string, unknown>;

// Listed here rather than imported so the page bundle does not carry zod; the check below keeps the lists equal.
export const builtInCategoryList: readonly string[] = ["dead", "live", "roof-live", "snow", "wind"] as const satisfies readonly LoadCategory[];
type Listed = "dead" | "live" | "roof-live" | "snow" | "wind";
const everyCategoryListed: [Exclude<LoadCategory, Listed>] extends [never] ? true : never = true;
void everyCategoryListed;
const durations = ["permanent", "long", "medium", "short", "instantaneous"];

/** Every category a load may take in this job: the built-in ones and the job's own. */
export function categoryIds(ctx: FormContext): string[] {
  const builtIn = ctx.schema.choices("beam.categories[].actsAs") ?? builtInCategoryList;
  const own = ctx.state.list("beam.categories").map((c) => String((c as Item)?.id ?? "")).filter(Boolean);
  return [...builtIn, ...own.filter((id) => !builtIn.includes(id))];
}

/** The job's own load categories: each acts as a built-in one in the combination sets, with its own duration and ψ0 if given. */
export function categoriesBlock(ctx: FormContext): HTMLElement {
  const { state } = ctx;
  const count = state.list("beam.categories").length;
  const at = (i: number, key: string) => `beam.categories[${i}].${key}`;
  const name = (i: number) => `Category ${i + 1}`;
  const actsAs = (ctx.schema.choices("beam.categories[].actsAs") ?? builtInCategoryList).map((c) => ({ value: c, label: c.replace("-", " ") }));
  const { table, issues } = recordTable(ctx, {
    caption: "Own load categories",
    listPath: "beam.categories",
    itemName: name,
    count,
    columns: [
      {
        header: "Id",
        className: "col-id",
        cell: (i) => {
          const input = textControl(ctx, at(i, "id"), "id", { maxLength: 40 });
          renameReferences(ctx, input, "beam.categories", (oldId, newId) => {
            state.list("beam.loads").forEach((load, k) => {
              if ((load as Item).category === oldId) state.set(`beam.loads[${k}].category`, newId);
            });
          });
          return { path: at(i, "id"), name: "id", control: input };
        },
      },
      { header: "Name", className: "col-name", cell: (i) => ({ path: at(i, "name"), name: "name", control: textControl(ctx, at(i, "name"), "name", { maxLength: 60 }) }) },
      { header: "Acts as", className: "col-choice", cell: (i) => ({ path: at(i, "actsAs"), name: "acts as", control: selectControl(ctx, at(i, "actsAs"), "acts as", actsAs, { whenAbsent: "live" }) }) },
      {
        header: "Duration",
        className: "col-choice",
        cell: (i) => ({
          path: at(i, "duration"),
          name: "duration",
          control: selectControl(ctx, at(i, "duration"), "duration", [{ value: "", label: "as it acts" }, ...durations.map((d) => ({ value: d, label: d }))], {
            whenAbsent: "",
            onChosen: (v) => state.set(at(i, "duration"), v || undefined),
          }),
        }),
      },
      { header: "ψ0", className: "col-num", cell: (i) => ({ path: at(i, "psi0"), name: "ψ0", control: numberControl(ctx, at(i, "psi0"), "ψ0", { placeholder: "as it acts" }) }) },
    ],
    actions: (i) => [rowButton("×", `Remove ${name(i)}`, () => (state.remove("beam.categories", i), ctx.rerender()), "remove")],
  });
  const box = el("div", { className: "categories" }, [
    count ? table : null,
    issues,
    addButton("Add a load category of your own", () => {
      const i = state.insert("beam.categories", { id: uniqueId(state.list("beam.categories"), "storage"), name: "", actsAs: "live" });
      ctx.rerender(at(i, "id"));
    }),
  ]);
  ctx.registry.register({ path: "beam.categories", label: "Own load categories", marker: box, host: issues });
  return box;
}

/** Check boxes that choose some of the categories for a list field (patterned categories, live deflection categories). */
export function categoryChecks(ctx: FormContext, path: string, label: string, whenAbsent: string[]): HTMLElement {
  const { state } = ctx;
  const chosen = () => {
    const value = state.read(path);
    return Array.isArray(value) ? value.map(String) : whenAbsent;
  };
  const issues = el("div", { className: "row-issues" });
  const boxes = categoryIds(ctx).map((id) => {
    const box = el("input", { attrs: { type: "checkbox", "aria-label": `${label}: ${id}` } });
    box.checked = chosen().includes(id);
    box.addEventListener("change", () => {
      const now = chosen().filter((c) => c !== id);
      state.set(path, box.checked ? [...now, id] : now);
    });
    return el("label", { className: "held-choice" }, [box, el("span", { text: id.replace("-", " ") })]);
  });
  const field = el("div", { className: "field wide category-checks" }, [el("span", { className: "label", text: label }), el("div", { className: "held-choices" }, boxes), issues]);
  ctx.registry.register({ path, label, marker: field, host: issues });
  return field;
}
