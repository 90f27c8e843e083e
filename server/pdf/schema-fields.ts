import type { z } from "zod";
import { Connector } from "../../core/connector/registry.js";
import { Fastening, Load, Material, Shape } from "../../core/schema/job.js";
import { quantityOf } from "../../core/schema/quantity.js";
import { numberText, type QuantityText } from "./quantity-text.js";

interface Def {
  type: string;
  innerType?: z.ZodType;
  in?: z.ZodType;
  options?: z.ZodType[];
  shape?: Record<string, z.ZodType>;
}
const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def } })._zod.def;

/** The object schema a value was parsed with, through wrappers and tagged unions. */
function objectSchemaFor(schema: z.ZodType | undefined, value: Record<string, unknown>): Record<string, z.ZodType> | undefined {
  let current = schema;
  for (let depth = 0; current && depth < 12; depth++) {
    const def = defOf(current);
    if (def.type === "object") return def.shape;
    if (def.type === "union") current = def.options?.find((o) => o.safeParse(value).success);
    else current = def.innerType ?? def.in;
  }
  return undefined;
}

function quantityKindOf(schema: z.ZodType): string | undefined {
  let current: z.ZodType | undefined = schema;
  for (let depth = 0; current && depth < 12; depth++) {
    const meta = quantityOf.get(current);
    if (meta) return meta.quantity;
    const def = defOf(current);
    current = def.innerType ?? def.in;
  }
  return undefined;
}

// A one-letter key is a symbol (P, M, w) and keeps its case.
const words = (key: string) => (key.length === 1 ? key : key.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase());

/**
 * The fields of a value as entered, each number with its unit, read from its schema: every connector
 * kind and every shape prints without this renderer knowing the kinds.
 */
function describeFields(schema: z.ZodType, value: Record<string, unknown>, text: QuantityText, skip: Set<string>): string[] {
  const shape = objectSchemaFor(schema, value);
  const out: string[] = [];
  for (const [key, v] of Object.entries(value)) {
    if (skip.has(key) || v === undefined || v === null || v === "") continue;
    const field = shape?.[key];
    const kind = field ? quantityKindOf(field) : undefined;
    if (typeof v === "number") out.push(`${words(key)} ${kind ? text.of(v, kind) : numberText(v)}`);
    else if (typeof v === "boolean") out.push(`${words(key)} ${v ? "yes" : "no"}`);
    else if (typeof v === "string") out.push(`${words(key)} ${v}`);
  }
  return out;
}

type ConnectorValue = z.infer<typeof Connector>;
type ShapeValue = z.infer<typeof Shape>;

/** A connector's properties as entered, e.g. "resistance 330 N; min spacing 35 mm". */
export function connectorFields(connector: ConnectorValue, text: QuantityText): string {
  return describeFields(Connector, connector as unknown as Record<string, unknown>, text, new Set(["id", "kind", "label", "source"])).join("; ");
}

/** A part's shape as entered, e.g. "rectangle: b 95 mm; h 70 mm". */
export function shapeFields(shape: ShapeValue, text: QuantityText): string {
  const fields = describeFields(Shape, shape as unknown as Record<string, unknown>, text, new Set(["type"]));
  return `${shape.type}${fields.length ? `: ${fields.join("; ")}` : ""}`;
}

/** A load as entered without its type, category and label, e.g. "w 1.6 kN/m; from 0 m; to 2 m". */
export function loadFields(load: z.infer<typeof Load>, text: QuantityText): string {
  return describeFields(Load, load as unknown as Record<string, unknown>, text, new Set(["type", "category", "label"])).join("; ");
}

/** Fastening settings beyond connector and rows (driving side and any later ones), as entered. */
export function fasteningFields(fastening: z.infer<typeof Fastening>, text: QuantityText): string {
  return describeFields(Fastening, fastening as unknown as Record<string, unknown>, text, new Set(["connector", "rows", "held", "provided"])).join("; ");
}

/** A material's properties beyond E, density and the bending and shear strengths, as entered. */
export function materialFields(material: z.infer<typeof Material>, text: QuantityText): string {
  const value = material as unknown as Record<string, unknown>;
  const strength = (value.strength ?? {}) as Record<string, unknown>;
  const strengthSchema = objectSchemaFor(Material, value)?.strength;
  return [
    ...describeFields(Material, value, text, new Set(["id", "name", "family", "E", "density", "strength", "source"])),
    ...(strengthSchema ? describeFields(strengthSchema, strength, text, new Set(["bending", "shear"])).map((f) => `${f} strength`) : []),
  ].join("; ");
}
