import 'server-only';
import { randomUUID } from 'node:crypto';
import { z } from 'zod';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { caseIssuesInWords } from '@/lib/case-words/case-issue-words';
import type { SessionUser } from '@/lib/auth/current-session';
import { Scheme } from '@/lib/db';
import { ForbiddenError, InvalidRequestError } from '@/lib/http/app-errors';
import { dottedPath } from '@/lib/http/zod-issues';
import { createDraft } from '@/lib/revisions/create-draft';
import type { DraftInputs } from '@/lib/revisions/draft-inputs';
import { withStoredUpload } from '@/lib/uploads/store-upload';
import { textOfUpload } from '@/lib/uploads/sniff-upload';
import { parseCaseText } from '@/lib/validation/parse-case';
import { multiLineText, singleLineText } from '@/lib/validation/plain-text';
import { EDITABLE_STEPS, governingSchema } from '@/lib/validation/scheme-schemas';
import { nextSchemeReference } from './create-scheme';

// The scheme block Sillmark writes beside the case when it exports one; optional, and ignored by the engine.
// When present it must be right: a block dropped in silence would start a scheme under the wrong name or site.
const schemeBlockSchema = z.object(
  {
    name: singleLineText('the scheme’s name').min(1, 'must not be empty (the scheme’s name)').max(200, 'must be at most 200 characters').optional(),
    watercourse: singleLineText('the river or stream').min(1, 'must not be empty (the river or stream)').max(200, 'must be at most 200 characters').optional(),
    site: singleLineText('where the structure is').min(1, 'must not be empty (where the structure is)').max(200, 'must be at most 200 characters').optional(),
    description: multiLineText('the description').max(2000, 'must be at most 2000 characters').optional(),
    datum: singleLineText('the level datum').max(120, 'must be at most 120 characters').optional(),
    governing: governingSchema.optional(),
  },
  { error: 'must be an object with the scheme’s name, watercourse, site, description, datum and governing event' },
);

const BLOCK_PROBLEM = 'The case file’s scheme block has problems; nothing was stored.';

function parseSchemeBlock(block: unknown, eventCount: number) {
  const parsed = schemeBlockSchema.safeParse(block ?? {});
  if (!parsed.success) throw new InvalidRequestError(parsed.error.issues.map((issue) => ({ path: dottedPath(['scheme', ...issue.path]), message: issue.message })), BLOCK_PROBLEM);
  const { governing } = parsed.data;
  if (typeof governing === 'number' && governing >= eventCount) {
    throw new InvalidRequestError([{ path: 'scheme.governing', message: `must be "all" or the number of one of the ${eventCount} events, from 0` }], BLOCK_PROBLEM);
  }
  return parsed.data;
}

/** The decoded file, for naming its events and limits in the messages; nothing when it is not JSON. */
function readableJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** Starts a scheme from an uploaded case file: checked whole first, so a bad file stores nothing. */
export async function importSchemeCase({ bytes, originalName, designer }: { bytes: Buffer; originalName: string; designer: SessionUser }) {
  if (designer.role !== 'designer') throw new ForbiddenError('Only designers create schemes.');
  const text = textOfUpload(bytes, 'a Sillmark case file (JSON)');
  const parsed = parseCaseText(text);
  if (!parsed.ok) throw new InvalidRequestError(caseIssuesInWords(parsed.issues, readableJson(text)), 'The case file has problems; nothing was stored.');
  const raw = JSON.parse(text) as { scheme?: unknown };
  const value = parsed.value;
  const block = parseSchemeBlock(raw.scheme, value.events.length);
  const name = block.name ?? value.title?.slice(0, 200) ?? originalName.replace(/\.json$/i, '');
  const reach = value.reach;
  const inputs: DraftInputs = {
    ...value,
    title: name,
    wizard: {
      datum: block.datum,
      site: reach.kind === 'prismatic' ? { bedLevelAtControl: reach.bedLevelAtControl, reachLength: reach.length } : {},
      governing: block.governing ?? 'all',
      completed: [...EDITABLE_STEPS],
    },
  };
  const schemeId = randomUUID();
  return withStoredUpload(bytes, { kind: 'case-json', originalName, mediaType: 'application/json', schemeId, uploadedBy: designer.id }, async (transaction, record) => {
    const scheme = await Scheme.create(
      { id: schemeId, reference: await nextSchemeReference(transaction), name, watercourse: block.watercourse ?? '(watercourse not given)', site: block.site ?? '(site not given)', description: block.description || null, designerId: designer.id },
      { transaction },
    );
    const upload = await record();
    await recordAuditEvent({ actorId: designer.id, action: 'scheme.imported', entityType: 'scheme', entityId: scheme.id, schemeId, details: { reference: scheme.reference, uploadId: upload.id, file: originalName, sha256: upload.sha256 } }, transaction);
    const revision = await createDraft({ schemeId, authorId: designer.id, inputs, wizardStep: 'results', basedOn: null, origin: `imported case file ${originalName}`, transaction });
    return { schemeId, reference: scheme.reference, revisionId: revision.id, revisionNumber: revision.number };
  });
}
