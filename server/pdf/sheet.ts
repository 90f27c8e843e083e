import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import type { FontkitFont } from "fontkit";
import { fontEngine } from "./pdf-engine.js";

const require = createRequire(import.meta.url);
const fontFile = (name: string) => require.resolve(`dejavu-fonts-ttf/ttf/${name}.ttf`);

/** The worksheet's own look: graphite ink, teal rules, red only for what fails. */
export const ink = {
  text: "#22303c",
  faint: "#66727e",
  rule: "#167a7a",
  light: "#d9dee4",
  band: "#eef2f4",
  fail: "#b3261e",
  pass: "#2e7d4f",
} as const;

export const type = {
  body: 9,
  small: 7.5,
  table: 8.5,
  heading: 12,
  subheading: 10,
} as const;

export type FontName = "body" | "bold" | "cond" | "cond-bold" | "mono";

const FONT_FILES: Record<FontName, string> = {
  body: "DejaVuSans",
  bold: "DejaVuSans-Bold",
  cond: "DejaVuSansCondensed",
  "cond-bold": "DejaVuSansCondensed-Bold",
  mono: "DejaVuSansMono",
};

/**
 * The fonts, parsed once per process (thread) on first use and shared by every worksheet: parsing
 * them again for each document took about a fifth of a worksheet's time. pdfkit makes its own
 * subset of a shared font for each document, so documents do not affect each other.
 */
let parsedFonts: Map<FontName, FontkitFont> | undefined;

function fonts(): Map<FontName, FontkitFont> {
  parsedFonts ??= new Map(Object.entries(FONT_FILES).map(([name, file]) => [name as FontName, fontEngine().create(readFileSync(fontFile(file)))]));
  return parsedFonts;
}

export function registerFonts(doc: PDFKit.PDFDocument): void {
  for (const [name, font] of fonts()) {
    forgetGlyphs(font);
    // pdfkit takes a parsed fontkit font where its types list only files and buffers.
    doc.registerFont(name, font as unknown as Uint8Array);
  }
}

/**
 * Each document starts with none of the font's glyphs decoded. fontkit keeps a glyph with the characters
 * it was first decoded for, and pdfkit writes those into the document's text layer (the ToUnicode map
 * that copying, searching and text extraction read). Embedding a document's fonts decodes the parts of
 * composite glyphs with no characters, so a shared font gave the next worksheets drawn on the same
 * thread a text layer with characters missing ("10¹⁸" read back as "10 ⁸", "π²EI" as "π EI"), though
 * the glyphs on the page were right. Parsed tables stay shared; decoding the glyphs again costs a few
 * milliseconds a worksheet, where parsing the fonts again cost about 50.
 */
function forgetGlyphs(font: FontkitFont): void {
  const glyphs = font as unknown as { _glyphs?: Record<number, unknown> };
  if (typeof glyphs._glyphs !== "object" || glyphs._glyphs === null) throw new Error("fontkit no longer keeps its glyphs in _glyphs: see forgetGlyphs in server/pdf/sheet.ts");
  glyphs._glyphs = {};
}

/** Page size in points and the box the body flows in; the title block and footer sit outside it. */
export interface PageFrame {
  width: number;
  height: number;
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export const PAGE_SIZES = { si: { name: "A4", width: 595.28, height: 841.89 }, us: { name: "LETTER", width: 612, height: 792 } } as const;

const SIDE = 40;
const HEADER = 104;
const FOOTER = 74;

export function pageFrame(size: { width: number; height: number }): PageFrame {
  return { width: size.width, height: size.height, left: SIDE, right: size.width - SIDE, top: HEADER, bottom: size.height - FOOTER };
}

export interface TextStyle {
  font?: FontName;
  size?: number;
  colour?: string;
  /** Indent from the left edge of the body. */
  indent?: number;
  width?: number;
  align?: "left" | "right" | "center";
  lineGap?: number;
}

/**
 * A cursor down the body of the current page. Every block asks for its height first and moves to a
 * fresh page when it would not fit, so nothing is split and pdfkit never adds a page by itself.
 */
export class Sheet {
  y: number;

  constructor(
    readonly doc: PDFKit.PDFDocument,
    readonly frame: PageFrame,
  ) {
    this.y = frame.top;
  }

  get width(): number {
    return this.frame.right - this.frame.left;
  }

  get left(): number {
    return this.frame.left;
  }

  /** Height left on this page. */
  get room(): number {
    return this.frame.bottom - this.y;
  }

  get atTop(): boolean {
    return this.y <= this.frame.top + 0.5;
  }

