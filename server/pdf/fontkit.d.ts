// The one call of fontkit (pdfkit's own font engine) that the worksheet makes: parse a font file once.
declare module "fontkit" {
  /** A parsed font; pdfkit takes it in place of a file and makes its own subset for each document. */
  export interface FontkitFont {
    layout(text: string, ...rest: unknown[]): unknown;
  }
  export function create(buffer: Uint8Array, postscriptName?: string): FontkitFont;
}
