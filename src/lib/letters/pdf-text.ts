import 'server-only';
import { pdfSafe } from '@/lib/pdf/fonts';

/** Text for the letter's embedded Latin-subset fonts: the shared replacements, then anything still outside the subset as "?". */
export function letterText(text: string): string {
  return pdfSafe(text).replace(/[^\n\u0020-\u017f\u2010-\u2027\u2030-\u203a\u20ac]/g, '?');
}
