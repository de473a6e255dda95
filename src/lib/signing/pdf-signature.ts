import 'server-only';

/** Where a signed PDF's signature sits and which bytes it says it covers. */
export interface PdfSignatureLocation {
  byteRange: [number, number, number, number];
  /** The DER bytes of the PKCS#7 signature, trailing zero padding removed. */
  signature: Buffer;
  /** The bytes the byte range covers, concatenated: what the signature's digest is over. */
  signedBytes: Buffer;
  /** True when the ranges start at byte 0, end at the last byte and leave out exactly the /Contents hex string. */
  coversWholeDocument: boolean;
}

/** The placeholder is zero-padded; the DER header of the outer SEQUENCE says where the signature really ends. */
function withoutPadding(der: Buffer): Buffer {
  if (der.length < 2 || der[0] !== 0x30) return der;
  if (der[1] < 0x80) return der.subarray(0, 2 + der[1]);
  const lengthBytes = der[1] & 0x7f;
  let length = 0;
  for (let i = 0; i < lengthBytes; i++) length = length * 256 + der[2 + i];
  return der.subarray(0, Math.min(der.length, 2 + lengthBytes + length));
}

const BYTE_RANGE = /\/ByteRange\s*\[\s*(\d+)\s+(\d+)\s+(\d+)\s+(\d+)\s*\]/g;

/** Reads the last signature of a PDF (the one an incremental update added last), or null when there is none. */
export function locatePdfSignature(pdf: Buffer): PdfSignatureLocation | null {
  const text = pdf.toString('latin1');
  const matches = [...text.matchAll(BYTE_RANGE)];
  const last = matches[matches.length - 1];
  if (!last) return null;
  const [a, b, c, d] = last.slice(1, 5).map(Number) as [number, number, number, number];
  if (a + b > pdf.length || c + d > pdf.length || b > c) return null;
  const hole = text.slice(a + b, c);
  const hex = /^<([0-9A-Fa-f]*)>$/.exec(hole);
  if (!hex) return null;
  const signature = withoutPadding(Buffer.from(hex[1], 'hex'));
  const signedBytes = Buffer.concat([pdf.subarray(a, a + b), pdf.subarray(c, c + d)]);
  return { byteRange: [a, b, c, d], signature, signedBytes, coversWholeDocument: a === 0 && c + d === pdf.length };
}
