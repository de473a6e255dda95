import { UnprocessableError } from '@/lib/http/app-errors';

// What the bytes are, whatever the file is called: a name or a declared type proves nothing.
const SIGNATURES: { bytes: number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: 'a ZIP archive or a spreadsheet workbook (.xlsx): save the sheet as CSV first' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: 'an old-style Office document (.xls): save the sheet as CSV first' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF document' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG image' },
  { bytes: [0x1f, 0x8b], what: 'a gzip archive' },
];

function startsWith(bytes: Uint8Array, signature: number[]): boolean {
  return signature.every((b, i) => bytes[i] === b);
}

/** The text of an uploaded text file (UTF-8, BOM allowed); anything binary or mis-encoded is refused by name. */
export function textOfUpload(bytes: Uint8Array, expected: string): string {
  const field = 'file';
  const known = SIGNATURES.find((s) => startsWith(bytes, s.bytes));
  if (known) throw new UnprocessableError(`This file is ${known.what}, not ${expected}. Nothing was stored.`, [{ path: field, message: `is ${known.what}, not ${expected}` }]);
  if (bytes.includes(0)) throw new UnprocessableError(`This file is binary, not ${expected}. Nothing was stored.`, [{ path: field, message: `is binary, not ${expected}` }]);
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes).replace(/^\uFEFF/, '');
  } catch {
    throw new UnprocessableError(`This file is not UTF-8 text. Save it as CSV UTF-8 and upload it again. Nothing was stored.`, [{ path: field, message: 'is not UTF-8 text: save it as CSV UTF-8' }]);
  }
}
