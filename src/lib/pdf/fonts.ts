import 'server-only';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { inflateSync } from 'node:zlib';
import type PDFDocument from 'pdfkit';

// The same IBM Plex files the web pages use (fonts/, SIL Open Font License), embedded so every PDF reads alike.
// They carry the latin subset only: write "alpha" and "<=" in words or ASCII, never Greek letters or ≤ ≥.
const FILES = {
  sans: 'IBMPlexSans-Regular.woff',
  sansItalic: 'IBMPlexSans-Italic.woff',
  sansSemiBold: 'IBMPlexSans-SemiBold.woff',
  mono: 'IBMPlexMono-Regular.woff',
  monoSemiBold: 'IBMPlexMono-SemiBold.woff',
} as const;

export type PdfFont = keyof typeof FILES;

/** Absolute path of one font file; resolved from the working directory, which is the project root for Next and the CLI. */
export function pdfFontPath(font: PdfFont): string {
  return path.resolve(/*turbopackIgnore: true*/ process.cwd(), 'fonts', FILES[font]);
}

/**
 * WOFF 1.0 unpacked to the plain TrueType/OpenType file it wraps (W3C WOFF File Format 1.0, 2012, §4–§5).
 * fontkit fails on the empty glyphs (space, no-break space) of the Plex Mono WOFF files, but reads the same
 * font as SFNT, so pdfkit is given the unpacked bytes.
 */
function sfntOfWoff(woff: Buffer): Buffer {
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = 44 + i * 20;
    const offset = woff.readUInt32BE(at + 4);
    const compressed = woff.readUInt32BE(at + 8);
    const original = woff.readUInt32BE(at + 12);
    const raw = woff.subarray(offset, offset + compressed);
    return { tag: woff.readUInt32BE(at), checksum: woff.readUInt32BE(at + 16), data: compressed < original ? inflateSync(raw) : raw };
  });
  let searchRange = 1;
  let entrySelector = 0;
  while (searchRange * 2 <= numTables) {
    searchRange *= 2;
    entrySelector++;
  }
  const padded = (n: number) => (n + 3) & ~3;
  const headerLength = 12 + 16 * numTables;
  const out = Buffer.alloc(tables.reduce((total, t) => total + padded(t.data.length), headerLength));
  out.writeUInt32BE(woff.readUInt32BE(4), 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange * 16, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange * 16, 10);
  let offset = headerLength;
  tables.forEach((t, i) => {
    out.writeUInt32BE(t.tag, 12 + i * 16);
    out.writeUInt32BE(t.checksum, 16 + i * 16);
    out.writeUInt32BE(offset, 20 + i * 16);
    out.writeUInt32BE(t.data.length, 24 + i * 16);
    t.data.copy(out, offset);
    offset += padded(t.data.length);
  });
  return out;
}

const loaded = new Map<PdfFont, Buffer>();

/** The font's bytes as pdfkit should embed them (read and unpacked once per process). */
export function pdfFontBytes(font: PdfFont): Buffer {
  let bytes = loaded.get(font);
  if (!bytes) {
    bytes = sfntOfWoff(readFileSync(pdfFontPath(font)));
    loaded.set(font, bytes);
  }
  return bytes;
}

/** Registers every font under its short name (doc.font('mono')) and makes the sans face current. */
export function registerPdfFonts(doc: InstanceType<typeof PDFDocument>): void {
  for (const font of Object.keys(FILES) as PdfFont[]) doc.registerFont(font, pdfFontBytes(font));
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
