import type { DesignResult } from "../../../core/schema/result.js";
import { builderDimensions } from "../../../core/draw/builder-dimensions.js";
import { formatNumber, formatRatio } from "../../../core/units/format.js";
import { el } from "../dom.js";

/** A number with its unit from the result's unit labels; "—" when there is no number. */
export function shown(result: Pick<DesignResult, "unitLabels">, value: number | null | undefined, kind: string, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const unit = result.unitLabels[kind];
  return unit ? `${formatNumber(value, digits)} ${unit}` : formatNumber(value, digits);
}

/** From–to along the member, e.g. "0.7 – 1.4 m". */
export const range = (result: Pick<DesignResult, "unitLabels">, from: number, to: number) => `${formatNumber(from)} – ${formatNumber(to)} ${result.unitLabels.span ?? ""}`.trim();

/** In US units a position along the member also in feet and inches, with the field sheet's formatter (builderDimensions). */
const tapeOf = (result: Pick<DesignResult, "units">) => (result.units === "us" ? builderDimensions("us") : null);

/** Feet and inches of a position along the member in US units ("6'-6""); null in SI. */
export const tapeAt = (result: Pick<DesignResult, "units">, x: number): string | null => tapeOf(result)?.position(x) ?? null;

/** A position along the member in words: "x = 7.875 ft (7'-10 1/2")" in US units, "x = 2.4 m" in SI. */
export function along(result: Pick<DesignResult, "unitLabels" | "units">, x: number): string {
  const tape = tapeOf(result);
  return `${shown(result, x, "span")}${tape ? ` (${tape.position(x)})` : ""}`;
}

/** A table cell of a position (or a from–to) along the member: the decimal in the column's unit, and in US units feet and inches under it. */
export function alongCell(result: Pick<DesignResult, "unitLabels" | "units">, from: number, to?: number): string | HTMLElement {
  const tape = tapeOf(result);
  const decimal = to === undefined ? formatNumber(from) : `${formatNumber(from)} – ${formatNumber(to)}`;
  if (!tape) return decimal;
  return el("span", {}, [decimal, el("span", { className: "sub", text: to === undefined ? tape.position(from) : `${tape.position(from)} – ${tape.position(to)}` })]);
}

/** Utilisation as a figure with a small bar; over 1 the bar is full and red. */
export function utilisation(value: number, passes: boolean): HTMLElement {
  const fill = el("span", { className: "ubar-fill" });
  fill.style.width = `${Math.max(0, Math.min(1, Number.isFinite(value) ? value : 1)) * 100}%`;
  return el("span", { className: `utilisation${passes ? "" : " fails"}` }, [
    el("span", { className: "ubar", attrs: { "aria-hidden": "true" } }, [fill]),
    el("span", { className: "ubar-value", text: formatRatio(value) }),
  ]);
}


/** A simple table from header cells and rows of cells. */
export function table(caption: string, headers: (string | Node)[], rows: { cells: (string | Node)[]; className?: string }[], options: { numeric?: number[]; className?: string; captionHidden?: boolean } = {}): HTMLElement {
  const numeric = new Set(options.numeric ?? []);
  return el("div", { className: "table-scroll" }, [
    el("table", { className: `results-table ${options.className ?? ""}`.trim() }, [
      el("caption", { text: caption, className: options.captionHidden ? "visually-hidden" : "" }),
      el("thead", {}, [el("tr", {}, headers.map((h, i) => el("th", { className: numeric.has(i) ? "num" : "", attrs: { scope: "col" } }, [h])))]),
      el(
        "tbody",
        {},
        rows.map((row) => el("tr", { className: row.className ?? "" }, row.cells.map((c, i) => el("td", { className: numeric.has(i) ? "num" : "" }, [c])))),
      ),
    ]),
  ]);
}

/** A column header with its unit under it. */
export const header = (text: string, unit?: string) => (unit ? el("span", {}, [text, el("span", { className: "unit", text: unit })]) : text);
