/** Small DOM builder: text goes in as text nodes, never as HTML. */
type Child = Node | string | number | null | undefined | false;

export interface ElementProps {
  className?: string;
  text?: string;
  attrs?: Record<string, string | number | boolean | undefined>;
  on?: Partial<Record<keyof HTMLElementEventMap, (event: Event) => void>>;
}

export function el<K extends keyof HTMLElementTagNameMap>(tag: K, props: ElementProps = {}, children: Child[] = []): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  if (props.className) node.className = props.className;
  if (props.text !== undefined) node.textContent = props.text;
  for (const [name, value] of Object.entries(props.attrs ?? {})) {
    if (value === undefined || value === false) continue;
    node.setAttribute(name, value === true ? "" : String(value));
  }
  for (const [type, handler] of Object.entries(props.on ?? {})) if (handler) node.addEventListener(type, handler);
  for (const child of children) {
    if (child === null || child === undefined || child === false) continue;
    node.append(typeof child === "number" ? String(child) : child);
  }
  return node;
}

/** Unique ids for label/description wiring. */
let counter = 0;
export const nextId = (prefix: string) => `${prefix}-${++counter}`;
