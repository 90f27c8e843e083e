/**
 * Field paths in the job document, written the way the API reports issues: `parts[1].shape.h`.
 * The page reads and writes the document through these paths only, so a partly filled or partly
 * wrong document never breaks the form.
 */
export type PathKey = string | number;

export function parsePath(path: string): PathKey[] {
  const keys: PathKey[] = [];
  for (const match of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) {
    if (match[2] !== undefined) keys.push(Number(match[2]));
    else if (match[1] !== undefined) keys.push(match[1]);
  }
  return keys;
}

export function joinPath(keys: readonly PathKey[]): string {
  let out = "";
  for (const key of keys) out += typeof key === "number" ? `[${key}]` : out ? `.${key}` : key;
  return out;
}

/** The path one level up: `parts[1].shape.h` → `parts[1].shape`; "" at the top. */
export function parentPath(path: string): string {
  return joinPath(parsePath(path).slice(0, -1));
}

const isContainer = (v: unknown): v is Record<PathKey, unknown> => typeof v === "object" && v !== null;

export function readAt(document: unknown, path: string): unknown {
  let node: unknown = document;
  for (const key of parsePath(path)) {
    if (!isContainer(node)) return undefined;
    node = node[key];
  }
  return node;
}

/** The list at a path; empty when the document holds no list there. */
export function listAt(document: unknown, path: string): unknown[] {
  const value = readAt(document, path);
  return Array.isArray(value) ? value : [];
}

/** Sets a value, creating objects on the way; `undefined` removes the key (an optional field left empty). */
export function writeAt(document: Record<string, unknown>, path: string, value: unknown): void {
  const keys = parsePath(path);
  const last = keys.pop();
  if (last === undefined) return;
  let node: Record<PathKey, unknown> = document;
  keys.forEach((key, i) => {
    const next = node[key];
    if (!isContainer(next)) node[key] = typeof (keys[i + 1] ?? last) === "number" ? [] : {};
    node = node[key] as Record<PathKey, unknown>;
  });
  if (value === undefined) {
    // An emptied last item leaves the list shorter (so "needs at least one span" is reported, not "null");
    // an emptied item inside a list keeps its place.
    if (Array.isArray(node) && typeof last === "number") {
      if (last === node.length - 1) node.pop();
      else node[last] = undefined;
    } else delete node[last];
  } else node[last] = value;
}
