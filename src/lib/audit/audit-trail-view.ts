import 'server-only';
import { InvalidRequestError, type FieldIssue } from '@/lib/http/app-errors';
import type { AuditFilter } from '@/lib/validation/audit-filter-schema';
import { loadAuditDirectory } from './audit-directory';
import { type AuditTrailEntry, listAuditEvents } from './list-audit-events';
import { type RawQuery, parseAuditFilter } from './parse-audit-filter';
import { type ChainCheck, verifyAuditChain } from './verify-audit-chain';

export interface AuditTrailView {
  chain: ChainCheck;
  /** The alarm's headline naming the event where the chain breaks, or null while it is intact. */
  chainAlarm: string | null;
  /** The filter shown, or null when the query needs attention (then no events are shown, rather than all of them). */
  filter: AuditFilter | null;
  issues: FieldIssue[];
  entries: AuditTrailEntry[];
  olderBefore: number | null;
  people: { id: string; name: string; email: string }[];
  schemes: { id: string; reference: string; name: string }[];
}

export function chainAlarmText(chain: ChainCheck): string | null {
  return chain.intact ? null : `The audit trail has been tampered with: the chain breaks at event ${chain.firstBreak.number}.`;
}

/** Everything the audit trail page shows for a query: the chain check, the filter or its faults, and one page of events. */
export async function auditTrailView(raw: RawQuery): Promise<AuditTrailView> {
  const chain = await verifyAuditChain();
  const base = { chain, chainAlarm: chainAlarmText(chain) };
  const parsed = parseAuditFilter(raw);
  if (parsed.ok) {
    try {
      return { ...base, filter: parsed.filter, issues: [], ...(await listAuditEvents({ filter: parsed.filter })) };
    } catch (error) {
      if (!(error instanceof InvalidRequestError)) throw error;
      return { ...base, ...(await withoutEvents(error.issues)) };
    }
  }
  return { ...base, ...(await withoutEvents(parsed.issues)) };
}

async function withoutEvents(issues: FieldIssue[]) {
  const { people, schemes } = await loadAuditDirectory();
  return { filter: null, issues, entries: [], olderBefore: null, people, schemes };
}
