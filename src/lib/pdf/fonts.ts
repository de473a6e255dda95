import 'server-only';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import * as fontkit from 'fontkit';
import type PDFDocument from 'pdfkit';

// The same IBM Plex files the web pages use (fonts/, SIL Open Font License), embedded so every PDF reads alike.
// They carry the latin subset only: write "alpha" and "<=" in words or ASCII, never Greek letters or ≤ ≥.
const FILES = {
  sans: 'IBMPlexSans-Regular.ttf',
  sansItalic: 'IBMPlexSans-Italic.ttf',
  sansSemiBold: 'IBMPlexSans-SemiBold.ttf',
  mono: 'IBMPlexMono-Regular.ttf',
  monoSemiBold: 'IBMPlexMono-SemiBold.ttf',
} as const;

export type PdfFont = keyof typeof FILES;

/** Absolute path of one font file; resolved from the working directory, which is the project root for Next and the CLI. */
export function pdfFontPath(font: PdfFont): string {
  return path.resolve(/*turbopackIgnore: true*/ process.cwd(), 'fonts', FILES[font]);
}

const loaded = new Map<PdfFont, Buffer>();

/** The font's bytes (read once per process). */
export function pdfFontBytes(font: PdfFont): Buffer {
  let bytes = loaded.get(font);
  if (!bytes) {
    bytes = readFileSync(pdfFontPath(font));
    loaded.set(font, bytes);
  }
  return bytes;
}

// pdfkit parses a font given as bytes again for every document, which was most of the time a letter took to make;
// given fontkit's parsed font, each document only subsets it. The parsed font holds no per-document state.
const parsed = new Map<PdfFont, fontkit.Font>();

function parsedFont(font: PdfFont): fontkit.Font {
  let face = parsed.get(font);
  if (!face) {
    face = fontkit.create(pdfFontBytes(font));
    parsed.set(font, face);
  }
  return face;
}

/** Registers every font under its short name (doc.font('mono')) and makes the sans face current. */
export function registerPdfFonts(doc: InstanceType<typeof PDFDocument>): void {
  // pdfkit's typings know only paths and bytes, but it takes a fontkit font as well (PDFFontFactory.open).
  for (const font of Object.keys(FILES) as PdfFont[]) doc.registerFont(font, parsedFont(font) as unknown as Buffer);
  doc.font('sans');
}

const REPLACEMENTS: [RegExp, string][] = [
  [/≤/g, '<='],
  [/≥/g, '>='],
  [/→/g, '->'],
  [/←/g, '<-'],
  [/α/g, 'alpha'],
  [/β/g, 'beta'],
  [/Δ/g, 'delta '],
  [/√/g, 'sqrt'],
  [/[✔✓]/g, 'pass'],
  [/[✖✗]/g, 'fail'],
  [/⚠/g, '!'],
];
const SUBSCRIPTS = '₀₁₂₃₄₅₆₇₈₉';

/** Text the embedded latin fonts can draw: engine messages may carry subscripts, Greek letters or ≤, which become ASCII words. */
export function pdfSafe(text: string): string {
  let out = text.replace(/[₀-₉]/g, (c) => String(SUBSCRIPTS.indexOf(c)));
  for (const [pattern, replacement] of REPLACEMENTS) out = out.replace(pattern, replacement);
  return out;
}
