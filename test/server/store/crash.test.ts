import { spawn, type ChildProcessWithoutNullStreams } from "node:child_process";
import { join } from "node:path";
import Database from "better-sqlite3";
import { afterEach, beforeEach, describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/index.js";
import { JobStore } from "../../../server/store/job-store.js";
import { DATABASE_FILE } from "../../../server/store/open-database.js";
import { example, tempFolder, tsNodeArgs } from "./store-fixtures.js";

const SAVE_LOOP = join(import.meta.dirname, "save-loop.ts");

let folder: ReturnType<typeof tempFolder>;
const children: ChildProcessWithoutNullStreams[] = [];
beforeEach(() => {
  folder = tempFolder("crash");
});
afterEach(() => {
  for (const child of children.splice(0)) if (child.exitCode === null && child.signalCode === null) child.kill("SIGKILL");
  folder.remove();
});

/** A project with one member at revision 1; returns their ids. */
function seed(): { projectId: number; memberId: number } {
  const store = JobStore.open(folder.dir);
  try {
    const project = store.createProject({ name: "Crash test", number: "", client: "" });
    const { memberId } = store.createMember(project.id, example("workshop-box-beam.si"));
    return { projectId: project.id, memberId };
  } finally {
    store.close();
  }
}

/**
 * Starts a saving child; `reached` resolves when its output has matched `until`, `exited` when it has
 * ended and its output is all read (`output()` then holds every line it wrote).
 */
function saver(args: string[], until: (out: string) => boolean): { child: ChildProcessWithoutNullStreams; reached: Promise<string>; exited: Promise<number | null>; output: () => string } {
  const child = spawn(process.execPath, [...tsNodeArgs(SAVE_LOOP), folder.dir, ...args]);
  children.push(child);
  let out = "";
  let err = "";
  child.stderr.on("data", (d) => (err += d));
  const exited = new Promise<number | null>((resolve) => child.on("close", (code) => resolve(code)));
  const reached = new Promise<string>((resolve, reject) => {
    child.stdout.on("data", (d) => {
      out += d;
      if (until(out)) resolve(out);
    });
    void exited.then((code) => (until(out) ? resolve(out) : reject(new Error(`saver exited (${code}) early: ${out}\n${err}`))));
  });
  reached.catch(() => undefined); // awaited by the tests that wait for output; the others only wait for the exit
  return { child, reached, exited, output: () => out };
}

/** Opens the file afresh the way a restarted server would, and reports what a crash may have left. */
function inspect(memberId: number) {
  const db = new Database(join(folder.dir, DATABASE_FILE));
  try {
    const integrity = db.pragma("integrity_check", { simple: true });
    const rows = db.prepare("SELECT number, job FROM revisions WHERE member_id = ? ORDER BY number").all(memberId) as { number: number; job: string }[];
    return { integrity, numbers: rows.map((r) => r.number), allValid: rows.every((r) => prepareJob(JSON.parse(r.job)).ok) };
  } finally {
    db.close();
  }
}

describe("job store under kill -9", () => {
  test("killing a process that saves in a loop loses at most the save in progress: integrity ok, revisions 1…n without gaps", async () => {
    const { projectId, memberId } = seed();
    const { child, reached, exited, output } = saver([String(projectId), String(memberId), "100000"], (out) => (out.match(/^saved /gm) ?? []).length >= 8);
    await reached;
    child.kill("SIGKILL");
    await exited;
    // Pipes are written synchronously on Linux: every "saved n" the child wrote before the kill is here.
    const committed = Math.max(...[...output().matchAll(/^saved (\d+)$/gm)].map((m) => Number(m[1])));
    const after = inspect(memberId);
    expect(after.integrity).toBe("ok");
    expect(after.numbers).toEqual(Array.from({ length: after.numbers.length }, (_, i) => i + 1));
    // Every save the child reported is there; at most the one it was making is not.
    expect(after.numbers.length).toBeGreaterThanOrEqual(committed);
    expect(after.numbers.length).toBeLessThanOrEqual(committed + 1);
    expect(after.allValid).toBe(true);
  });

  test("killing a process inside a save's transaction (rows written, not committed) leaves the store as before that save", async () => {
    const { projectId, memberId } = seed();
    const { child, reached, exited } = saver([String(projectId), String(memberId), "1", "hold"], (out) => out.includes("holding"));
    await reached;
    child.kill("SIGKILL");
    await exited;
    expect(inspect(memberId)).toEqual({ integrity: "ok", numbers: [1], allValid: true });
    // The store opens and saves normally afterwards.
    const store = JobStore.open(folder.dir);
    try {
      expect(store.saveRevision(projectId, memberId, example("workshop-box-beam.si")).revision.revision).toBe(2);
    } finally {
      store.close();
    }
  });

  test("two processes saving the same member at the same time lose neither's revisions", async () => {
    const { projectId, memberId } = seed();
    const each = 6;
    const a = saver([String(projectId), String(memberId), String(each)], () => false);
    const b = saver([String(projectId), String(memberId), String(each)], () => false);
    const codes = await Promise.all([a.exited, b.exited]);
    expect(codes).toEqual([0, 0]);
    const after = inspect(memberId);
    expect(after.integrity).toBe("ok");
    expect(after.numbers).toEqual(Array.from({ length: 1 + 2 * each }, (_, i) => i + 1));
    const store = JobStore.open(folder.dir);
    try {
      const byProcess = new Map<string, number>();
      for (const r of store.listRevisions(projectId, memberId).slice(1)) {
        const pid = r.note.split(" ")[1]!;
        byProcess.set(pid, (byProcess.get(pid) ?? 0) + 1);
      }
      expect([...byProcess.values()]).toEqual([each, each]);
    } finally {
      store.close();
    }
  });
});
