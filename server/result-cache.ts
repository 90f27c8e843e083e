import { createHash } from "node:crypto";

/**
 * Answers already computed, by a key of the request, least recently used dropped first, bounded in
 * bytes. Sound because a design is a pure function of the job and the program (which a process never
 * changes): the page sends the same job again on every reload, undo and units switch.
 */
export class ResultCache {
  private readonly entries = new Map<string, Buffer>();
  private bytes = 0;

  constructor(
    private readonly maxBytes: number,
    private readonly maxEntryBytes = maxBytes / 8,
  ) {}

  /** A key for the request's parts; undefined when the body cannot be written out again (nested too deeply). */
  static key(...parts: unknown[]): string | undefined {
    try {
      return createHash("sha256").update(JSON.stringify(parts)).digest("base64");
    } catch {
      return undefined;
    }
  }

  get(key: string | undefined): Buffer | undefined {
    if (key === undefined) return undefined;
    const value = this.entries.get(key);
    if (value !== undefined) {
      this.entries.delete(key);
      this.entries.set(key, value);
    }
    return value;
  }

  set(key: string | undefined, value: Buffer): void {
    if (key === undefined || value.byteLength > this.maxEntryBytes || this.entries.has(key)) return;
    this.entries.set(key, value);
    this.bytes += value.byteLength;
    for (const [oldest, old] of this.entries) {
      if (this.bytes <= this.maxBytes) break;
      this.entries.delete(oldest);
      this.bytes -= old.byteLength;
    }
  }

  get size(): { entries: number; bytes: number } {
    return { entries: this.entries.size, bytes: this.bytes };
  }
}
