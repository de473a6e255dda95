import { utcDateTime } from './certificate-text';

/** Where the revision stands, as its calculation sheet states it: one state, and the certificate when there is one. */
export type SheetStatus =
  | { kind: 'draft' }
  | { kind: 'submitted'; submittedAt: string | null; checker: string | null }
  | { kind: 'returned'; checker: string | null }
  | { kind: 'withdrawn' }
  | { kind: 'countersigned'; countersignedAt: string | null; checker: string | null; certificate: string | null }
  | { kind: 'superseded'; certificate: string; supersededBy: string | null }
  | { kind: 'revoked'; certificate: string; revokedAt: string | null; reason: string | null };

export interface SheetStatusWords {
  /** The status line under the title. */
  line: string;
  /** The large word across every page; null for the sheet of a current certificate. */
  watermark: string | null;
  /** What the sheet is and is not, for the caution paragraph. */
  standing: string;
  /** The footer's name for the sheet. */
  footer: string;
}

const at = (iso: string | null) => (iso ? ` on ${utcDateTime(iso)}` : '');
const by = (name: string | null) => (name ? ` by ${name}` : '');
const NOT_A_CERTIFICATE = 'This sheet is not a certificate.';

export function sheetStatusWords(status: SheetStatus, revision: number): SheetStatusWords {
  const sheet = (state: string) => `Calculation sheet, revision ${revision}, ${state}`;
  switch (status.kind) {
    case 'draft':
      return { line: 'Draft: not yet submitted for check.', watermark: 'DRAFT', standing: `A draft, open to change. ${NOT_A_CERTIFICATE}`, footer: sheet('DRAFT') };
    case 'submitted':
      return { line: `Submitted for check${at(status.submittedAt)}${status.checker ? `, awaiting ${status.checker}` : ''}.`, watermark: 'FOR CHECK', standing: `Frozen and awaiting an independent check. ${NOT_A_CERTIFICATE}`, footer: sheet('FOR CHECK') };
    case 'returned':
      return { line: `Returned${by(status.checker)} for changes.`, watermark: 'RETURNED', standing: `Returned by the checker, open to change. ${NOT_A_CERTIFICATE}`, footer: sheet('RETURNED') };
    case 'withdrawn':
      return { line: 'Withdrawn by its designer.', watermark: 'WITHDRAWN', standing: `Withdrawn; it will not be checked. ${NOT_A_CERTIFICATE}`, footer: sheet('WITHDRAWN') };
    case 'countersigned': {
      const certified = status.certificate ? `; certified by certificate ${status.certificate}` : '';
      return {
        line: `Countersigned${by(status.checker)}${at(status.countersignedAt)}${certified}.`,
        watermark: null,
        standing: status.certificate ? `The working of the revision certified by certificate ${status.certificate}; the signed certificate is the record.` : 'The working of a countersigned revision.',
        footer: status.certificate ? sheet(`certificate ${status.certificate}`) : sheet('countersigned'),
      };
    }
    case 'superseded':
      return {
        line: `Countersigned; its certificate ${status.certificate} is superseded${status.supersededBy ? ` by certificate ${status.supersededBy}` : ''}.`,
        watermark: 'SUPERSEDED',
        standing: `The working of certificate ${status.certificate}, which is superseded and no longer current.`,
        footer: sheet(`SUPERSEDED certificate ${status.certificate}`),
      };
    case 'revoked':
      return {
        line: `Countersigned; its certificate ${status.certificate} was revoked${at(status.revokedAt)}${status.reason ? `: ${status.reason}` : ''}.`,
        watermark: 'REVOKED',
        standing: `The working of certificate ${status.certificate}, which is revoked and certifies nothing.`,
        footer: sheet(`REVOKED certificate ${status.certificate}`),
      };
  }
}
