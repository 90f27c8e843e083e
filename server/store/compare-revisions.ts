import type { DesignResult } from "../../core/index.js";
import type { InputChange, ResultChanges, ScheduleChange, UtilisationChange, ZoneChange, ZoneView } from "../../core/schema/store-contract.js";

export type { InputChange, ResultChanges, ScheduleChange, UtilisationChange, ZoneChange, ZoneView };

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

const sameNumber = (a: number, b: number, rel: number) => a === b || Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b));

function equal(a: unknown, b: unknown, rel: number): boolean {
  if (typeof a === "number" && typeof b === "number") return sameNumber(a, b, rel);
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((v, i) => equal(v, b[i], rel));
  if (isRecord(a) && isRecord(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of keys) if (!equal(a[k], b[k], rel)) return false;
    return true;
  }
  return a === b;
}

/** Items of a list that all carry a distinct string `id` (materials, parts, connectors) are matched by id, not by position. */
function idsOf(list: unknown[]): string[] | null {
  const ids = list.map((item) => (isRecord(item) && typeof item.id === "string" ? item.id : null));
  if (ids.some((id) => id === null) || new Set(ids).size !== ids.length) return null;
  return ids as string[];
}

const child = (path: string, key: string) => (path ? `${path}.${key}` : key);

/**
 * Differences between two job documents by field path. Lists whose items have ids are matched by id
 * (a changed part is reported at its index in the newer document, a removed one at its index in the
 * older); other lists by position. Numbers within `rel` (relative) count as equal.
 */
export function inputChanges(from: unknown, to: unknown, options: { rel?: number } = {}): InputChange[] {
  const rel = options.rel ?? 0;
  const out: InputChange[] = [];
  const walk = (a: unknown, b: unknown, path: string) => {
    if (equal(a, b, rel)) return;
    if (isRecord(a) && isRecord(b)) {
      for (const key of Object.keys(a)) {
        if (!(key in b) || b[key] === undefined) out.push({ path: child(path, key), change: "removed", from: a[key], to: null });
        else walk(a[key], b[key], child(path, key));
      }
      for (const key of Object.keys(b)) if (!(key in a) || a[key] === undefined) out.push({ path: child(path, key), change: "added", from: null, to: b[key] });
      return;
    }
    if (Array.isArray(a) && Array.isArray(b)) {
      const idsA = idsOf(a);
      const idsB = idsOf(b);
      if (idsA && idsB) {
        b.forEach((item, j) => {
          const i = idsA.indexOf(idsB[j]!);
          if (i < 0) out.push({ path: `${path}[${j}]`, change: "added", from: null, to: item });
          else walk(a[i], item, `${path}[${j}]`);
        });
        a.forEach((item, i) => {
          if (!idsB.includes(idsA[i]!)) out.push({ path: `${path}[${i}]`, change: "removed", from: item, to: null });
        });
        return;
      }
      for (let i = 0; i < Math.max(a.length, b.length); i++) {
        if (i >= b.length) out.push({ path: `${path}[${i}]`, change: "removed", from: a[i], to: null });
        else if (i >= a.length) out.push({ path: `${path}[${i}]`, change: "added", from: null, to: b[i] });
        else walk(a[i], b[i], `${path}[${i}]`);
      }
      return;
    }
    out.push({ path: path || "(document)", change: "changed", from: a, to: b });
  };
  walk(from, to, "");
  return out;
}

interface Pair<T> {
  from: T | null;
  to: T | null;
}






const zoneFields: (keyof ZoneView)[] = ["from", "to", "spacing", "rows", "count", "utilisation", "passes"];

function pairChange<T>(from: T | undefined, to: T | undefined, same: (a: T, b: T) => boolean): "same" | "changed" | "added" | "removed" {
  if (from === undefined) return "added";
  if (to === undefined) return "removed";
  return same(from, to) ? "same" : "changed";
}

