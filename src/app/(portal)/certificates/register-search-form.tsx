import type { FieldIssue } from '@/lib/http/app-errors';
import { CERTIFICATE_STATUSES, type CertificateRegisterQuery } from '@/lib/validation/certificate-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';

/** A plain GET form, so a search is a shareable address and works without JavaScript. */
export function RegisterSearchForm({ query, issues }: { query: CertificateRegisterQuery; issues: FieldIssue[] }) {
  const error = (path: string) => issues.find((i) => i.path === path)?.message;
  return (
    <form method="get" action="/certificates" role="search" aria-label="Search the certificate register" className="mb-6 grid gap-x-4 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_1fr_auto] lg:items-end">
      <input type="hidden" name="sort" value={query.sort} />
      <input type="hidden" name="direction" value={query.direction} />
      <FormField id="register-q" label="Scheme, site or number" error={error('q')}>
        <input id="register-q" name="q" type="search" defaultValue={query.q} placeholder="e.g. Harrowfield or SMC-2026" className={inputClassName} />
      </FormField>
      <FormField id="register-status" label="Status" error={error('status')}>
        <select id="register-status" name="status" defaultValue={query.status} className={inputClassName}>
          <option value="">Any status</option>
          {CERTIFICATE_STATUSES.map((s) => <option key={s} value={s}>{s}</option>)}
        </select>
      </FormField>
      <FormField id="register-from" label="Issued from" error={error('from')}>
        <input id="register-from" name="from" type="date" defaultValue={query.from} className={inputClassName} />
      </FormField>
      <FormField id="register-to" label="Issued to" error={error('to')}>
        <input id="register-to" name="to" type="date" defaultValue={query.to} className={inputClassName} />
      </FormField>
      <div className="mb-4"><button type="submit" className={buttonClassName}>Search</button></div>
    </form>
  );
}
