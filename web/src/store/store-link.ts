/** Where the job being edited was opened from or last saved to in the job store. */
export interface StoreLink {
  projectId: number;
  projectName: string;
  memberId: number;
  mark: string;
  /** The saved revision the edits start from; a save sends it as `basedOn`. */
  revision: number;
}

const KEY = "stitchplan.storeLink";

const isLink = (v: unknown): v is StoreLink => {
  const l = v as StoreLink;
  return typeof v === "object" && v !== null && Number.isInteger(l.projectId) && Number.isInteger(l.memberId) && Number.isInteger(l.revision) && typeof l.mark === "string" && typeof l.projectName === "string";
};

/** The link of the job being edited, kept across reloads with the job itself. */
export class StoreLinkState {
  #link: StoreLink | null;
  readonly #listeners: (() => void)[] = [];

  constructor() {
    let stored: unknown = null;
    try {
      stored = JSON.parse(sessionStorage.getItem(KEY) ?? localStorage.getItem(KEY) ?? "null");
    } catch {
      stored = null;
    }
    this.#link = isLink(stored) ? stored : null;
  }

  get link(): StoreLink | null {
    return this.#link;
  }

  set(link: StoreLink | null): void {
    this.#link = link;
    try {
      // Each tab keeps its own link (two tabs may edit two revisions); the last one is also the one a new tab starts from.
      if (link) {
        sessionStorage.setItem(KEY, JSON.stringify(link));
        localStorage.setItem(KEY, JSON.stringify(link));
      } else {
        sessionStorage.removeItem(KEY);
        localStorage.removeItem(KEY);
      }
    } catch {
      // Storage blocked: the link lasts as long as the page.
    }
    for (const listener of this.#listeners) listener();
  }

  onChange(listener: () => void): void {
    this.#listeners.push(listener);
  }
}
