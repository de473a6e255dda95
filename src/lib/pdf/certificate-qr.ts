import type PDFDocument from 'pdfkit';
import QRCode from 'qrcode';

type Doc = InstanceType<typeof PDFDocument>;

/** A QR code drawn as filled squares (vector, no bitmap), with the standard four-module quiet zone. */
export function drawQrCode(doc: Doc, text: string, x: number, y: number, size: number): void {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const count = modules.size + 8;
  const cell = size / count;
  doc.save().rect(x, y, size, size).fill('#ffffff').fillColor('#1f2a2e');
  for (let row = 0; row < modules.size; row++) {
    for (let col = 0; col < modules.size; col++) {
      if (modules.get(row, col)) doc.rect(x + (col + 4) * cell, y + (row + 4) * cell, cell + 0.05, cell + 0.05);
    }
  }
  doc.fill().restore();
}
