import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { changedFieldLabel } from '@/lib/case-words/step-field-words';
import { AuditEvent, Revision, User, database } from '@/lib/db';
import { readableRevisionWhere } from '@/lib/schemes/revision-visibility';

export interface HistoryEntry {
  at: string;
  actor: string;
  action: string;
  /** Plain words for what happened, with the fields that changed. */
  summary: string;
}

export interface RevisionHistory {
  id: string;
  number: number;
  status: Revision['status'];
  wizardStep: string | null;
  author: string;
  basedOnNumber: number | null;
  createdAt: string;
  updatedAt: string;
  entries: HistoryEntry[];
}

const STEP_WORDS: Record<string, string> = { scheme: 'the scheme', channel: 'the channel', flows: 'the design flows', structure: 'the structure', reservoir: 'the reservoir and inflow', limits: 'the thresholds and limits' };

function summary(event: AuditEvent, caseFile: unknown): string {
  const d = JSON.parse(event.detailsJson) as { step?: string; changed?: string[]; origin?: string; verdict?: string; file?: string; field?: string; from?: number; to?: number; rowCount?: number };
  switch (event.action) {
    case 'revision.draft-created':
      return `Draft started (${d.origin ?? 'new'})`;
    case 'revision.step-saved':
      return `Saved ${STEP_WORDS[d.step ?? ''] ?? d.step}: ${(d.changed ?? []).map((path) => changedFieldLabel(path, caseFile)).join('; ') || 'no change'}`;
    case 'revision.survey-attached':
      return `Surveyed cross-sections uploaded from ${d.file ?? 'a CSV file'} (${d.rowCount ?? '?'} points)`;
    case 'revision.evaluated':
      return `Evaluated: ${d.verdict ?? ''}`;
    case 'revision.crest-adopted':
      return `Adopted the sized crest: ${d.field ? changedFieldLabel(d.field, caseFile) : 'the sized dimension'} ${d.from} → ${d.to}`;
    default:
      return event.action;
  }
}

function inputsOf(json: string): unknown {
  try {
    return JSON.parse(json);
  } catch {
    return undefined;
  }
}

/** Every revision of a scheme this user may read, newest first, each with who did what and when. */
export async function listRevisionHistory(schemeId: string, user: Pick<SessionUser, 'role'>): Promise<RevisionHistory[]> {
  database();
  const revisions = await Revision.findAll({ where: { schemeId, ...readableRevisionWhere(user) }, order: [['number', 'DESC']] });
  const events = await AuditEvent.findAll({ where: { schemeId, entityType: 'revision', entityId: revisions.map((r) => r.id) }, order: [['id', 'ASC']] });
  const people = new Map((await User.findAll({ where: { id: [...new Set([...revisions.map((r) => r.authorId), ...events.map((e) => e.actorId ?? '')])] }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));
  const numbers = new Map(revisions.map((r) => [r.id, r.number]));
  return revisions.map((r) => ({
    id: r.id,
    number: r.number,
    status: r.status,
    wizardStep: r.wizardStep,
    author: people.get(r.authorId) ?? 'unknown',
    basedOnNumber: r.basedOnRevisionId ? (numbers.get(r.basedOnRevisionId) ?? null) : null,
    createdAt: r.createdAt,
    updatedAt: r.updatedAt,
    entries: events.filter((e) => e.entityId === r.id).map((e) => ({ at: e.at, actor: e.actorId ? (people.get(e.actorId) ?? 'unknown') : 'Sillmark', action: e.action, summary: summary(e, inputsOf(r.inputsJson)) })),
  }));
}
