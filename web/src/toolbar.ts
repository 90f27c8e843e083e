import { fetchExample, requestWorksheet, type ExampleEntry } from "./api.js";
import type { DesignSession } from "./design-session.js";
import { el } from "./dom.js";
import { jobFileName, saveBlob } from "./file-transfer.js";
import { openableJob, type JobDraft } from "./job-state.js";

/** Start from an example, open and save job files, and download the worksheet. */
export function toolbar(session: DesignSession, examples: ExampleEntry[], shownExample?: string): HTMLElement {
  const message = el("p", { className: "toolbar-message", attrs: { role: "status", "aria-live": "polite" } });
  const say = (text: string, tone: "info" | "problem" = "info", action?: HTMLElement) => {
    message.className = `toolbar-message ${tone}`;
    message.replaceChildren(text, ...(action ? [" ", action] : []));
  };

  const exampleSelect = el(
    "select",
    { attrs: { id: "example-choice", "aria-label": "Example job" } },
    examples.map((e) => el("option", { text: `${e.title} (${e.units.toUpperCase()})`, attrs: { value: e.id } })),
  );
  if (shownExample) exampleSelect.value = shownExample;
  const startFromExample = async () => {
    const id = exampleSelect.value;
    const previous = structuredClone(session.state.job);
    try {
      const opened = openableJob(await fetchExample(id));
      if (!opened.ok) return say(`The example could not be opened: ${opened.problems.join("; ")}.`, "problem");
      session.replaceJob(opened.job);
      const putBack = el("button", {
        className: "link-button",
        text: "Put back the job I had",
        attrs: { type: "button" },
        on: {
          click: () => {
            session.replaceJob(previous);
            say("Your previous job is back.");
          },
        },
      });
      say(`Started from the example “${exampleSelect.selectedOptions[0]?.textContent ?? id}”.`, "info", putBack);
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
    session.replaceJob(opened.job as JobDraft);
    say(`Opened “${file.name}”. Checking it now; any problems are marked at their fields.`);
  });

  const saveJob = () => {
    const job = session.state.job;
    saveBlob(new Blob([`${JSON.stringify(job, null, 2)}\n`], { type: "application/json" }), jobFileName(job));
    say(`Saved ${jobFileName(job)}.`);
  };

  const worksheetButton = el("button", { className: "primary", text: "Download worksheet (PDF)", attrs: { type: "button" } });
  worksheetButton.addEventListener("click", async () => {
    worksheetButton.disabled = true;
    say("Preparing the worksheet…");
    try {
      const answer = await requestWorksheet(session.state.job);
      if (answer.kind === "pdf") {
        saveBlob(answer.blob, answer.fileName);
        say(`Worksheet ${answer.fileName} downloaded. It is for review by the engineer of record before any use.`);
      } else {
        if (answer.issues.length) session.showIssues(answer.issues);
        say(answer.issues.length ? "No worksheet: the input has problems, marked at their fields. Fix them and try again." : `No worksheet: ${answer.message}`, "problem");
      }
    } finally {
      worksheetButton.disabled = false;
    }
  });

  return el("div", { className: "toolbar" }, [
    el("div", { className: "toolbar-group" }, [
      el("label", { text: "Example", attrs: { for: "example-choice" } }),
      exampleSelect,
      el("button", { text: "Start from example", attrs: { type: "button", disabled: examples.length === 0 }, on: { click: () => void startFromExample() } }),
    ]),
    el("div", { className: "toolbar-group" }, [
      fileInput,
      el("button", { text: "Open job file…", attrs: { type: "button" }, on: { click: () => fileInput.click() } }),
      el("button", { text: "Save job file", attrs: { type: "button" }, on: { click: saveJob } }),
      worksheetButton,
    ]),
    message,
  ]);
}
