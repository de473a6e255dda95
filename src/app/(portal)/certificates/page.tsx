import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listCertificates } from '@/lib/certificates/list-certificates';
import { REGISTER_ROLES } from '@/lib/certificates/register-roles';
import { fieldIssuesFromZod } from '@/lib/http/zod-issues';
import { type CertificateRegisterQuery, certificateRegisterQuerySchema } from '@/lib/validation/certificate-schemas';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { portalTime } from '@/lib/dates/portal-time';
import { registerHref, sortHref } from './register-links';
import { RegisterSearchForm } from './register-search-form';

export const metadata: Metadata = { title: 'Certificate register' };

const COLUMNS: { sort: CertificateRegisterQuery['sort']; label: string }[] = [
  { sort: 'number', label: 'Number' },
  { sort: 'scheme', label: 'Scheme' },
  { sort: 'site', label: 'Watercourse and site' },
  { sort: 'issued', label: 'Issued' },
  { sort: 'status', label: 'Status' },
];

export default async function CertificatesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageRole(REGISTER_ROLES, '/certificates');
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = certificateRegisterQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : certificateRegisterQuerySchema.parse({});
  const issues = parsed.success ? [] : fieldIssuesFromZod(parsed.error);
  const register = await listCertificates(query);
  return (
    <>
      <PageHeader eyebrow="Register" title="Certificates">Every certificate issued, with its status now. Download the signed PDF, or verify a copy you were sent.</PageHeader>
      <RegisterSearchForm query={query} issues={issues} />
      <p className="mb-2 text-sm text-ink-soft" role="status"><span className="num">{register.total}</span> certificate(s) found{issues.length ? ' — the search above needs attention, so all certificates are shown' : ''}.</p>
      {register.certificates.length === 0 ? (
        <EmptyState title="No certificate matches this search." />
      ) : (
        <div role="region" aria-label="Certificates found" tabIndex={0} className="scroll-cue relative overflow-x-auto">
          <table className="w-full border-collapse text-sm">
            <caption className="sr-only">Certificates, sorted by {query.sort} ({query.direction === 'asc' ? 'ascending' : 'descending'})</caption>
            <thead>
              <tr className="border-b border-paper-edge text-left text-ink-soft">
                {COLUMNS.map((c) => (
                  <th key={c.sort} scope="col" className="py-2 pr-3" aria-sort={query.sort === c.sort ? (query.direction === 'asc' ? 'ascending' : 'descending') : 'none'}>
                    <Link href={sortHref(query, c.sort)} className="hover:text-accent hover:underline">
                      {c.label}
                      <span aria-hidden="true">{query.sort === c.sort ? (query.direction === 'asc' ? ' ▲' : ' ▼') : ''}</span>
                    </Link>
                  </th>
                ))}
                <th scope="col" className="py-2">Signed PDF</th>
              </tr>
            </thead>
            <tbody>
              {register.certificates.map((c) => (
                <tr key={c.id} className="border-b border-paper-edge">
                  <td className="num py-2 pr-3"><Link className="text-accent underline" href={`/verify?number=${c.number}`}>{c.number}</Link></td>
                  <td className="py-2 pr-3">{c.scheme ? `${c.scheme.reference} ${c.scheme.name}` : '—'} <span className="num text-ink-faint">rev. {c.revisionNumber}</span></td>
                  <td className="py-2 pr-3">{c.scheme ? `${c.scheme.watercourse} at ${c.scheme.site}` : '—'}</td>
                  <td className="num py-2 pr-3">{portalTime(c.issuedAt)}</td>
                  <td className="py-2 pr-3"><StatusLabel status={c.status} /></td>
                  <td className="py-2"><a className="text-accent underline" href={`/api/certificates/${c.id}/pdf`} download>Download {c.number}</a></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {register.pages > 1 ? (
        <nav aria-label="Pages of the register" className="mt-4 flex items-center gap-4 text-sm">
          {query.page > 1 ? <Link className="text-accent underline" href={registerHref(query, { page: query.page - 1 })}>← Previous</Link> : <span className="text-ink-faint">← Previous</span>}
          <span>Page <span className="num">{register.page}</span> of <span className="num">{register.pages}</span></span>
          {query.page < register.pages ? <Link className="text-accent underline" href={registerHref(query, { page: query.page + 1 })}>Next →</Link> : <span className="text-ink-faint">Next →</span>}
        </nav>
      ) : null}
    </>
  );
}
