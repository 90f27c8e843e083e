import { fieldName } from "./field-names.js";

/** Lists of the job and what one item is called in the form. */
const items: Record<string, string> = {
  materials: "Material",
  parts: "Part",
  connectors: "Connector",
  "beam.loads": "Load",
  "beam.spans": "Span",
  "beam.supports": "Support",
  "beam.categories": "Load category",
  "fastening.joints": "Joint fastening",
  "fastening.default.provided.zones": "Zone",
  "fastening.default.provided.positions": "Row position",
  "compression.loads": "Axial load",
};

/** Fields and groups named by the form, not by their key. */
const places: Record<string, string> = {
  "(document)": "The job file",
  project: "Project",
  "project.name": "Project name",
  member: "Member",
  "member.mark": "Member mark",
  beam: "Spans, supports and loads",
  fastening: "Joints",
  "fastening.default": "Connector used at every joint",
  "fastening.default.connector": "Connector used at every joint",
  "fastening.default.rows": "Side by side in a row",
  spacing: "Spacing limits and module",
  combinations: "Load combinations",
  compositeAction: "Composite action",
  compression: "Column (axial compression)",
  "compression.x": "Buckling about x",
  "compression.y": "Buckling about y",
  "compression.spaced": "Spaced column",
  "compression.loads": "Axial loads",
  "compression.loads.category": "category",
  shape: "shape",
  strength: "strength",
  place: "placed against",
  extent: "runs along the member",
  w: "w",
  P: "P",
  at: "at",
};

/** Groups said even on the way to a field, since the field's name alone does not tell them apart. */
const saidGroups = new Set(["compression.x", "compression.y", "compression.spaced"]);

/**
 * A field path of the job ("parts[2].shape.b") in the form's own words ("Part 3 shape b"), for an issue
 * that no field of the form answers for.
 */
export function pathInWords(path: string): string {
  if (places[path]) return places[path]!;
  const words: string[] = [];
  let prefix = "";
  const pieces = path.split(".");
  for (const [n, piece] of pieces.entries()) {
    const m = /^([^[]+)((?:\[\d+\])*)$/.exec(piece);
    const key = m?.[1] ?? piece;
    prefix = prefix ? `${prefix}.${key}` : key;
    const indices = [...(m?.[2] ?? "").matchAll(/\[(\d+)\]/g)].map((x) => Number(x[1]) + 1);
    if (indices.length && items[prefix]) {
      words.push(`${items[prefix]} ${indices.join(".")}`);
      continue;
    }
    // A group on the way to the field ("beam", "fastening") is said by the field's own name.
    if (places[prefix] && n < pieces.length - 1 && !indices.length && !words.length && !saidGroups.has(prefix)) continue;
    words.push(places[prefix] ?? places[key] ?? fieldName(key).label);
    if (indices.length) words.push(indices.join("."));
  }
  const text = words.join(" ");
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A schema's message in the form's words: what to do, never "expected an object". */
export function plainMessage(message: string): string {
  const thing = (t: string) => ({ object: "filled in", array: "a list", boolean: "yes or no", string: "text", number: "a number" })[t] ?? t;
  const required = /^is required \(expected an? (\w+)\)$/.exec(message);
  if (required) return required[1] === "object" || required[1] === "array" ? "is missing: fill it in" : "is required";
  const wrong = /^must be an? (\w+), not (.*)$/.exec(message);
  if (wrong) return wrong[1] === "object" ? "is not filled in the way this field needs; choose or enter it again" : `must be ${thing(wrong[1]!)}, not ${wrong[2]}`;
  if (message === "does not match any of the accepted forms") return "is not one of the choices this field accepts; choose it again";
  // The service names some places by their key in the file; the form names them as it shows them.
  return message.replace("or define it in beam.categories", "or add it under Load categories of your own").replace("a spaced column (compression.spaced) needs", "a spaced column needs");
}
