import { copyFileSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import Database from "better-sqlite3";
import { afterEach, beforeEach, describe, expect, test } from "vitest";
import { JobStore } from "../../../server/store/job-store.js";
import { LATEST_SCHEMA_VERSION, migrate, migrations } from "../../../server/store/migrations.js";
import { DATABASE_FILE, StoreOpenError } from "../../../server/store/open-database.js";
import { tempFolder } from "./store-fixtures.js";

const V1_FILE = join(import.meta.dirname, "../../../fixtures/store/v1.sqlite");

let folder: ReturnType<typeof tempFolder>;
beforeEach(() => {
  folder = tempFolder("migrate");
});
afterEach(() => folder.remove());

/** Tables, columns and indexes of a database, comparable between two files. */
function schemaOf(db: Database.Database) {
  const objects = db.prepare("SELECT type, name FROM sqlite_master WHERE name NOT LIKE 'sqlite_%' ORDER BY type, name").all() as { type: string; name: string }[];
  return objects.map((o) => ({ ...o, columns: o.type === "table" ? (db.pragma(`table_info(${o.name})`) as { name: string; type: string; notnull: number; dflt_value: unknown; pk: number }[]) : [] }));
}

describe("store migrations", () => {
  test("an empty data folder gets a database at the latest schema version, with no backup", () => {
    const store = JobStore.open(folder.dir);
    try {
      expect(store.info()).toMatchObject({ schemaVersion: LATEST_SCHEMA_VERSION, projects: 0, upgrade: { from: 0, backup: null } });
      expect(LATEST_SCHEMA_VERSION).toBe(3);
    } finally {
      store.close();
    }
  });

  test("migrating step by step from empty is the same as opening: each version numbered once, in order", () => {
    expect(migrations.map((m) => m.version)).toEqual(migrations.map((_, i) => i + 1));
    const db = new Database(":memory:");
    expect(migrate(db, 1)).toEqual([1]);
    expect(migrate(db, 2)).toEqual([2]);
    expect(migrate(db)).toEqual([3]);
    expect(migrate(db)).toEqual([]);
    const opened = JobStore.open(folder.dir);
    try {
      expect(schemaOf(db)).toEqual(schemaOf(opened.db));
    } finally {
      opened.close();
      db.close();
    }
  });

  test("migration 1 still builds exactly the schema of the committed v1 file", () => {
    const committed = new Database(V1_FILE, { readonly: true });
    const fresh = new Database(":memory:");
    migrate(fresh, 1);
    expect(schemaOf(fresh)).toEqual(schemaOf(committed));
    committed.close();
    fresh.close();
  });

  test("the committed v1 file upgrades to the latest version: every row kept, new columns and indexes present, a backup taken first", () => {
    const file = join(folder.dir, DATABASE_FILE);
    copyFileSync(V1_FILE, file);
    const v1 = new Database(V1_FILE, { readonly: true });
    const oldRevisions = v1.prepare("SELECT member_id, number, job, fingerprint, saved_at, note FROM revisions ORDER BY number").all() as { job: string; fingerprint: string }[];
    const oldIssue = v1.prepare("SELECT * FROM worksheets").get() as { fingerprint: string; pdf: Buffer };
    v1.close();

    const store = JobStore.open(folder.dir);
    try {
      expect(store.info()).toMatchObject({ schemaVersion: 3, projects: 1, members: 1, revisions: 2, worksheets: 1, upgrade: { from: 1 } });
      // v3: a project that was in the store before is not marked as imported.
      expect(store.listProjects()).toMatchObject([{ id: 1, importedAt: null }]);
      const backup = store.upgrade.backup!;
      expect(readdirSync(folder.dir)).toContain(backup.split("/").pop());
      const kept = new Database(backup, { readonly: true });
      expect(kept.pragma("user_version", { simple: true })).toBe(1);
      kept.close();

      const rows = store.db.prepare("SELECT member_id, number, job, fingerprint, saved_at, note, based_on, program FROM revisions ORDER BY number").all() as Record<string, unknown>[];
      expect(rows.map(({ based_on, program, ...rest }) => rest)).toEqual(oldRevisions);
      expect(rows.map((r) => [r.based_on, r.program])).toEqual([
        [null, ""],
        [null, ""],
      ]);
      const indexes = (store.db.prepare("SELECT name FROM sqlite_master WHERE type = 'index'").pluck().all() as string[]).filter((n) => !n.startsWith("sqlite_"));
      expect(indexes).toEqual(expect.arrayContaining(["worksheets_by_fingerprint", "revisions_by_fingerprint"]));

      // What the old file held is still found the new way.
      const found = store.lookUp(oldIssue.fingerprint);
      expect(found.issues).toMatchObject([{ mark: "LB-1", revision: 2, titleRevision: "", hasPdf: true }]);
      expect(store.worksheetPdf(1, 1, found.issues[0]!.id).pdf).toEqual(oldIssue.pdf);
      expect(store.revision(1, 1, 2).job.beam.loads[0]).toMatchObject({ w: 45 });
      expect(store.listRevisions(1, 1).map((r) => [r.revision, r.note])).toEqual([
        [1, "first issue"],
        [2, "loft storage load raised"],
      ]);
    } finally {
      store.close();
    }
    // Opening again changes nothing more.
    const again = JobStore.open(folder.dir);
    expect(again.upgrade).toEqual({ from: 3, backup: null });
    again.close();
  });

  test("a file from a newer program is refused and left as it was", () => {
    const file = join(folder.dir, DATABASE_FILE);
    const db = new Database(file);
    migrate(db);
    db.pragma(`user_version = ${LATEST_SCHEMA_VERSION + 1}`);
    db.close();
    const bytes = readFileSync(file);
    expect(() => JobStore.open(folder.dir)).toThrow(StoreOpenError);
    expect(() => JobStore.open(folder.dir)).toThrow(/newer stitchplan \(schema version 4; this one knows up to 3\)/);
    expect(readFileSync(file)).toEqual(bytes);
  });

  test("a file that is not a database is refused with a sentence, not a crash", () => {
    writeFileSync(join(folder.dir, DATABASE_FILE), "these are somebody's notes, not a database ".repeat(200));
    expect(() => JobStore.open(folder.dir)).toThrow(/Cannot open the job store .*stitchplan\.sqlite: file is not a database/);
  });
});
