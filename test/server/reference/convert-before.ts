// The conversion, fingerprint and finite check as they were before the speed work (issue 20): the reference that
// test/server/answer-bytes.test.ts holds the faster path to, byte for byte. Not used by the program.
import type { z } from "zod";
import { quantityOf } from "../../../core/schema/quantity.js";
import { fromCore, toCore, type Quantity, type UnitSystem } from "../../../core/units/quantity.js";

type Scale = (value: number, quantity: Quantity) => number;
type Converter = (value: unknown, scale: Scale) => unknown;

interface Def {
  type: string;
  shape?: Record<string, z.ZodType>;
  element?: z.ZodType;
  innerType?: z.ZodType;
  options?: z.ZodType[];
  discriminator?: string;
  valueType?: z.ZodType;
  in?: z.ZodType;
  items?: z.ZodType[];
  getter?: () => z.ZodType;
}

const defOf = (schema: z.ZodType): Def => (schema as unknown as { _zod: { def: Def } })._zod.def;

/**
 * Walks a parsed value alongside its schema and rescales every number whose schema carries a
 * quantity kind. Values are assumed valid for the schema (parse first). The walk is compiled once
 * per schema into a converter, so converting a large result costs little more than copying it.
 */
export function rescale<T>(schema: z.ZodType, value: T, scale: Scale): T {
  return converterOf(schema)(value, scale) as T;
}

const compiled = new WeakMap<z.ZodType, Converter>();
const same: Converter = (v) => v;

function converterOf(schema: z.ZodType): Converter {
  let c = compiled.get(schema);
  if (!c) {
    // Set a forwarding entry first so recursive (lazy) schemas resolve to the finished converter.
    let finished: Converter = same;
    compiled.set(schema, (v, s) => finished(v, s));
    finished = compile(schema);
    compiled.set(schema, finished);
    c = finished;
  }
  return c;
}

const absent = (v: unknown) => v === undefined || v === null;

function compile(schema: z.ZodType): Converter {
  const meta = quantityOf.get(schema);
  if (meta) {
    const q = meta.quantity;
    return (v, s) => (typeof v === "number" ? s(v, q) : v);
  }
  const def = defOf(schema);
  switch (def.type) {
    case "object": {
      const fields = Object.entries(def.shape ?? {})
        .map(([key, field]) => [key, converterOf(field)] as const)
        .filter(([, c]) => c !== same);
      if (fields.length === 0) return same;
      return (v, s) => {
        if (absent(v)) return v;
        const out: Record<string, unknown> = { ...(v as Record<string, unknown>) };
        for (const [key, c] of fields) if (key in out) out[key] = c(out[key], s);
        return out;
      };
    }
    case "array": {
      const element = def.element!;
      const elementMeta = quantityOf.get(element);
      if (elementMeta) {
        const q = elementMeta.quantity;
        return (v, s) => (absent(v) ? v : (v as unknown[]).map((x) => (typeof x === "number" ? s(x, q) : x)));
      }
      const c = converterOf(element);
      if (c === same) return same;
      return (v, s) => (absent(v) ? v : (v as unknown[]).map((x) => c(x, s)));
    }
    case "tuple": {
      const items = (def.items ?? []).map(converterOf);
      if (items.every((c) => c === same)) return same;
      return (v, s) => (absent(v) ? v : (v as unknown[]).map((x, i) => (items[i] ? items[i]!(x, s) : x)));
    }
    case "record": {
      const c = converterOf(def.valueType!);
      if (c === same) return same;
      return (v, s) => {
        if (absent(v)) return v;
        const out: Record<string, unknown> = {};
        for (const [key, x] of Object.entries(v as Record<string, unknown>)) out[key] = c(x, s);
        return out;
      };
    }
    case "optional":
    case "nullable":
    case "default":
    case "prefault":
    case "readonly":
    case "catch": {
      const c = converterOf(def.innerType!);
      return c === same ? same : (v, s) => (absent(v) ? v : c(v, s));
    }
    case "pipe":
      return converterOf(def.in!);
    case "lazy":
      return (v, s) => converterOf(def.getter!())(v, s);
    case "union": {
      const options = def.options ?? [];
      const converters = options.map(converterOf);
      if (converters.every((c) => c === same)) return same;
      if (def.discriminator) {
        const key = def.discriminator;
        // Tags given as literals or enums are looked up; any other discriminator is tried option by option.
        const byTag = new Map<unknown, Converter>();
        const tried: number[] = [];
        options.forEach((o, i) => {
          const field = defOf(o).shape?.[key];
          const fieldDef = field ? (defOf(field) as Def & { values?: unknown[]; entries?: Record<string, unknown> }) : undefined;
          const tags = fieldDef?.type === "literal" ? fieldDef.values : fieldDef?.type === "enum" ? Object.values(fieldDef.entries ?? {}) : undefined;
          if (tags) for (const tag of tags) if (!byTag.has(tag)) byTag.set(tag, converters[i]!);
          if (!tags) tried.push(i);
        });
        return (v, s) => {
          if (absent(v) || typeof v !== "object") return v;
          const tag = (v as Record<string, unknown>)[key];
          const found = byTag.get(tag);
          if (found) return found(v, s);
          const i = tried.find((k) => defOf(options[k]!).shape?.[key]?.safeParse(tag).success);
          return i === undefined ? v : converters[i]!(v, s);
        };
      }
      return (v, s) => {
        const i = options.findIndex((o) => o.safeParse(v).success);
        return i >= 0 ? converters[i]!(v, s) : v;
      };
    }
    default:
      return same;
  }
}

