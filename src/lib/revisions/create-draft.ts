import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { Revision, database } from '@/lib/db';
import type { WizardStep } from '@/lib/validation/scheme-schemas';
import { type DraftInputs, encodeDraft } from './draft-inputs';

export interface CreateDraftOptions {
  schemeId: string;
  authorId: string;
  inputs: DraftInputs;
  wizardStep: WizardStep;
  basedOn: Revision | null;
  /** Why the draft exists, for the history: "new scheme", "imported case file", "from revision 2". */
  origin: string;
  transaction: Transaction;
}

/** Adds the next revision of a scheme as a draft, inside the caller's transaction, with its audit event. */
export async function createDraft(options: CreateDraftOptions): Promise<Revision> {
  database();
  const { transaction } = options;
  const last = await Revision.max<number, Revision>('number', { where: { schemeId: options.schemeId }, transaction });
  const revision = await Revision.create(
    {
      id: randomUUID(),
      schemeId: options.schemeId,
      number: (last ?? 0) + 1,
      status: 'draft',
      wizardStep: options.wizardStep,
      inputsJson: encodeDraft(options.inputs),
      resultsJson: null,
      inputsSha256: null,
      resultsSha256: null,
      revisionSha256: null,
      engineVersion: null,
      authorId: options.authorId,
      checkerId: null,
      basedOnRevisionId: options.basedOn?.id ?? null,
      submittedAt: null,
      countersignedAt: null,
    },
    { transaction },
  );
  await recordAuditEvent(
    { actorId: options.authorId, action: 'revision.draft-created', entityType: 'revision', entityId: revision.id, schemeId: options.schemeId, details: { number: revision.number, origin: options.origin, basedOnRevision: options.basedOn?.number ?? null } },
    transaction,
  );
  return revision;
}
