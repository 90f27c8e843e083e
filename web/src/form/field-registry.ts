import { plainMessage } from "./issue-words.js";
import type { JobIssue } from "../../../core/schema/job-issues.js";
import { el, nextId } from "../dom.js";
import { parentPath } from "../job-path.js";

/** A place in the form that answers for one path of the job document. */
export interface FieldEntry {
  path: string;
  /** What a person calls it, e.g. "Part 2 · h". */
  label: string;
  /** The control to focus and mark invalid, when the path is one field. */
  control?: HTMLElement;
  /** Marked red: the field, the table row or the step. */
  marker: HTMLElement;
  /** Where the message goes: beside the field, or under a table row or table. */
  host: HTMLElement;
  /** Put before the message when the host is not right at the field, e.g. "h" or "Part 2". */
  prefix?: string;
  /** A number field: text that is not a number is reported here before the service sees it. */
  numeric?: boolean;
}

export interface PlacedIssue extends JobIssue {
  /** Label of the field it was shown at; undefined when no field answers for the path. */
  fieldLabel: string | undefined;
}

const NUMBER_TEXT = /^[-+]?(\d+(\.\d*)?|\.\d+)([eE][-+]?\d+)?$/;

/** A typed number, or the text as typed when it is not one (kept so nothing is lost), or undefined when empty. */
export function numberFromText(text: string): number | string | undefined {
  const t = text.trim().replace(/^\u2212/, "-");
  if (t === "") return undefined;
  return NUMBER_TEXT.test(t) ? Number(t) : text;
}

/** Maps issue paths to the form's fields and shows each message beside its field. */
export class FieldRegistry {
  readonly #entries = new Map<string, FieldEntry>();
  #shown: (() => void)[] = [];

  register(entry: FieldEntry): void {
    this.#entries.set(entry.path, entry);
  }

  clearEntries(): void {
    this.clearIssues();
    this.#entries.clear();
  }

  /** Forgets the fields of a part of the form that was drawn again and is gone from the page. */
  forgetDetached(): void {
    for (const [path, entry] of this.#entries) if (!entry.marker.isConnected) this.#entries.delete(path);
  }

  /** The entry for a path, or for the nearest enclosing path that has one. */
  find(path: string): FieldEntry | undefined {
    for (let p = path; ; p = parentPath(p)) {
      const entry = this.#entries.get(p);
      if (entry) return entry;
      if (p === "") return undefined;
    }
  }

  /** Number fields whose text is not a number: reported at once, in words the service cannot know. */
  localIssues(read: (path: string) => unknown): JobIssue[] {
    const issues: JobIssue[] = [];
    for (const entry of this.#entries.values()) {
      const value = read(entry.path);
      if (!entry.numeric) continue;
      if (typeof value === "string") issues.push({ path: entry.path, message: `"${value}" is not a number; write it like 4.8 or 1200` });
      if (value === null) issues.push({ path: entry.path, message: "is required" });
    }
    return issues;
  }

  clearIssues(): void {
    for (const undo of this.#shown.reverse()) undo();
    this.#shown = [];
  }

  show(issues: JobIssue[]): PlacedIssue[] {
    this.clearIssues();
    return issues.map((issue) => {
      const entry = this.find(issue.path);
      if (!entry) return { ...issue, fieldLabel: undefined };
      const note = el("p", { className: "field-issue", text: entry.prefix ? `${entry.prefix}: ${plainMessage(issue.message)}` : plainMessage(issue.message), attrs: { id: nextId("issue") } });
      entry.host.append(note);
      entry.marker.classList.add("has-issue");
      // A problem inside a closed fold must be seen: open it.
      const folded = entry.marker.closest("details");
      if (folded) folded.open = true;
      const control = entry.control;
      const describedBy = control?.getAttribute("aria-describedby");
      if (control) {
        control.setAttribute("aria-invalid", "true");
        control.setAttribute("aria-describedby", [describedBy, note.id].filter(Boolean).join(" "));
      }
      this.#shown.push(() => {
        note.remove();
        entry.marker.classList.remove("has-issue");
        if (control) {
          control.removeAttribute("aria-invalid");
          if (describedBy) control.setAttribute("aria-describedby", describedBy);
          else control.removeAttribute("aria-describedby");
        }
      });
      return { ...issue, fieldLabel: entry.label };
    });
  }

  /** Brings a field into view and focuses it (or the first control inside the row or step). */
  focus(path: string): void {
    const entry = this.find(path);
    if (!entry) return;
    const target = entry.control ?? entry.marker.querySelector<HTMLElement>("input, select, button");
    entry.marker.scrollIntoView({ block: "center", behavior: "smooth" });
    target?.focus({ preventScroll: true });
  }
}
