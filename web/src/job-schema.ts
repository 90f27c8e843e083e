/**
 * What the service's job schema (GET /api/schema/job, JSON Schema) accepts, so the form offers
 * exactly the load kinds, supports, shapes and settings this version of the service knows.
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
  maxItems?: number;
  required?: string[];
}

export interface SchemaField {
  key: string;
  kind: "number" | "text" | "choice";
  choices: string[];
  required: boolean;
}

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

  /** The fields of one member of a union, picked by its discriminator, e.g. the "i-section" shape. */
  fieldsOf(path: string, discriminator: string, value: string): SchemaField[] | null {
    const member = this.#at(path).find((n) => n.properties?.[discriminator]?.const === value);
    if (!member?.properties) return null;
    return Object.entries(member.properties)
      .filter(([key]) => key !== discriminator)
      .map(([key, node]) => {
        const choices = (node.enum ?? []).map(String);
        const kind = choices.length ? "choice" : node.type === "number" || node.type === "integer" ? "number" : "text";
        return { key, kind, choices, required: member.required?.includes(key) ?? false };
      });
  }
}

const variants = (node: SchemaNode): SchemaNode[] => (node.oneOf ?? node.anyOf ?? [node]).flatMap((n) => (n.oneOf || n.anyOf ? variants(n) : [n]));
