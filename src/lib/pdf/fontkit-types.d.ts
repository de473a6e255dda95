// The little of fontkit (pdfkit's own font engine) that src/lib/pdf uses; the package ships no typings.
declare module 'fontkit' {
  export interface Font {
    layout(text: string): unknown;
    createSubset(): unknown;
  }
  export function create(buffer: Uint8Array, postscriptName?: string): Font;
}
