import { fetchExample, type ExampleEntry } from "./api.js";
import type { DesignSession } from "./design-session.js";
import { openBuildUpDialog } from "./build-up-dialog.js";
import { el } from "./dom.js";
import { emptyJob } from "./empty-job.js";
import { downloadCsv, downloadWorksheet } from "./exports.js";
import { jobFileName, saveBlob } from "./file-transfer.js";
import type { JobSchema } from "./job-schema.js";
import { openableJob, type JobDraft } from "./job-state.js";
import { menu, menuItem } from "./menu.js";
import type { StoreLinkState } from "./store/store-link.js";
import { storeSaveControls } from "./store/store-save.js";
import { unitsSwitch } from "./units-switch.js";

export type Tone = "info" | "problem" | "caution";
export type Say = (text: string, tone?: Tone, action?: HTMLElement) => void;

export interface ToolbarOptions {
  session: DesignSession;
  schema: JobSchema;
  examples: ExampleEntry[];
  link: StoreLinkState;
  /** Whether the server keeps a job store (it may run without one). */
  storeAvailable: boolean;
  showView: (view: "member" | "store") => void;
}

/** The bar over the page: the job's files and examples, its units, what it exports, and its place in the job store. */
export function toolbar(options: ToolbarOptions): { element: HTMLElement; say: Say; setView: (view: "member" | "store") => void } {
  const { session, schema, examples, link } = options;
  const message = el("p", { className: "toolbar-message", attrs: { role: "status", "aria-live": "polite" } });
  const say: Say = (text, tone = "info", action) => {
    message.className = `toolbar-message ${tone}`;
    message.replaceChildren(text, ...(action ? [" ", action] : []));
  };

  /** Another job in the form, with a way back to the one it replaced. */
  const replaceWith = (job: JobDraft, said: string) => {
    const previous = structuredClone(session.state.job);
    const previousLink = link.link;
    session.replaceJob(job);
    link.set(null);
    const putBack = el("button", {
      className: "link-button",
      text: "Put back the job I had",
      attrs: { type: "button" },
      on: {
        click: () => {
          session.replaceJob(previous);
          link.set(previousLink);
          say("Your previous job is back.");
        },
      },
    });
    say(said, "info", putBack);
  };

  const openExample = async (entry: ExampleEntry) => {
    try {
      const opened = openableJob(await fetchExample(entry.id));
      if (!opened.ok) return say(`The example could not be opened: ${opened.problems.join("; ")}.`, "problem");
      replaceWith(opened.job, `Opened the example “${entry.title}”.`);
    } catch (error) {
      say(`The example could not be loaded: ${(error as Error).message}`, "problem");
    }
  };

  const fileInput = el("input", { className: "visually-hidden", attrs: { type: "file", accept: ".json,application/json", id: "job-file", tabindex: -1, "aria-label": "Job file to open" } });
  fileInput.addEventListener("change", async () => {
    const file = fileInput.files?.[0];
    fileInput.value = "";
    if (!file) return;
    let parsed: unknown;
    try {
      parsed = JSON.parse(await file.text());
    } catch {
      return say(`“${file.name}” is not valid JSON; your current job is unchanged.`, "problem");
    }
    const opened = openableJob(parsed);
    if (!opened.ok) return say(`“${file.name}” cannot be opened: ${opened.problems.join("; ")}. Your current job is unchanged.`, "problem");
    replaceWith(opened.job, `Opened “${file.name}”. Checking it now; any problems are marked at their fields.`);
  });

  const saveJob = () => {
    const job = session.state.job;
    saveBlob(new Blob([`${JSON.stringify(job, null, 2)}\n`], { type: "application/json" }), jobFileName(job));
    say(`Saved ${jobFileName(job)} (a stitchplan job file, format version ${String(job.version ?? 1)}).`);
  };

  const fileMenu = menu("File", [
    menuItem("New member (empty form)", () => replaceWith(emptyJob(session.state.units), "Started an empty member. Enter materials, parts, a connector, a span and loads; results appear as soon as the input is complete."), {
      hint: "in the units now chosen",
    }),
    menuItem(
      "New member from a typical build-up…",
      () => openBuildUpDialog(session.state.units, (job, buildUp) => replaceWith(job, `Filled the form for a ${buildUp.name.toLowerCase()} from its sizes, with common grades, a common connector and a dead and a live load. Every value is editable below.`)),
      { hint: "box beam, I, laminations, plies, plate girder, cover plate" },
    ),
    menuItem("Open job file…", () => fileInput.click()),
    menuItem("Save job file", saveJob, { hint: "the job document as JSON" }),
  ]);
  const examplesMenu = menu(
    "Examples",
    examples.length
      ? examples.map((e) => menuItem(e.title, () => void openExample(e), { hint: e.units === "us" ? "US customary" : "SI" }))
      : [el("p", { className: "menu-note", text: "No examples are available." })],
    "examples-menu",
  );
  const exportMenu = menu("Export", [
    menuItem("Worksheet (PDF)", () => void downloadWorksheet(session, say), { hint: "for the engineer of record" }),
    menuItem("Schedule (CSV)", () => downloadCsv(session, "schedule", say), { hint: "one row per zone per joint" }),
    menuItem("Connector positions (CSV)", () => downloadCsv(session, "positions", say), { hint: "joint, row, x" }),
    menuItem("Welds (CSV)", () => downloadCsv(session, "welds", say), { hint: "zones of fillet weld per joint" }),
  ]);

  const viewButton = el("button", { className: "view-switch", text: "Projects and revisions", attrs: { type: "button", "aria-pressed": "false" } });
  viewButton.addEventListener("click", () => {
    const toStore = viewButton.getAttribute("aria-pressed") !== "true";
    options.showView(toStore ? "store" : "member");
  });
  const setView = (view: "member" | "store") => {
    viewButton.setAttribute("aria-pressed", view === "store" ? "true" : "false");
    viewButton.textContent = view === "store" ? "Back to the member" : "Projects and revisions";
  };

  const element = el("div", { className: "toolbar" }, [
    el("div", { className: "toolbar-group" }, [fileInput, fileMenu, examplesMenu]),
    unitsSwitch(session, schema, say),
    el("div", { className: "toolbar-group" }, [exportMenu]),
    options.storeAvailable ? el("div", { className: "toolbar-group store-group" }, [storeSaveControls(session, link, say, () => options.showView("store")), viewButton]) : null,
    message,
  ]);
  return { element, say, setView };
}
