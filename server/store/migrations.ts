import type { Database } from "better-sqlite3";

/**
 * The store's schema, one step per version; `PRAGMA user_version` holds the version a file is at.
 * A released step is never edited: change the schema by appending a step (test/server/store/migrations.test.ts
 * upgrades a committed v1 file).
 */
export const migrations: readonly { version: number; sql: string }[] = [
  {
    version: 1,
    sql: `
      CREATE TABLE projects (
        id INTEGER PRIMARY KEY,
        name TEXT NOT NULL,
        number TEXT NOT NULL DEFAULT '',
        client TEXT NOT NULL DEFAULT '',
        created_at TEXT NOT NULL
      );
      CREATE TABLE members (
        id INTEGER PRIMARY KEY,
        project_id INTEGER NOT NULL REFERENCES projects (id),
        mark TEXT NOT NULL,
        description TEXT NOT NULL DEFAULT '',
        created_at TEXT NOT NULL,
        UNIQUE (project_id, mark)
      );
      CREATE TABLE revisions (
        member_id INTEGER NOT NULL REFERENCES members (id),
        number INTEGER NOT NULL CHECK (number >= 1),
        job TEXT NOT NULL,
        fingerprint TEXT NOT NULL,
        saved_at TEXT NOT NULL,
        note TEXT NOT NULL DEFAULT '',
        PRIMARY KEY (member_id, number)
      ) WITHOUT ROWID;
      CREATE TABLE worksheets (
        id INTEGER PRIMARY KEY,
        member_id INTEGER NOT NULL,
        revision INTEGER NOT NULL,
        fingerprint TEXT NOT NULL,
        issued_at TEXT NOT NULL,
        file_name TEXT NOT NULL,
        pdf BLOB,
        FOREIGN KEY (member_id, revision) REFERENCES revisions (member_id, number)
      );
    `,
  },
  {
    // v2: which revision an edit started from (two tabs), the program that saved or issued, a cached
    // result summary for member lists, the title-block revision printed, and fingerprint look-ups by index.
    version: 2,
    sql: `
      ALTER TABLE revisions ADD COLUMN based_on INTEGER;
      ALTER TABLE revisions ADD COLUMN program TEXT NOT NULL DEFAULT '';
      ALTER TABLE revisions ADD COLUMN summary TEXT;
      ALTER TABLE worksheets ADD COLUMN program TEXT NOT NULL DEFAULT '';
      ALTER TABLE worksheets ADD COLUMN title_revision TEXT NOT NULL DEFAULT '';
      CREATE INDEX worksheets_by_fingerprint ON worksheets (fingerprint);
      CREATE INDEX worksheets_by_member ON worksheets (member_id, revision);
      CREATE INDEX revisions_by_fingerprint ON revisions (fingerprint);
      CREATE INDEX members_by_project ON members (project_id);
    `,
  },
  {
    // v3: when a project was made from an imported project file (null for one created here), so the listing can say so.
    version: 3,
    sql: `
      ALTER TABLE projects ADD COLUMN imported_at TEXT;
    `,
  },
];

export const LATEST_SCHEMA_VERSION = migrations[migrations.length - 1]!.version;

export function schemaVersion(db: Database): number {
  return db.pragma("user_version", { simple: true }) as number;
}

/** Brings the file up to `target` (the latest by default), each step in its own transaction. */
export function migrate(db: Database, target = LATEST_SCHEMA_VERSION): number[] {
  const applied: number[] = [];
  for (const step of migrations) {
    if (step.version > target || step.version <= schemaVersion(db)) continue;
    // Re-read inside the write lock: another process may have upgraded the file meanwhile.
    const ran = db
      .transaction(() => {
        if (schemaVersion(db) >= step.version) return false;
        db.exec(step.sql);
        db.pragma(`user_version = ${step.version}`);
        return true;
      })
      .immediate();
    if (ran) applied.push(step.version);
  }
  return applied;
}
