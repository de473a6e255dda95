import Link from 'next/link';
import { AUDIT_ACTIONS } from '@/lib/audit/audit-actions';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import type { FieldIssue } from '@/lib/http/app-errors';
import type { AuditFilterInput } from '@/lib/validation/audit-filter-schema';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';

interface Choices {
  people: { id: string; name: string; email: string }[];
  schemes: { id: string; reference: string; name: string }[];
}

const text = (value: unknown) => (typeof value === 'string' ? value : '');

/** A plain GET form, so a filtered trail is an address an investigator can keep, and it works without JavaScript. */
export function AuditFilterForm({ values, issues, choices }: { values: AuditFilterInput; issues: FieldIssue[]; choices: Choices }) {
  const error = (path: string) => issues.find((i) => i.path === path)?.message;
  // Days as the trail shows its times, in the portal's zone; the server turns them into the instants it queries.
  const zone = portalTimeZone();
  return (
    <form method="get" action="/admin/audit" role="search" aria-label="Filter the audit trail" className="mb-6 grid gap-x-4 sm:grid-cols-2 lg:grid-cols-3">
      <FormField id="audit-person" label="Person (who did it, or whom it was about)" error={error('person')}>
        <select id="audit-person" name="person" defaultValue={text(values.person)} className={inputClassName}>
          <option value="">Anyone</option>
          {choices.people.map((p) => <option key={p.id} value={p.id}>{p.name} ({p.email})</option>)}
        </select>
      </FormField>
      <FormField id="audit-action" label="What happened" error={error('action')}>
        <select id="audit-action" name="action" defaultValue={text(values.action)} className={inputClassName}>
          <option value="">Any kind of event</option>
          {Object.entries(AUDIT_ACTIONS).map(([code, label]) => <option key={code} value={code}>{label}</option>)}
        </select>
      </FormField>
      <FormField id="audit-scheme" label="Scheme" error={error('scheme')}>
        <select id="audit-scheme" name="scheme" defaultValue={text(values.scheme)} className={inputClassName}>
          <option value="">Any scheme, or none</option>
          {choices.schemes.map((s) => <option key={s.id} value={s.id}>{s.reference} {s.name}</option>)}
        </select>
      </FormField>
      <FormField id="audit-from" label={`From (day, ${zone} time)`} error={error('from')}>
        <input id="audit-from" name="from" type="date" defaultValue={text(values.from)} className={inputClassName} />
      </FormField>
      <FormField id="audit-to" label={`To (day, ${zone} time, included)`} error={error('to')}>
        <input id="audit-to" name="to" type="date" defaultValue={text(values.to)} className={inputClassName} />
      </FormField>
      <FormField id="audit-q" label="Search names, e-mail addresses and details" error={error('q')}>
        <input id="audit-q" name="q" type="search" defaultValue={text(values.q)} placeholder="e.g. Calloway or SMC-2026" className={inputClassName} />
      </FormField>
      {error('before') ? <p role="alert" className="mb-4 text-sm text-verdict-fail sm:col-span-2 lg:col-span-3"><StatusIcon name="fail" className="mr-1" />{error('before')}</p> : null}
      <div className="mb-4 flex items-center gap-4">
        <button type="submit" className={buttonClassName}>Filter</button>
        <Link href="/admin/audit" className="text-sm text-accent underline">Clear the filters</Link>
      </div>
    </form>
  );
}
