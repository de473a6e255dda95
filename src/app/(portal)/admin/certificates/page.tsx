import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listCertificates } from '@/lib/certificates/list-certificates';
import { readQuery } from '@/lib/http/query-params';
import { certificateRegisterQuerySchema } from '@/lib/validation/certificate-schemas';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { UnreadableAddress } from '@/components/ui/unreadable-address';
import { portalTime } from '@/lib/dates/portal-time';
import { RevokeForm } from './revoke-form';

export const metadata: Metadata = { title: 'Revoke certificates' };

export default async function AdminCertificatesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageRole(['admin'], '/admin/certificates');
  const { page } = await searchParams;
  const read = readQuery(certificateRegisterQuerySchema, { page });
  if (!read.ok) return <UnreadableAddress issues={read.issues} plainHref="/admin/certificates" plainLabel="Open the first page" />;
  const query = read.data;
  const register = await listCertificates(query);
  return (
    <>
      <PageHeader eyebrow="Administration" title="Revoke certificates">Revoking withdraws a certificate for good: the verification page reports it as revoked, with your reason. It cannot be undone.</PageHeader>
      {register.certificates.length === 0 ? <EmptyState title="No certificate has been issued yet." /> : (
        <ul className="space-y-4">
          {register.certificates.map((c) => (
            <li key={c.id} className="grid gap-4 rounded border border-paper-edge bg-white/60 p-4 md:grid-cols-[1fr_1fr]">
              <div className="text-sm">
                <p className="flex items-center gap-2"><span className="num font-semibold">{c.number}</span><StatusLabel status={c.status} /></p>
                <p>{c.scheme ? `${c.scheme.reference} ${c.scheme.name}, revision ${c.revisionNumber}` : '—'}</p>
                <p className="text-ink-soft">Issued <span className="num">{portalTime(c.issuedAt)}</span> · <Link className="text-accent underline" href={`/verify?number=${c.number}`}>Verification page</Link></p>
              </div>
              {c.status === 'revoked' ? <p className="text-sm text-ink-soft">Revoked; nothing more to do.</p> : <RevokeForm certificateId={c.id} number={c.number} />}
            </li>
          ))}
        </ul>
      )}
      {register.pages > 1 ? <p className="mt-4 text-sm">Page <span className="num">{register.page}</span> of <span className="num">{register.pages}</span> · {query.page < register.pages ? <Link className="text-accent underline" href={`/admin/certificates?page=${query.page + 1}`}>Next →</Link> : null}</p> : null}
    </>
  );
}
