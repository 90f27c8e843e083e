import { convertNumber } from "../../core/units/convert-number.js";
import type { UnitSystem } from "../../core/units/quantity.js";
import { requestConversion } from "./api.js";
import type { DesignSession } from "./design-session.js";
import { el } from "./dom.js";
import type { JobSchema } from "./job-schema.js";
import type { JobDraft } from "./job-state.js";

type Say = (text: string, tone?: "info" | "problem" | "caution") => void;

const names: Record<UnitSystem, string> = { si: "SI", us: "US customary" };

/**
 * The job rewritten in the other unit system on the page, for a draft the service cannot convert yet
 * (it must validate first): every number whose schema field has a quantity kind is converted; text
 * typed into a number field is left as it is, to be fixed where it stands.
 */
export function convertDraft(job: JobDraft, schema: JobSchema, to: UnitSystem): JobDraft {
  const from: UnitSystem = job.units === "us" ? "us" : "si";
  const out = structuredClone(job);
  for (const { path, quantity } of schema.quantities(job)) {
    let node: unknown = out;
    for (const key of path.slice(0, -1)) node = (node as Record<string | number, unknown>)[key];
    const last = path[path.length - 1]!;
    const holder = node as Record<string | number, unknown>;
    holder[last] = convertNumber(holder[last] as number, quantity, from, to);
  }
  // As the service does: the spacing practice stays that of the system the job came from.
  const spacing = (out.spacing ?? {}) as Record<string, unknown>;
  const practice = spacing.practice === "si" || spacing.practice === "us" ? spacing.practice : from;
  if (practice === to) delete spacing.practice;
  else out.spacing = { ...spacing, practice };
  out.units = to;
  return out;
}

/** SI or US customary for the whole job: every value converts and every unit label follows; results are computed again. */
export function unitsSwitch(session: DesignSession, schema: JobSchema, say: Say): HTMLElement {
  const buttons = (["si", "us"] as const).map((system) =>
    el("button", {
      className: "units-option",
      text: system === "si" ? "SI" : "US",
      attrs: { type: "button", "aria-pressed": session.state.units === system ? "true" : "false", title: `Work in ${names[system]} units` },
      on: { click: () => void switchTo(system) },
    }),
  );
  const show = () => buttons.forEach((b, i) => b.setAttribute("aria-pressed", session.state.units === (i === 0 ? "si" : "us") ? "true" : "false"));
  session.state.onChange(show);

  async function switchTo(to: UnitSystem): Promise<void> {
    const job = session.state.job;
    if (session.state.units === to) return;
    const previous = structuredClone(job);
    const answer = await requestConversion(job, to);
    if (answer.kind === "converted") {
      session.replaceJob(answer.job, { keepResults: true });
      say(`The whole job is now in ${names[to]} units: every value was converted (switching back gives the values entered; the spacing module and zone practice stay as they were) and the results are computed again.`);
      return;
    }
    if (answer.kind === "unreachable") return say(`${answer.message} The units were not changed.`, "problem");
    // The service converts valid jobs only: convert the draft here, from the quantity kinds in the schema.
    if (!schema.known) return say("The units could not be changed: the job has problems and the service's schema is not available. Fix the marked fields first.", "problem");
    session.replaceJob(convertDraft(previous, schema, to), { keepResults: true });
    say(`Converted to ${names[to]} on this page (the job has problems, so the service could not convert it); numbers were converted from their kinds, and text in a number field is left as typed.`, "caution");
  }

  return el("div", { className: "units-switch", attrs: { role: "group", "aria-label": "Units of the whole job" } }, [el("span", { className: "units-caption", text: "Units" }), ...buttons]);
}
