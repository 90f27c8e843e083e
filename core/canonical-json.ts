/** JSON with object keys sorted at every level and numbers as JSON prints them: the text a fingerprint is taken of. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) {
    let text = "[";
    for (let i = 0; i < value.length; i++) {
      if (i > 0) text += ",";
      // A hole is written as nothing, as Array.prototype.join writes it.
      if (i in value) text += value[i] === undefined ? "null" : canonicalJson(value[i]);
    }
    return text + "]";
  }
  const record = value as Record<string, unknown>;
  // Own keys are unique, so the default sort (by UTF-16 code units, as `<` compares) gives the one order.
  const keys = Object.keys(record).sort();
  let text = "{";
  let first = true;
  for (const k of keys) {
    const v = record[k];
    if (v === undefined) continue;
    text += `${first ? "" : ","}${keyText(k)}:${canonicalJson(v)}`;
    first = false;
  }
  return text + "}";
}

const keyTexts = new Map<string, string>();

/** A key as JSON writes it; the job's field names recur in every document, so each is written once. */
function keyText(key: string): string {
  let text = keyTexts.get(key);
  if (text === undefined) {
    text = JSON.stringify(key);
    if (keyTexts.size < 4096) keyTexts.set(key, text);
  }
  return text;
}
