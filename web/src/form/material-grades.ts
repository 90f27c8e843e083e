import { fetchGrades, type GradeEntry } from "../api.js";
import { el } from "../dom.js";
import type { FormContext } from "./controls.js";

const cache = new Map<string, Promise<GradeEntry[]>>();

function gradesFor(units: string, basis: string): Promise<GradeEntry[]> {
  const key = `${units}/${basis}`;
  let answer = cache.get(key);
  if (!answer) {
    answer = fetchGrades(units, basis);
    cache.set(key, answer);
    answer.catch(() => cache.delete(key));
  }
  return answer;
}

/**
 * "Fill from grade": copies a common grade from the service's library into the material row, in the
 * job's units and on its basis, keeping the row's id. Every value stays editable; the source says
 * where the values come from and what the library leaves for the user to enter.
 */
export function gradeChooser(ctx: FormContext, i: number, owner: string): HTMLElement {
  const { state } = ctx;
  const select = el("select", { className: "grade-choice", attrs: { "aria-label": `${owner}: fill from a common grade` } }, [el("option", { text: "Fill from a common grade…", attrs: { value: "" } })]);
  const units = state.units;
  const basis = state.read("basis") === "factored" ? "factored" : "allowable";
  let grades: GradeEntry[] = [];
  gradesFor(units, basis)
    .then((list) => {
      grades = list;
      const families = [...new Set(list.map((g) => g.family))];
      select.append(...families.map((family) => el("optgroup", { attrs: { label: family.replace(/-/g, " ") } }, list.filter((g) => g.family === family).map((g) => el("option", { text: g.name, attrs: { value: g.grade } })))));
    })
    .catch(() => {
      select.disabled = true;
      select.title = "The grade library could not be loaded.";
    });
  select.addEventListener("change", () => {
    const grade = grades.find((g) => g.grade === select.value);
    if (!grade) return;
    const path = `materials[${i}]`;
    const current = (state.read(path) ?? {}) as Record<string, unknown>;
    state.replaceItem(path, { ...structuredClone(grade.material), id: current.id ?? grade.grade });
    ctx.rerender(`${path}.E`);
  });
  return el("label", { className: "grade-chooser" }, [el("span", { className: "visually-hidden", text: "Grade library" }), select]);
}
