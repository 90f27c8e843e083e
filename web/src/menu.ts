import { el } from "./dom.js";

const menus = new Set<HTMLDetailsElement>();

// One menu open at a time; a click elsewhere or Escape closes it.
document.addEventListener("click", (event) => {
  for (const menu of menus) if (menu.open && !menu.contains(event.target as Node)) menu.open = false;
});
document.addEventListener("keydown", (event) => {
  if (event.key !== "Escape") return;
  for (const menu of menus) {
    if (!menu.open) continue;
    menu.open = false;
    menu.querySelector("summary")?.focus();
  }
});

/** A drop-down of actions or a small panel, opened from a button-like summary; keyboard reachable as a disclosure. */
export function menu(label: string, children: (HTMLElement | null)[], className = ""): HTMLDetailsElement {
  const details = el("details", { className: `menu ${className}`.trim() }, [el("summary", { text: label }), el("div", { className: "menu-body" }, children)]);
  details.addEventListener("toggle", () => {
    if (!details.open) return;
    for (const other of menus) if (other !== details) other.open = false;
    details.querySelector<HTMLElement>(".menu-body button, .menu-body input, .menu-body select")?.focus();
  });
  menus.add(details);
  return details;
}

/** An action inside a menu: runs, then closes the menu. */
export function menuItem(text: string, run: () => void, options: { hint?: string; disabled?: boolean } = {}): HTMLButtonElement {
  const button = el("button", { className: "menu-item", attrs: { type: "button", disabled: options.disabled } }, [el("span", { text }), options.hint ? el("span", { className: "menu-hint", text: options.hint }) : null]);
  button.addEventListener("click", () => {
    const details = button.closest("details");
    if (details) details.open = false;
    run();
  });
  return button;
}
