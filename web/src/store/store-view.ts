import { pathInWords, plainMessage } from "../form/issue-words.js";
import { formatRatio } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { saveBlob } from "../file-transfer.js";
import type { JobSchema } from "../job-schema.js";
import type { JobDraft } from "../job-state.js";
import { comparisonView } from "./compare-view.js";
import { fingerprintLookUp } from "./fingerprint-view.js";
import {
  compareRevisions,
  createProject,
  exportProject,
  getRevision,
  importProject,
  issueWorksheet,
  listMembers,
  listProjects,
  listRevisions,
  type Member,
  type Project,
  type RevisionListItem,
  type StoreProblem,
} from "./store-api.js";
import type { StoreLink, StoreLinkState } from "./store-link.js";

export const when = (iso: string) => {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const two = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${two(d.getMonth() + 1)}-${two(d.getDate())} ${two(d.getHours())}:${two(d.getMinutes())}`;
};

const verdict = (summary: RevisionListItem["summary"]) =>
  summary
    ? el("span", { className: `verdict ${summary.passes ? "passes" : "fails"}`, text: summary.passes ? "passes" : "fails" })
    : el("span", { className: "verdict unknown", text: "not designed" });

export interface StoreViewOptions {
  schema: JobSchema;
  link: StoreLinkState;
  /** Opens a saved revision in the form. */
  open: (job: JobDraft, link: StoreLink) => void;
}

/**
 * The job store on the page: projects and their members, every revision of a member (open one,
 * compare two, issue a worksheet from one), and the look-up of a fingerprint printed on a sheet.
 */
export class StoreView {
  readonly element: HTMLElement;
  readonly #message = el("p", { className: "store-message", attrs: { role: "status", "aria-live": "polite" } });
  readonly #projects = el("div", { className: "project-list" });
  readonly #members = el("section", { className: "store-panel members-panel", attrs: { "aria-labelledby": "members-title" } });
  readonly #revisions = el("section", { className: "store-panel revisions-panel", attrs: { "aria-labelledby": "revisions-title" } });
  readonly #comparison = el("div", { className: "comparison-slot" });
  #project: Project | null = null;
  #projectList: Project[] = [];
  #member: Member | null = null;

  constructor(private readonly options: StoreViewOptions) {
    const fileInput = el("input", { className: "visually-hidden", attrs: { type: "file", accept: ".json,application/json", tabindex: -1, "aria-label": "Project file to import" } });
    fileInput.addEventListener("change", () => void this.#import(fileInput));
    this.element = el("section", { className: "store-view", attrs: { id: "store-view", "aria-label": "Projects and revisions" } }, [
      el("div", { className: "store-head" }, [
        el("h2", { text: "Projects and revisions" }),
        el("p", { className: "hint", text: "Every save of a member is a new revision; nothing saved is ever overwritten. Issued worksheets are logged with the fingerprint printed on them." }),
        this.#message,
      ]),
      el("div", { className: "store-grid" }, [
        el("div", { className: "store-side" }, [
          el("section", { className: "store-panel projects-panel", attrs: { "aria-labelledby": "projects-title" } }, [
            el("h3", { text: "Projects", attrs: { id: "projects-title" } }),
            this.#projects,
            this.#newProjectForm(),
            fileInput,
            el("button", { className: "link-button", text: "Import a project file…", attrs: { type: "button" }, on: { click: () => fileInput.click() } }),
          ]),
          fingerprintLookUp({ say: (t, tone) => this.#say(t, tone), open: (p, m, n) => void this.#openRevision(p, m, n) }),
        ]),
        el("div", { className: "store-main" }, [this.#members, this.#revisions, this.#comparison]),
      ]),
    ]);
  }

  #say(text: string, tone: "info" | "problem" | "caution" = "info", action?: HTMLElement): void {
    this.#message.className = `store-message ${tone}`;
    this.#message.replaceChildren(text, ...(action ? [" ", action] : []));
  }

  #problem(what: string, problem: StoreProblem): void {
    const where = problem.issues.slice(0, 5).map((i) => `${pathInWords(i.path)}: ${plainMessage(i.message)}`).join("; ");
    this.#say(`${what}: ${problem.message}${where ? ` (${where}${problem.issues.length > 5 ? "; …" : ""})` : ""}`, "problem");
  }

  /** Shown again: the lists are read afresh, and the member being edited is selected. */
  async show(): Promise<void> {
    const link = this.options.link.link;
    await this.#loadProjects(link?.projectId ?? this.#project?.id);
    if (link && this.#project?.id === link.projectId) await this.#selectMember(link.memberId);
  }

  async #loadProjects(select?: number): Promise<void> {
    const answer = await listProjects();
    if (!answer.ok) return this.#problem("The projects could not be listed", answer.problem);
    this.#projectList = answer.value;
    const chosen = this.#projectList.find((p) => p.id === (select ?? this.#project?.id));
    if (chosen) return this.#selectProject(chosen);
    this.#project = null;
    this.#drawProjects();
    this.#drawMembers([]);
  }

  #drawProjects(): void {
    const projects = this.#projectList;
    this.#projects.replaceChildren(
      projects.length
        ? el(
            "ul",
            {},
            projects.map((p) =>
              el("li", {}, [
                el(
                  "button",
                  { className: "project-button", attrs: { type: "button", "aria-pressed": p.id === this.#project?.id ? "true" : "false" }, on: { click: () => void this.#selectProject(p) } },
                  [el("strong", { text: p.name }), el("span", { className: "sub", text: `${p.number ? `${p.number} · ` : ""}${p.members} member${p.members === 1 ? "" : "s"}${p.updatedAt ? ` · ${when(p.updatedAt)}` : ""}${p.importedAt ? ` · imported ${when(p.importedAt)}` : ""}` })],
                ),
              ]),
            ),
          )
        : el("p", { className: "hint", text: "No projects yet. Make one here, or save the member you are editing with “Save to project”." }),
    );
  }

  #newProjectForm(): HTMLElement {
    const name = el("input", { attrs: { type: "text", id: "new-project-name", maxlength: 120, autocomplete: "off", required: true } });
    const number = el("input", { attrs: { type: "text", id: "new-project-number", maxlength: 40, autocomplete: "off" } });
    const client = el("input", { attrs: { type: "text", id: "new-project-client", maxlength: 120, autocomplete: "off" } });
    const form = el("form", { className: "new-project" }, [
      el("h4", { text: "New project" }),
      el("label", { text: "Name", attrs: { for: "new-project-name" } }),
      name,
      el("label", { text: "Number", attrs: { for: "new-project-number" } }),
      number,
      el("label", { text: "Client", attrs: { for: "new-project-client" } }),
      client,
      el("button", { text: "Make project", attrs: { type: "submit" } }),
    ]);
    form.addEventListener("submit", async (event) => {
      event.preventDefault();
      if (!name.value.trim()) return this.#say("Give the project a name.", "problem");
      const answer = await createProject({ name: name.value, number: number.value, client: client.value });
      if (!answer.ok) return this.#problem("The project could not be made", answer.problem);
      name.value = number.value = client.value = "";
      this.#say(`Made the project “${answer.value.name}”.`);
      await this.#loadProjects(answer.value.id);
    });
    return form;
  }

  async #selectProject(project: Project): Promise<void> {
    this.#project = project;
    this.#member = null;
    this.#drawProjects();
    const answer = await listMembers(project.id);
    if (!answer.ok) return this.#problem("The members could not be listed", answer.problem);
    this.#drawMembers(answer.value);
    this.#revisions.replaceChildren();
    this.#comparison.replaceChildren();
  }

  #drawMembers(members: Member[]): void {
    const project = this.#project;
    if (!project) {
      this.#members.replaceChildren(el("h3", { text: "Members", attrs: { id: "members-title" } }), el("p", { className: "hint", text: "Choose a project." }));
      return;
    }
    const rows = members.map((m) =>
      el("tr", { className: m.id === this.#member?.id ? "selected" : "" }, [
        el("td", {}, [el("button", { className: "link-button member-open", text: m.mark, attrs: { type: "button", "aria-label": `Revisions of ${m.mark}` }, on: { click: () => void this.#selectMember(m.id) } }), el("span", { className: "sub", text: m.description })]),
        el("td", { className: "num", text: String(m.revisions) }),
        el("td", {}, [verdict(m.latest.summary), el("span", { className: "sub", text: m.latest.summary?.governing ? `${m.latest.summary.governing.item} ${formatRatio(m.latest.summary.governing.utilisation)}` : "" })]),
        el("td", { text: m.lastIssue ? `#${m.lastIssue.id}, rev ${m.lastIssue.revision}, ${when(m.lastIssue.issuedAt)}` : "—" }),
      ]),
    );
    this.#members.replaceChildren(
      el("div", { className: "panel-head" }, [
        el("h3", { text: `Members of ${project.name}`, attrs: { id: "members-title" } }),
        el("button", { className: "link-button", text: "Export the project file", attrs: { type: "button" }, on: { click: () => void this.#export(project) } }),
      ]),
      members.length
        ? el("div", { className: "table-scroll" }, [
            el("table", { className: "results-table members" }, [
              el("caption", { className: "visually-hidden", text: `Members of ${project.name}` }),
              el("thead", {}, [el("tr", {}, ["Member", "Revisions", "Latest", "Last worksheet"].map((h) => el("th", { text: h, attrs: { scope: "col" } })))]),
              el("tbody", {}, rows),
            ]),
          ])
        : el("p", { className: "hint", text: "No members yet: open a member in the form and use “Save to project”." }),
    );
  }

  async #selectMember(memberId: number): Promise<void> {
    const project = this.#project;
    if (!project) return;
    const members = await listMembers(project.id);
    if (!members.ok) return this.#problem("The members could not be listed", members.problem);
    this.#member = members.value.find((m) => m.id === memberId) ?? null;
    this.#drawMembers(members.value);
    this.#comparison.replaceChildren();
    if (!this.#member) return;
    const answer = await listRevisions(project.id, memberId);
    if (!answer.ok) return this.#problem("The revisions could not be listed", answer.problem);
    this.#drawRevisions(this.#member, answer.value);
  }

  #drawRevisions(member: Member, revisions: RevisionListItem[]): void {
    const project = this.#project!;
    const link = this.options.link.link;
    const newest = [...revisions].sort((a, b) => b.revision - a.revision);
    const picked = new Set(newest.slice(0, 2).map((r) => r.revision));
    const compareButton = el("button", { text: "Compare the two ticked", attrs: { type: "button" } });
    const refresh = () => (compareButton.disabled = picked.size !== 2);
    const rows = newest.map((r) => {
      const tick = el("input", { attrs: { type: "checkbox", "aria-label": `Compare revision ${r.revision}` } });
      tick.checked = picked.has(r.revision);
      tick.addEventListener("change", () => {
        if (tick.checked) picked.add(r.revision);
        else picked.delete(r.revision);
        refresh();
      });
      const editing = link && link.memberId === member.id && link.projectId === project.id && link.revision === r.revision;
      return el("tr", { className: editing ? "selected" : "", attrs: { "data-revision": String(r.revision) } }, [
        el("td", {}, [tick]),
        el("td", { className: "num" }, [el("strong", { text: String(r.revision) }), editing ? el("span", { className: "sub", text: "in the form" }) : null]),
        el("td", {}, [when(r.savedAt), el("span", { className: "sub", text: r.basedOn ? `edited from ${r.basedOn}` : "" })]),
        el("td", { text: r.note || "—" }),
        el("td", {}, [verdict(r.summary), el("span", { className: "sub", text: r.summary ? `${r.summary.connectors} connectors` : "" })]),
        el("td", { className: "fingerprint-cell", text: r.fingerprint.slice(0, 12), attrs: { title: r.fingerprint } }),
        el("td", {}, r.issues.length ? r.issues.map((i) => el("span", { className: "sub", text: `#${i.id} ${when(i.issuedAt)}` })) : ["—"]),
        el("td", { className: "actions" }, [
          el("button", { className: "row-button", text: "Open", attrs: { type: "button", "aria-label": `Open revision ${r.revision}` }, on: { click: () => void this.#openRevision(project.id, member.id, r.revision) } }),
          el("button", { className: "row-button", text: "Issue worksheet", attrs: { type: "button", "aria-label": `Issue the worksheet of revision ${r.revision}` }, on: { click: () => void this.#issue(member, r.revision, r.summary) } }),
        ]),
      ]);
    });
    compareButton.addEventListener("click", () => {
      const [a, b] = [...picked].sort((x, y) => x - y);
      if (a !== undefined && b !== undefined) void this.#compare(member, a, b);
    });
    refresh();
    this.#revisions.replaceChildren(
      el("h3", { text: `${member.mark}: ${revisions.length} revision${revisions.length === 1 ? "" : "s"}`, attrs: { id: "revisions-title" } }),
      el("div", { className: "table-scroll" }, [
        el("table", { className: "results-table revisions" }, [
          el("caption", { className: "visually-hidden", text: `Revisions of ${member.mark}` }),
          el("thead", {}, [el("tr", {}, ["Compare", "Rev.", "Saved", "Note", "Result", "Fingerprint", "Worksheets", ""].map((h) => el("th", { text: h, attrs: { scope: "col" } })))]),
          el("tbody", {}, rows),
        ]),
      ]),
      revisions.length > 1 ? el("div", { className: "button-row" }, [compareButton]) : "",
    );
  }

  async #openRevision(projectId: number, memberId: number, revision: number): Promise<void> {
    const answer = await getRevision(projectId, memberId, revision);
    if (!answer.ok) return this.#problem(`Revision ${revision} could not be opened`, answer.problem);
    const projects = await listProjects();
    const projectName = (projects.ok ? projects.value.find((p) => p.id === projectId)?.name : undefined) ?? this.#project?.name ?? "";
    const job = answer.value.job as unknown as JobDraft;
    this.options.open(job, { projectId, projectName, memberId, mark: String((job.member as Record<string, unknown>)?.mark ?? ""), revision: answer.value.revision });
  }

  async #issue(member: Member, revision: number, summary?: RevisionListItem["summary"], confirmed = false): Promise<void> {
    const project = this.#project!;
    if (summary && !summary.passes && !confirmed) {
      // A worksheet of a member that fails is issued only on purpose.
      const anyway = el("button", { className: "link-button", text: `Issue revision ${revision}'s worksheet anyway`, attrs: { type: "button" }, on: { click: () => void this.#issue(member, revision, summary, true) } });
      const governing = summary.governing ? ` (${summary.governing.item}, utilisation ${formatRatio(summary.governing.utilisation)})` : "";
      return this.#say(`Revision ${revision} of ${member.mark} does not pass${governing}. Its worksheet would be logged as issued; nothing was issued yet.`, "caution", anyway);
    }
    this.#say(`Issuing the worksheet of revision ${revision}…`);
    const answer = await issueWorksheet(project.id, member.id, revision);
    if (!answer.ok) return this.#problem("No worksheet", answer.problem);
    const issued = answer.value;
    saveBlob(issued.blob, issued.fileName);
    this.#say(`Issued worksheet #${issued.issue} of revision ${issued.revision} (${issued.fileName}), fingerprint ${issued.fingerprint}. It is logged; the fingerprint on its pages leads back to this revision.${issued.warning ? ` ${issued.warning}` : ""}`, issued.warning ? "caution" : "info");
    await this.#selectMember(member.id);
  }

  async #compare(member: Member, from: number, to: number): Promise<void> {
    const project = this.#project!;
    this.#comparison.replaceChildren(el("p", { className: "hint", text: "Comparing…" }));
    const answer = await compareRevisions(project.id, member.id, from, to);
    if (!answer.ok) {
      this.#comparison.replaceChildren();
      return this.#problem("The revisions could not be compared", answer.problem);
    }
    this.#comparison.replaceChildren(el("section", { className: "store-panel compare-panel" }, [comparisonView(answer.value, this.options.schema)]));
  }

  async #export(project: Project): Promise<void> {
    const answer = await exportProject(project.id);
    if (!answer.ok) return this.#problem("The project could not be exported", answer.problem);
    const name = (project.number || project.name).replace(/[^A-Za-z0-9._-]+/g, "-").replace(/^-+|-+$/g, "") || "project";
    saveBlob(answer.value, `${name}.stitchplan-project.json`);
    this.#say(`Exported ${name}.stitchplan-project.json: every revision of every member and the worksheet log (not the PDFs).`);
  }

  async #import(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    input.value = "";
    if (!file) return;
    let parsed: unknown;
    try {
      parsed = JSON.parse(await file.text());
    } catch {
      return this.#say(`“${file.name}” is not valid JSON; nothing was imported.`, "problem");
    }
    const answer = await importProject(parsed);
    if (!answer.ok) return this.#problem(`“${file.name}” was not imported`, answer.problem);
    this.#say(`Imported “${answer.value.name}” as a new project.`);
    await this.#loadProjects(answer.value.id);
  }
}
