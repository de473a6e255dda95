import { portalTime } from '@/lib/dates/portal-time';
import { StatusIcon } from '@/components/ui/status-icon';

export interface RevocationView {
  certificateNumber: string;
  revisionNumber: number;
  revokedAt: string;
  reason: string;
}

/** A revoked certificate, said plainly wherever its revision's figures are read or letters are made from them. */
export function RevocationNotice({ revocations, className = '' }: { revocations: RevocationView[]; className?: string }) {
  if (revocations.length === 0) return null;
  return (
    <div className={`space-y-3 ${className}`}>
      {revocations.map((r) => (
        <section key={r.certificateNumber} aria-labelledby={`revoked-${r.certificateNumber}`} className="border-l-4 border-verdict-fail bg-paper-deep px-4 py-3 text-sm">
          <h2 id={`revoked-${r.certificateNumber}`} className="font-semibold text-verdict-fail">
            <StatusIcon name="fail" className="mr-1" />Certificate <span className="num">{r.certificateNumber}</span> of revision <span className="num">{r.revisionNumber}</span> is revoked
          </h2>
          <p className="mt-1">Revoked <span className="num">{portalTime(r.revokedAt)}</span>. Reason: {r.reason}</p>
          <p className="mt-1 text-ink-soft">Revision {r.revisionNumber} is no longer certified: do not rely on its figures. No letter can be made from it, and its letters that were waiting to be sent are held.</p>
        </section>
      ))}
    </div>
  );
}
