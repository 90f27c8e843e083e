import type { DesignSession } from "../design-session.js";
import { el } from "../dom.js";
import { menu } from "../menu.js";
import type { Say } from "../toolbar.js";
import { createMember, createProject, jobIssues, listMembers, listProjects, saveRevision, type SavedRevision, type StoreProblem } from "./store-api.js";
import type { StoreLinkState } from "./store-link.js";

const markOf = (session: DesignSession) => String((session.state.job.member as Record<string, unknown> | undefined)?.mark ?? "");

/** Tells the user what a refused save means; the job's own problems go to their fields. */
export function reportSaveProblem(session: DesignSession, problem: StoreProblem, say: Say, action?: HTMLElement): void {
  const issues = jobIssues(problem.issues);
  if (issues.length) {
    session.showIssues(issues);
    return say(`Not saved: the job has ${issues.length === 1 ? "a problem" : `${issues.length} problems`}, marked at the fields. Only a job that validates is stored; your entries are kept here.`, "problem");
  }
  say(`Not saved: ${problem.message}`, "problem", action);
}

/** Says which revision was saved, and which were saved meanwhile from elsewhere (another tab or person). */
export function reportSaved(saved: SavedRevision, projectName: string, say: Say): void {
  const text = `Saved as revision ${saved.revision.revision} of ${saved.mark} in “${projectName}”.`;
  if (saved.warnings.length) say(`${text} ${saved.warnings.join(" ")}`, "caution");
  else say(text);
}

/**
 * Saves the job being edited into the job store as a new revision: of the member it came from, or
 * as a new member of a chosen project. The toolbar shows where the job stands.
 */
export function storeSaveControls(session: DesignSession, link: StoreLinkState, say: Say, openStore: () => void): HTMLElement {
  const chip = el("span", { className: "store-chip", attrs: { "aria-live": "polite" } });
  const panel = el("div", { className: "save-panel" });
  const saveMenu = menu("Save to project", [panel], "save-menu");
  const note = el("input", { attrs: { type: "text", maxlength: 500, id: "revision-note", placeholder: "what changed (optional)", autocomplete: "off" } });

  const saveAsRevision = async () => {
    const l = link.link;
    if (!l) return;
    const answer = await saveRevision(l.projectId, l.memberId, session.state.job, note.value, l.revision);
    if (!answer.ok) return reportSaveProblem(session, answer.problem, say);
    link.set({ ...l, mark: answer.value.mark, revision: answer.value.revision.revision });
    note.value = "";
    saveMenu.open = false;
    reportSaved(answer.value, l.projectName, say);
  };

  const projectChoice = el("select", { attrs: { id: "save-project", "aria-label": "Project to save into" } });
  const newProject = el("input", { attrs: { type: "text", id: "save-new-project", maxlength: 120, placeholder: "name of a new project", autocomplete: "off", "aria-label": "New project name" } });
  const loadProjects = async () => {
    const answer = await listProjects();
    const projects = answer.ok ? answer.value : [];
    projectChoice.replaceChildren(
      ...projects.map((p) => el("option", { text: p.number ? `${p.number} · ${p.name}` : p.name, attrs: { value: String(p.id) } })),
      el("option", { text: "a new project…", attrs: { value: "new" } }),
    );
    const jobProject = String((session.state.job.project as Record<string, unknown> | undefined)?.name ?? "");
    const same = projects.find((p) => p.name === jobProject);
    // Only the project the job names is chosen for the user; any other would file the member in the wrong project.
    projectChoice.value = same ? String(same.id) : "new";
    if (!newProject.value) newProject.value = jobProject;
    newProject.hidden = projectChoice.value !== "new";
  };
  projectChoice.addEventListener("change", () => (newProject.hidden = projectChoice.value !== "new"));

  const saveAsMember = async () => {
    let projectId = Number(projectChoice.value);
    let projectName = projectChoice.selectedOptions[0]?.textContent ?? "";
    if (projectChoice.value === "new") {
      const name = newProject.value.trim();
      if (!name) return say("Give the new project a name.", "problem");
      const made = await createProject({ name, number: String((session.state.job.project as Record<string, unknown> | undefined)?.number ?? "").slice(0, 40) });
      if (!made.ok) return say(`The project could not be made: ${made.problem.message}`, "problem");
      projectId = made.value.id;
      projectName = made.value.name;
    }
    const answer = await createMember(projectId, session.state.job, note.value);
    if (answer.ok) {
      link.set({ projectId, projectName, memberId: answer.value.memberId, mark: answer.value.mark, revision: answer.value.revision.revision });
      note.value = "";
      saveMenu.open = false;
      return reportSaved(answer.value, projectName, say);
    }
    if (answer.problem.code !== "ERR_MEMBER_EXISTS") return reportSaveProblem(session, answer.problem, say);
    // The mark is taken in that project by another member: a save here must not become a revision of it.
    const members = await listMembers(projectId);
    const existing = members.ok ? members.value.find((m) => m.mark === markOf(session)) : undefined;
    if (!existing) return reportSaveProblem(session, answer.problem, say);
    const toStore = el("button", { className: "link-button", text: "Open Projects and revisions", attrs: { type: "button" }, on: { click: () => openStore() } });
    say(
      `Nothing was stored: “${projectName}” already has a member ${existing.mark} (${existing.revisions} revision${existing.revisions === 1 ? "" : "s"}). To keep both, give this member another mark; to revise that one, open it from Projects and revisions and save it there.`,
      "caution",
      toStore,
    );
  };

  const draw = () => {
    const l = link.link;
    chip.replaceChildren(
      ...(l
        ? [el("span", { className: "chip-label", text: "In the store: " }), el("strong", { text: `${l.projectName} › ${l.mark}` }), ` · saved revision ${l.revision}`]
        : [el("span", { className: "chip-label", text: "Not saved in a project" })]),
    );
    saveMenu.querySelector("summary")!.textContent = l ? "Save revision" : "Save to project";
    const save = el("button", { className: "primary", text: l ? `Save as revision ${l.revision + 1}` : "Save", attrs: { type: "button" } });
    save.addEventListener("click", () => void (l ? saveAsRevision() : saveAsMember()));
    panel.replaceChildren(
      ...(l
        ? [el("p", { className: "menu-note", text: `A new revision of ${l.mark}, edited from revision ${l.revision}. Nothing saved before is changed.` })]
        : [
            el("label", { text: "Project", attrs: { for: "save-project" } }),
            projectChoice,
            newProject,
            el("p", { className: "menu-note", text: "The member is saved under its mark, as revision 1." }),
          ]),
      el("label", { text: "Note", attrs: { for: "revision-note" } }),
      note,
      el("div", { className: "button-row" }, [
        save,
        el("button", { className: "link-button", text: "Other project or member…", attrs: { type: "button" }, on: { click: () => ((saveMenu.open = false), openStore()) } }),
      ]),
    );
  };
  saveMenu.addEventListener("toggle", () => {
    if (saveMenu.open && !link.link) void loadProjects();
  });
  link.onChange(draw);
  draw();
  return el("div", { className: "store-save" }, [chip, saveMenu]);
}
