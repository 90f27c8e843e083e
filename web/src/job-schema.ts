import { quantities, type Quantity } from "../../core/units/quantity.js";

/**
 * What the service's job schema (GET /api/schema/job, JSON Schema) accepts, so the form offers
 * exactly the connector kinds, shapes, load kinds, supports and settings this version of the service
 * knows, and labels every number with its unit from the quantity kind the schema gives it.
 * Paths use "[]" for "every item": `beam.loads[].type`.
 */
interface SchemaNode {
  type?: string;
  properties?: Record<string, SchemaNode>;
  items?: SchemaNode;
  oneOf?: SchemaNode[];
  anyOf?: SchemaNode[];
  enum?: unknown[];
  const?: unknown;
  default?: unknown;
  maxItems?: number;
  minimum?: number;
  maximum?: number;
  required?: string[];
  quantity?: string;
  additionalProperties?: SchemaNode | boolean;
}

export interface SchemaField {
  key: string;
  kind: "number" | "integer" | "text" | "choice" | "boolean" | "group" | "list" | "map";
  /** Values a choice may take, as text; `numericChoices` when they are numbers (EN service class 1, 2, 3). */
  choices: string[];
  numericChoices: boolean;
  required: boolean;
  quantity: Quantity | undefined;
  default: unknown;
  minimum: number | undefined;
  maximum: number | undefined;
  /** The fields of a nested object (a "group"), e.g. a fastener's group action. */
  fields: SchemaField[];
}

const isQuantity = (q: unknown): q is Quantity => typeof q === "string" && (quantities as string[]).includes(q);

export class JobSchema {
  readonly #root: SchemaNode | null;

  /** `root` is null when the schema could not be fetched: the form then offers only what every version accepts. */
  constructor(root: unknown) {
    this.#root = typeof root === "object" && root !== null ? (root as SchemaNode) : null;
  }

  get known(): boolean {
    return this.#root !== null;
  }

  #at(path: string): SchemaNode[] {
    if (!this.#root) return [];
    let nodes: SchemaNode[] = [this.#root];
    for (const step of path.split(/\.|(?=\[\])/).filter(Boolean)) {
      nodes = nodes.flatMap(variants).flatMap((n) => {
        if (step === "[]") return n.items ? [n.items] : [];
        const child = n.properties?.[step];
        return child ? [child] : [];
      });
    }
    return nodes.flatMap(variants);
  }

  has(path: string): boolean {
    return this.#at(path).length > 0;
  }

  /** The values a string at the path may take, or null when it is free text or unknown. */
  choices(path: string): string[] | null {
    const values = this.#at(path).flatMap((n) => (n.enum ?? (n.const !== undefined ? [n.const] : [])).map(String));
    return values.length ? [...new Set(values)] : null;
  }

  maxItems(path: string): number | undefined {
    return this.#at(path).find((n) => n.maxItems !== undefined)?.maxItems;
  }

  /** The quantity kind of the number at a path (`parts[].shape.b` gives "length"). */
  quantityAt(path: string): Quantity | undefined {
    const q = this.#at(path).find((n) => isQuantity(n.quantity))?.quantity;
    return isQuantity(q) ? q : undefined;
  }

  /** The fields of one member of a union, picked by its discriminator, e.g. the "i-section" shape. */
  fieldsOf(path: string, discriminator: string, value: string): SchemaField[] | null {
    const member = this.#at(path).find((n) => n.properties?.[discriminator]?.const === value);
    if (!member?.properties) return null;
    return describe(member).filter((f) => f.key !== discriminator);
  }

  /** The fields of the object at a path, e.g. `materials[]`. */
  fieldsAt(path: string): SchemaField[] {
    const node = this.#at(path).find((n) => n.properties);
    return node ? describe(node) : [];
  }

  /** The values a discriminated union at a path is told apart by, e.g. every connector kind. */
  kinds(path: string, discriminator: string): string[] {
    return this.#at(path).flatMap((n) => {
      const tag = n.properties?.[discriminator]?.const;
      return typeof tag === "string" ? [tag] : [];
    });
  }

  /** Every path in a document whose number has a quantity kind, with that kind; numbers without one are left out. */
  quantities(document: unknown): { path: (string | number)[]; quantity: Quantity }[] {
    const out: { path: (string | number)[]; quantity: Quantity }[] = [];
    const walk = (value: unknown, nodes: SchemaNode[], path: (string | number)[]) => {
      const options = nodes.flatMap(variants);
      if (typeof value === "number") {
        const q = options.find((n) => isQuantity(n.quantity))?.quantity;
        if (isQuantity(q)) out.push({ path, quantity: q });
        return;
      }
      if (Array.isArray(value)) {
        const items = options.flatMap((n) => (n.items ? [n.items] : []));
        value.forEach((v, i) => walk(v, items, [...path, i]));
        return;
      }
      if (typeof value === "object" && value !== null) {
        const record = value as Record<string, unknown>;
        // A union member is picked by the constant its discriminator holds, when it has one.
        const fitting = options.filter((n) => Object.entries(n.properties ?? {}).every(([k, p]) => p.const === undefined || record[k] === undefined || record[k] === p.const));
        for (const [key, v] of Object.entries(record)) {
          const children = fitting.flatMap((n) => {
            const child = n.properties?.[key] ?? (typeof n.additionalProperties === "object" ? n.additionalProperties : undefined);
            return child ? [child] : [];
          });
          walk(v, children, [...path, key]);
        }
      }
    };
    if (this.#root) walk(document, [this.#root], []);
    return out;
  }
}

function describe(node: SchemaNode): SchemaField[] {
  return Object.entries(node.properties ?? {}).map(([key, raw]) => fieldOf(key, raw, node.required?.includes(key) ?? false));
}

function fieldOf(key: string, raw: SchemaNode, required: boolean): SchemaField {
  const options = variants(raw);
  const consts = options.filter((n) => n.const !== undefined).map((n) => n.const);
  const enumValues = raw.enum ?? (consts.length === options.length && consts.length > 1 ? consts : []);
  const node = options[0] ?? raw;
  const kind: SchemaField["kind"] = enumValues.length
    ? "choice"
    : node.type === "integer"
      ? "integer"
      : node.type === "number"
        ? "number"
        : node.type === "boolean"
          ? "boolean"
          : node.type === "array"
            ? "list"
            : node.type === "object"
              ? node.properties
                ? "group"
                : "map"
              : "text";
  return {
    key,
    kind,
    choices: enumValues.map(String),
    numericChoices: enumValues.length > 0 && enumValues.every((v) => typeof v === "number"),
    required,
    quantity: isQuantity(node.quantity) ? node.quantity : undefined,
    default: raw.default,
    minimum: node.minimum,
    maximum: node.maximum,
    fields: kind === "group" ? describe(node) : [],
  };
}

const variants = (node: SchemaNode): SchemaNode[] => (node.oneOf ?? node.anyOf ?? [node]).flatMap((n) => (n.oneOf || n.anyOf ? variants(n) : [n]));
