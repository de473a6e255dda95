import type { CertificateLookup } from '@/lib/certificates/lookup-certificate';
import { StatusLabel } from '@/components/ui/status-label';
import { LocalTime } from '@/components/ui/local-time';
import { StatusIcon } from '@/components/ui/status-icon';

const STATUS_WORDS = {
  issued: 'This certificate is current: it is the latest certificate of this scheme and has not been revoked.',
  superseded: 'This certificate is superseded: a later revision of the scheme has been certified. Rely on the later certificate.',
  revoked: 'This certificate is revoked and must not be relied on.',
} as const;

/** What a certificate number stands for, and whether it is current. */
export function CertificateStatusCard({ certificate }: { certificate: CertificateLookup }) {
  const current = certificate.status === 'issued';
  return (
    <article aria-label={`Certificate ${certificate.number}`} className={`rounded border-l-4 bg-white/70 p-4 ${current ? 'border-verdict-pass' : 'border-verdict-fail'}`}>
      <p className="flex flex-wrap items-center gap-2">
        <span className="num text-lg font-semibold">{certificate.number}</span>
        <StatusLabel status={certificate.status} />
      </p>
      <p role="status" className={`mt-1 font-semibold ${current ? 'text-verdict-pass' : 'text-verdict-fail'}`}>
        <StatusIcon name={current ? 'pass' : 'fail'} className="mr-1" />
        {STATUS_WORDS[certificate.status]}
        {certificate.status === 'superseded' && certificate.supersededBy ? ` Superseded by ${certificate.supersededBy}.` : ''}
      </p>
      {certificate.status === 'revoked' ? <p className="mt-1 text-sm">Revoked <LocalTime iso={certificate.revokedAt} />. Reason: {certificate.revocationReason}</p> : null}
      <dl className="mt-3 grid grid-cols-[11rem_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Scheme</dt><dd>{certificate.scheme ? `${certificate.scheme.reference} ${certificate.scheme.name}` : '—'}</dd>
        <dt className="text-ink-soft">Watercourse and site</dt><dd>{certificate.scheme ? `${certificate.scheme.watercourse} at ${certificate.scheme.site}` : '—'}</dd>
        <dt className="text-ink-soft">Revision</dt><dd className="num">{certificate.revision?.number ?? '—'}</dd>
        <dt className="text-ink-soft">Issued</dt><dd><LocalTime iso={certificate.issuedAt} /></dd>
        <dt className="text-ink-soft">SHA-256 of the revision</dt><dd className="num break-all text-xs">{certificate.revision?.revisionSha256 ?? '—'}</dd>
        <dt className="text-ink-soft">SHA-256 of the PDF</dt><dd className="num break-all text-xs">{certificate.pdfSha256}</dd>
      </dl>
    </article>
  );
}
