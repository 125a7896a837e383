/**
 * The one fontkit function process sheets use. fontkit is pdfkit's own font engine (installed with
 * pdfkit, no types of its own); parsing each font once per process and handing pdfkit the parsed
 * font (pdfkit 0.20 accepts any object with `layout`) saves re-parsing on every PDF.
 */
declare module 'fontkit' {
  export interface FontkitFont {
    layout(text: string, features?: unknown): unknown;
    readonly postscriptName: string;
  }
  export function create(buffer: Uint8Array, postscriptName?: string): FontkitFont;
}
