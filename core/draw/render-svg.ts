import type { Drawing } from "./drawing.js";

const escape = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

/** The drawing as a standalone SVG string. */
export function renderSvg(drawing: Drawing): string {
  const body = drawing.items
    .map((item) => {
      const role = item.role ? ` data-role="${escape(item.role)}"` : "";
      if (item.type === "path") {
        const attrs = [
          `d="${item.d}"`,
          `fill="${item.fill ?? "none"}"`,
          `stroke="${item.stroke ?? "none"}"`,
          item.strokeWidth !== undefined ? `stroke-width="${item.strokeWidth}"` : "",
          item.dash ? `stroke-dasharray="${item.dash.join(" ")}"` : "",
          item.opacity !== undefined ? `opacity="${item.opacity}"` : "",
        ].filter(Boolean);
        return `<path ${attrs.join(" ")}${role}/>`;
      }
      const anchor = item.anchor === "start" ? "" : ` text-anchor="${item.anchor}"`;
      const weight = item.bold ? ` font-weight="bold"` : "";
      return `<text x="${item.x.toFixed(1)}" y="${item.y.toFixed(1)}" font-size="${item.size}" fill="${item.fill ?? "#22303c"}"${anchor}${weight}${role}>${escape(item.text)}</text>`;
    })
    .join("");
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${drawing.width} ${drawing.height}" width="${drawing.width}" height="${drawing.height}" role="img" aria-label="${escape(drawing.title)}" font-family="DejaVu Sans, Verdana, sans-serif"><title>${escape(drawing.title)}</title>${body}</svg>`;
}
