import type { FormContext } from "./controls.js";
import { field, textControl } from "./controls.js";
import { fieldGrid, step } from "./step.js";

export function projectStep(ctx: FormContext, number: number): HTMLElement {
  const text = (path: string, label: string, maxLength: number, wide = false) => field(ctx, path, label, textControl(ctx, path, label, { maxLength }), { wide });
  return step(number, "Project and member", null, [
    fieldGrid([
      text("project.name", "Project name", 120, true),
      text("project.number", "Project number", 40),
      text("project.client", "Client", 120, true),
      text("project.engineer", "Engineer", 80),
    ]),
    fieldGrid([
      text("member.mark", "Member mark", 40),
      text("member.revision", "Revision", 12),
      field(ctx, "member.date", "Date", textControl(ctx, "member.date", "Date", { type: "date", removeWhenEmpty: true })),
      text("member.description", "Description", 200, true),
    ]),
  ]);
}