/** A document written in `system` → the same document in core units. */
export function toCoreUnits<T>(schema: z.ZodType, value: T, system: UnitSystem): T {
  return rescale(schema, value, (v, q) => toCore(v, q, system));
}

/** A document in core units → the same document in `system`, rounded to 12 significant figures to drop conversion noise. */
export function toDisplayUnits<T>(schema: z.ZodType, value: T, system: UnitSystem): T {
  return rescale(schema, value, (v, q) => roundSignificant(fromCore(v, q, system), 12));
}

const POWERS = Array.from({ length: 45 }, (_, i) => 10 ** (i - 22));

/** x rounded to `digits` significant figures, without going through a string. */
export function roundSignificant(x: number, digits: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  const e = Math.floor(Math.log10(Math.abs(x)));
  const k = digits - 1 - e;
  // Beyond 10^22 powers of ten are not exact doubles: take the (slower) string route there.
  if (k < -22 || k > 22) return Number(x.toPrecision(digits));
  // Multiply and divide by exact powers of ten only, so the result is the double nearest the rounded decimal.
  return k >= 0 ? Math.round(x * POWERS[k + 22]!) / POWERS[k + 22]! : Math.round(x / POWERS[22 - k]!) * POWERS[22 - k]!;
}

/** Path of the first number in `value` that is not finite ("beam.perCombination[0].shear[3]"), or null. */
export function firstNonFinite(value: unknown): string | null {
  const keys = walk(value);
  if (keys === null) return null;
  return keys.reverse().map((k, i) => (typeof k === "number" ? `[${k}]` : i === 0 ? k : `.${k}`)).join("") || "(result)";
}

/** Keys leading to the first non-finite number, innermost first; null when every number is finite. */
function walk(x: unknown): (string | number)[] | null {
  if (typeof x === "number") return Number.isFinite(x) ? null : [];
  if (Array.isArray(x)) {
    for (let i = 0; i < x.length; i++) {
      const v: unknown = x[i];
      // Most of a result is long arrays of numbers: checked here without a call each.
      if (typeof v === "number") {
        if (Number.isFinite(v)) continue;
        return [i];
      }
      const found = walk(v);
      if (found) return (found.push(i), found);
    }
    return null;
  }
  if (x !== null && typeof x === "object") {
    for (const k in x) {
      const found = walk((x as Record<string, unknown>)[k]);
      if (found) return (found.push(k), found);
    }
  }
  return null;
}

/** JSON with object keys sorted at every level and numbers as JSON prints them: the text a fingerprint is taken of. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map((v) => (v === undefined ? "null" : canonicalJson(v))).join(",")}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
}
