// fontkit ships no types; Feltwire only parses a font with it, once, to hand to pdfkit.
declare module 'fontkit' {
  export interface Font {
    layout(text: string): unknown;
  }
  export function create(buffer: Buffer): Font;
}
