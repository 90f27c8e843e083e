import type { z } from "zod";
import { quantityOf } from "../schema/quantity.js";
import { quantities, quantityUnits, unitSystems, type Quantity, type UnitSystem } from "./quantity.js";

/** `index` is the quantity's place in `quantities`, for a scale that looks its factor up in a table. */
type Scale = (value: number, quantity: Quantity, index: number) => number;
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

/** Each quantity's factor per system (to core units: ×, back: ÷), by its index in `quantities`: an array read is cheaper per number than the unit table. */
const unitFactors = Object.fromEntries(unitSystems.map((system) => [system, Float64Array.from(quantities, (q) => quantityUnits[q][system].factor)])) as Record<UnitSystem, Float64Array>;

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
    const qi = quantities.indexOf(q);
    return (v, s) => (typeof v === "number" ? s(v, q, qi) : v);
  }
  const def = defOf(schema);
  switch (def.type) {
    case "object": {
      const fields = Object.entries(def.shape ?? {})
        .map(([key, field]) => [key, converterOf(field)] as const)
        .filter(([, c]) => c !== same);
      if (fields.length === 0) return same;
      const keys = fields.map(([key]) => key);
      const converters = fields.map(([, c]) => c);
      return (v, s) => {
        if (absent(v)) return v;
        const out: Record<string, unknown> = { ...(v as Record<string, unknown>) };
        for (let i = 0; i < keys.length; i++) {
          const key = keys[i]!;
          if (key in out) out[key] = converters[i]!(out[key], s);
        }
        return out;
      };
    }
    case "array": {
      const element = def.element!;
      const elementMeta = quantityOf.get(element);
      // Copies by push rather than map: they come out packed (core's arrays are often holey), which
      // JSON.stringify writes on its fast path. Anything but a plain array keeps map's own result.
      if (elementMeta) {
        const q = elementMeta.quantity;
        const qi = quantities.indexOf(q);
        const scaled = (x: unknown, s: Scale) => (typeof x === "number" ? s(x, q, qi) : x);
        return (v, s) => {
          if (absent(v)) return v;
          if (!Array.isArray(v)) return (v as unknown[]).map((x) => scaled(x, s));
          const out: unknown[] = [];
          for (let i = 0; i < v.length; i++) {
            const x: unknown = v[i];
            out.push(typeof x === "number" ? s(x, q, qi) : x);
          }
          return out;
        };
      }
      const c = converterOf(element);
      if (c === same) return same;
      return (v, s) => {
        if (absent(v)) return v;
        if (!Array.isArray(v)) return (v as unknown[]).map((x) => c(x, s));
        const out: unknown[] = [];
        for (let i = 0; i < v.length; i++) out.push(c(v[i], s));
        return out;
      };
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
  // value × factor, as toCore multiplies, with the factor read from the table by index.
  const factors = unitFactors[system];
  return rescale(schema, value, (v, _q, qi) => v * factors[qi]!);
}

/** A document in core units → the same document in `system`, rounded to 12 significant figures to drop conversion noise. */
export function toDisplayUnits<T>(schema: z.ZodType, value: T, system: UnitSystem, seen?: { nonFinite: boolean }): T {
  const factors = unitFactors[system];
  // Dividing by exactly 1 changes nothing, so it is skipped; the rounding is not (it is part of the answer).
  const scale: Scale = seen
    ? (v, _q, qi) => {
        const f = factors[qi]!;
        const x = roundSignificant(f === 1 ? v : v / f, 12);
        if (!Number.isFinite(x)) seen.nonFinite = true;
        return x;
      }
    : (v, _q, qi) => {
        const f = factors[qi]!;
        return roundSignificant(f === 1 ? v : v / f, 12);
      };
  return rescale(schema, value, scale);
}


const POWERS = Array.from({ length: 45 }, (_, i) => 10 ** (i - 22));
// |x| at or above LOW[i] and below HIGH[i] lies safely inside [10^(i-22), 10^(i-21)): floor(log10|x|) is i - 22
// there whatever the last bit of Math.log10, so it is found by comparisons; nearer a power of ten, Math.log10 decides.
const LOW = POWERS.map((p) => p * (1 + 1e-9));
const HIGH = POWERS.map((p) => p * 10 * (1 - 1e-9));

/** x rounded to `digits` significant figures, without going through a string. */
export function roundSignificant(x: number, digits: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  const a = x < 0 ? -x : x;
  let e: number;
  if (a >= 1e-22 && a < 1e22) {
    let i = 22;
    if (a >= 1) while (POWERS[i + 1]! <= a) i++;
    else while (POWERS[i]! > a) i--;
    e = a >= LOW[i]! && a < HIGH[i]! ? i - 22 : Math.floor(Math.log10(a));
  } else {
    e = Math.floor(Math.log10(a));
  }
  const k = digits - 1 - e;
  // Beyond 10^22 powers of ten are not exact doubles: take the (slower) string route there.
  if (k < -22 || k > 22) return Number(x.toPrecision(digits));
  // Multiply and divide by exact powers of ten only, so the result is the double nearest the rounded decimal.
  return k >= 0 ? Math.round(x * POWERS[k + 22]!) / POWERS[k + 22]! : Math.round(x / POWERS[22 - k]!) * POWERS[22 - k]!;
}
