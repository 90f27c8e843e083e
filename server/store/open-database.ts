import { mkdirSync } from "node:fs";
import { dirname } from "node:path";
import Database from "better-sqlite3";
import { LATEST_SCHEMA_VERSION, migrate, schemaVersion } from "./migrations.js";

/** The database's file name inside the data folder. */
export const DATABASE_FILE = "stitchplan.sqlite";

/** A data folder that cannot be used: its sentence says why and that nothing was changed. */
export class StoreOpenError extends Error {}

export interface OpenedDatabase {
  db: Database.Database;
  /** Version the file was at before opening (0 for a new file). */
  openedAt: number;
  /** Copy of the file taken before an upgrade, or null when none was needed. */
  backup: string | null;
}

/**
 * Opens (creating if needed) the store's database and upgrades its schema. WAL keeps readers off the
 * writer's back and makes a killed writer lose only its open transaction; synchronous=FULL makes a
 * committed save survive a power cut too.
 */
export function openDatabase(file: string, options: { now?: () => Date; busyTimeoutMs?: number } = {}): OpenedDatabase {
  mkdirSync(dirname(file), { recursive: true });
  let db: Database.Database;
  try {
    db = new Database(file);
  } catch (error) {
    throw new StoreOpenError(`Cannot open the job store ${file}: ${reason(error)}. Nothing was changed.`);
  }
  try {
    // How long a save waits for another process's save before giving up with ERR_STORE_UNAVAILABLE.
    db.pragma(`busy_timeout = ${Math.round(options.busyTimeoutMs ?? 10_000)}`);
    // Read before anything writes, so a file this program must not touch is left byte for byte.
    const openedAt = schemaVersion(db);
    if (openedAt > LATEST_SCHEMA_VERSION) {
      throw new StoreOpenError(
        `The job store ${file} was written by a newer stitchplan (schema version ${openedAt}; this one knows up to ${LATEST_SCHEMA_VERSION}). Nothing was changed; use the newer program.`,
      );
    }
    const check = db.pragma("quick_check", { simple: true });
    if (check !== "ok") throw new StoreOpenError(`The job store ${file} is damaged (quick_check: ${String(check)}). Nothing was changed; keep a copy of the file before repairing it.`);
    db.pragma("journal_mode = WAL");
    db.pragma("synchronous = FULL");
    db.pragma("foreign_keys = ON");
    let backup: string | null = null;
    if (openedAt > 0 && openedAt < LATEST_SCHEMA_VERSION) {
      const stamp = (options.now?.() ?? new Date()).toISOString().replace(/[:.]/g, "-");
      backup = `${file}.v${openedAt}-${stamp}.bak`;
      db.prepare("VACUUM INTO ?").run(backup);
    }
    migrate(db);
    return { db, openedAt, backup };
  } catch (error) {
    db.close();
    if (error instanceof StoreOpenError) throw error;
    throw new StoreOpenError(`Cannot open the job store ${file}: ${reason(error)}. Nothing was changed.`);
  }
}

function reason(error: unknown): string {
  if (error instanceof Error) return "code" in error && typeof error.code === "string" ? `${error.message} (${error.code})` : error.message;
  return String(error);
}
