import type { FormContext } from "./controls.js";

/** An id not yet used in the list: the wanted one, or it with a number after it. */
export function uniqueId(list: unknown[], wanted: string): string {
  const used = new Set(list.map((item) => String((item as Record<string, unknown>)?.id ?? "")));
  const stem = wanted.replace(/-?\d+$/, "") || "id";
  if (!used.has(wanted)) return wanted;
  for (let n = 2; ; n++) if (!used.has(`${stem}${n}`)) return `${stem}${n}`;
}

/**
 * When an id is renamed (on leaving the field), items that referred to the old id follow it,
 * unless the new id already belongs to another item of the list.
 */
export function renameReferences(ctx: FormContext, input: HTMLInputElement, listPath: string, rename: (oldId: string, newId: string) => void): void {
  let before = input.value;
  input.addEventListener("focus", () => (before = input.value));
  input.addEventListener("change", () => {
    const after = input.value;
    const owners = ctx.state.list(listPath).filter((item) => (item as Record<string, unknown>)?.id === after).length;
    if (before && after && before !== after && owners === 1) rename(before, after);
    before = after;
    refresh(ctx);
  });
}

const refresh = (ctx: FormContext) => {
  for (const fill of ctx.references) fill();
};