/** Matches two lists by key, in the newer list's order with removed items after. */
function matchBy<T>(a: T[], b: T[], key: (item: T) => string): [string, T | undefined, T | undefined][] {
  const out: [string, T | undefined, T | undefined][] = b.map((item) => [key(item), a.find((x) => key(x) === key(item)), item]);
  for (const item of a) if (!b.some((x) => key(x) === key(item))) out.push([key(item), item, undefined]);
  return out;
}

/**
 * How the schedules, bond lines, welds and member checks changed between two results, which must be in the
 * same unit system (utilisations and counts are pure numbers either way). Schedules are matched by
 * joint, zones by their number along the member.
 */
export function resultChanges(from: DesignResult, to: DesignResult, options: { rel?: number } = {}): ResultChanges {
  const rel = options.rel ?? 1e-9;
  const same = (a: unknown, b: unknown) => equal(a, b, rel);
  const zoneView = (z: DesignResult["schedules"][number]["zones"][number]): ZoneView => ({
    from: z.from,
    to: z.to,
    spacing: z.spacing,
    rows: z.rows,
    count: z.count,
    utilisation: z.utilisation,
    passes: z.passes,
  });
  const schedules = matchBy(from.schedules, to.schedules, (s) => s.joint).map(([joint, a, b]): ScheduleChange => {
    const za = a?.zones.map(zoneView) ?? [];
    const zb = b?.zones.map(zoneView) ?? [];
    const zones: ZoneChange[] = [];
    for (let i = 0; i < Math.max(za.length, zb.length); i++) {
      const x = za[i];
      const y = zb[i];
      const fields = x && y ? zoneFields.filter((f) => !same(x[f], y[f])) : [];
      zones.push({ zone: i + 1, change: pairChange(x, y, () => fields.length === 0), from: x ?? null, to: y ?? null, fields });
    }
    const summary = (s: typeof a) => (s ? { connector: s.connector, count: s.count, maxUtilisation: s.verification.maxUtilisation, passes: s.passes } : undefined);
    const sa = summary(a);
    const sb = summary(b);
    return {
      joint,
      change: pairChange(sa, sb, (p, q) => same(p, q) && zones.every((z) => z.change === "same")),
      connector: { from: sa?.connector ?? null, to: sb?.connector ?? null },
      count: { from: sa?.count ?? null, to: sb?.count ?? null },
      maxUtilisation: { from: sa?.maxUtilisation ?? null, to: sb?.maxUtilisation ?? null },
      passes: { from: sa?.passes ?? null, to: sb?.passes ?? null },
      zones,
    };
  });
  const utilisations = <T>(a: T[], b: T[], key: (item: T) => string, view: (item: T) => { title: string; utilisation: number; passes: boolean }): UtilisationChange[] =>
    matchBy(a, b, key).map(([id, x, y]) => {
      const vx = x === undefined ? undefined : view(x);
      const vy = y === undefined ? undefined : view(y);
      return {
        id,
        title: (vy ?? vx)!.title,
        change: pairChange(vx, vy, (p, q) => same(p.utilisation, q.utilisation) && p.passes === q.passes),
        utilisation: { from: vx?.utilisation ?? null, to: vy?.utilisation ?? null },
        passes: { from: vx?.passes ?? null, to: vy?.passes ?? null },
      };
    });
  const total = (r: DesignResult) => r.schedules.reduce((n, s) => n + s.count, 0);
  return {
    passes: { from: from.status.passes, to: to.status.passes },
    connectors: { from: total(from), to: total(to) },
    schedules,
    bondLines: utilisations(from.bondLines, to.bondLines, (b) => b.joint, (b) => ({ title: `joint ${b.joint}: bond line`, utilisation: b.utilisation, passes: b.passes })),
    welds: utilisations(from.welds ?? [], to.welds ?? [], (w) => w.joint, (w) => ({ title: `joint ${w.joint}: ${w.connectorLabel || "weld"}`, utilisation: w.utilisation, passes: w.passes })),
    checks: utilisations(from.checks, to.checks, (c) => c.id, (c) => ({ title: c.title, utilisation: c.utilisation, passes: c.passes })),
  };
}
