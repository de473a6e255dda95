import { StatusIcon } from '@/components/ui/status-icon';

/** The alarm shown above a frozen revision whose stored record no longer matches the SHA-256 values taken when it was frozen. */
export function IntegrityAlarm({ number, problems, className = '' }: { number: number; problems: string[]; className?: string }) {
  if (problems.length === 0) return null;
  return (
    <div role="alert" className={`rounded border-2 border-verdict-fail bg-white p-4 text-sm ${className}`}>
      <p className="text-base font-semibold text-verdict-fail">
        <StatusIcon name="fail" className="mr-1" />Revision {number} does not match its own frozen record.
      </p>
      <p className="mt-1">
        Its stored inputs or results were altered after it was frozen, so what this page shows cannot be relied on. It cannot be countersigned, and no
        certificate or letter may rest on it. Tell an administrator.
      </p>
      <ul className="mt-2 list-disc pl-5">
        {problems.map((p) => <li key={p}>{p}</li>)}
      </ul>
    </div>
  );
}