  /**
   * Drawn at the top of every page this sheet adds while set (the field sheet's review band), so that a
   * block spilling onto a new page can never leave that page without it.
   */
  pageStart: (() => void) | null = null;

  newPage(): void {
    this.doc.addPage();
    this.y = this.frame.top;
    this.pageStart?.();
  }

  /**
   * Moves to a new page unless `height` fits on this one, together with a heading still waiting to
   * be set; then sets that heading. Every block calls this before it draws, so a heading always
   * lands on the page of the block that follows it.
   */
  ensure(height: number): void {
    const waiting = this.pending ? this.headingHeight(this.pending, false) : 0;
    if (height + waiting > this.room && !this.atTop) this.newPage();
    this.setPendingHeading();
  }

  gap(height: number): void {
    this.y = Math.min(this.y + height, this.frame.bottom);
  }

  use(style: TextStyle): this {
    this.doc.font(style.font ?? "body").fontSize(style.size ?? type.body).fillColor(style.colour ?? ink.text);
    return this;
  }

  textHeight(text: string, style: TextStyle = {}): number {
    this.use(style);
    return this.doc.heightOfString(text, { width: style.width ?? this.width - (style.indent ?? 0), lineGap: style.lineGap ?? 1 });
  }

  /** Writes text at (x, y) inside a box of the given width; never flows onto another page. */
  textAt(text: string, x: number, y: number, style: TextStyle & { width: number; height?: number }): void {
    this.use(style);
    const height = style.height ?? this.doc.heightOfString(text, { width: style.width, lineGap: style.lineGap ?? 1 }) + 2;
    this.doc.text(text, x, y, { width: style.width, height, lineGap: style.lineGap ?? 1, align: style.align ?? "left", ellipsis: true });
  }

  /** A paragraph in the body; moves to a new page first if it would not fit. */
  paragraph(text: string, style: TextStyle = {}, after = 4): void {
    const width = style.width ?? this.width - (style.indent ?? 0);
    const height = this.textHeight(text, { ...style, width });
    this.ensure(height);
    this.textAt(text, this.left + (style.indent ?? 0), this.y, { ...style, width });
    this.y += height + after;
  }

  /** A small faint note under a heading: how to read the block below it. */
  note(text: string, after = 3): void {
    this.paragraph(text, { size: 8, colour: ink.faint }, after);
  }

  /**
   * A heading, set when the next block is placed so that it stays with that block; `keep` asks for
   * that much room below it as well (for a heading over several blocks that read as one).
   */
  heading(text: string, level: 1 | 2 = 1, keep = 0): void {
    this.setPendingHeading();
    const heading = { text, level };
    if (keep > 0 && !this.atTop && this.headingHeight(heading, false) + keep > this.room) this.newPage();
    this.pending = heading;
  }

  private pending: { text: string; level: 1 | 2 } | null = null;

  private headingStyle(level: 1 | 2) {
    return { font: "bold" as const, size: level === 1 ? type.heading : type.subheading, width: this.width, colour: level === 1 ? ink.rule : ink.text };
  }

  private headingHeight(heading: { text: string; level: 1 | 2 }, atTop: boolean): number {
    const before = atTop ? 0 : heading.level === 1 ? 10 : 6;
    return before + this.textHeight(heading.text, this.headingStyle(heading.level)) + 1 + (heading.level === 1 ? 4 : 2);
  }

  private setPendingHeading(): void {
    const heading = this.pending;
    if (!heading) return;
    this.pending = null;
    const style = this.headingStyle(heading.level);
    if (!this.atTop) this.y += heading.level === 1 ? 10 : 6;
    const height = this.textHeight(heading.text, style);
    this.textAt(heading.text, this.left, this.y, style);
    this.y += height + 1;
    if (heading.level === 1) {
      this.doc.save().moveTo(this.left, this.y).lineTo(this.frame.right, this.y).lineWidth(0.8).strokeColor(ink.rule).stroke().restore();
      this.y += 4;
    } else {
      this.y += 2;
    }
  }

  /** A bulleted list, each item kept whole on a page. */
  list(items: string[], style: TextStyle = {}): void {
    const indent = (style.indent ?? 0) + 10;
    for (const item of items) {
      const height = this.textHeight(item, { ...style, indent });
      this.ensure(height);
      this.textAt("•", this.left + indent - 9, this.y, { ...style, width: 8 });
      this.textAt(item, this.left + indent, this.y, { ...style, width: this.width - indent });
      this.y += height + 2;
    }
    this.y += 2;
  }
}
