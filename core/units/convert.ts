import type { z } from "zod";
import { quantityOf } from "../schema/quantity.js";
import { fromCore, toCore, type Quantity, type UnitSystem } from "./quantity.js";

type Scale = (value: number, quantity: Quantity) => number;

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
 * Walks a parsed value alongside its schema and rescales every number whose schema
 * carries a quantity kind. Values are assumed valid for the schema (parse first).
 */
export function rescale<T>(schema: z.ZodType, value: T, scale: Scale): T {
  return walk(schema, value, scale) as T;
}

function walk(schema: z.ZodType, value: unknown, scale: Scale): unknown {
  if (value === undefined || value === null) return value;
  const meta = quantityOf.get(schema);
  if (meta && typeof value === "number") return scale(value, meta.quantity);
  const def = defOf(schema);
  switch (def.type) {
    case "object": {
      const out: Record<string, unknown> = {};
      for (const [key, v] of Object.entries(value as Record<string, unknown>)) {
        const field = def.shape?.[key];
        out[key] = field ? walk(field, v, scale) : v;
      }
      return out;
    }
    case "array":
      return (value as unknown[]).map((v) => walk(def.element!, v, scale));
    case "tuple":
      return (value as unknown[]).map((v, i) => (def.items?.[i] ? walk(def.items[i]!, v, scale) : v));
    case "record": {
      const out: Record<string, unknown> = {};
      for (const [key, v] of Object.entries(value as Record<string, unknown>)) out[key] = walk(def.valueType!, v, scale);
      return out;
    }
    case "optional":
    case "nullable":
    case "default":
    case "prefault":
    case "readonly":
    case "catch":
      return walk(def.innerType!, value, scale);
    case "pipe":
      return walk(def.in!, value, scale);
    case "lazy":
      return walk(def.getter!(), value, scale);
    case "union": {
      const option = pickOption(def, value);
      return option ? walk(option, value, scale) : value;
    }
    default:
      return value;
  }
}

function pickOption(def: Def, value: unknown): z.ZodType | undefined {
  const options = def.options ?? [];
  if (def.discriminator && typeof value === "object") {
    const tag = (value as Record<string, unknown>)[def.discriminator];
    return options.find((o) => {
      const field = defOf(o).shape?.[def.discriminator!];
      return field !== undefined && (field as z.ZodType).safeParse(tag).success;
    });
  }
  return options.find((o) => o.safeParse(value).success);
}

/** A document written in `system` → the same document in core units. */
export function toCoreUnits<T>(schema: z.ZodType, value: T, system: UnitSystem): T {
  return rescale(schema, value, (v, q) => toCore(v, q, system));
}

/** A document in core units → the same document in `system`, rounded to 12 significant figures to drop conversion noise. */
export function toDisplayUnits<T>(schema: z.ZodType, value: T, system: UnitSystem): T {
  return rescale(schema, value, (v, q) => {
    const out = fromCore(v, q, system);
    return out === 0 || !Number.isFinite(out) ? out : Number(out.toPrecision(12));
  });
}
