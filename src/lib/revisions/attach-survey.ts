import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { findEditableRevision } from '@/lib/schemes/scheme-access';
import { withStoredUpload } from '@/lib/uploads/store-upload';
import { textOfUpload } from '@/lib/uploads/sniff-upload';
import { type SurveyCsvIssue, type SurveySection, parseSurveyCsv } from '@/lib/validation/survey-csv';
import { applySurvey } from './apply-wizard-step';
import { decodeDraft, encodeDraft } from './draft-inputs';

export function surveyIssues(issues: SurveyCsvIssue[]) {
  return new InvalidRequestError(
    issues.map((i) => ({ path: i.line > 0 ? `line ${i.line}` : 'file', message: i.message })),
    `The survey has ${issues.length} problem${issues.length === 1 ? '' : 's'}; nothing was stored.`,
  );
}

/** Checks a survey CSV for the draft's units without storing anything: the upload preview. */
export async function previewSurvey({ revisionId, bytes, user }: { revisionId: string; bytes: Buffer; user: SessionUser }): Promise<{ sections: SurveySection[]; rowCount: number; units: 'SI' | 'US' }> {
  const { revision } = await findEditableRevision(user, revisionId);
  const units = decodeDraft(revision.inputsJson).units;
  const parsed = parseSurveyCsv(textOfUpload(bytes, 'a survey CSV file'), units);
  if (!parsed.ok) throw surveyIssues(parsed.issues);
  return { sections: parsed.sections, rowCount: parsed.rowCount, units };
}

/** Stores the survey file and makes its cross-sections the draft's reach, in one transaction. */
export async function attachSurvey({ revisionId, bytes, originalName, user }: { revisionId: string; bytes: Buffer; originalName: string; user: SessionUser }) {
  const { scheme, revision } = await findEditableRevision(user, revisionId);
  const parsed = parseSurveyCsv(textOfUpload(bytes, 'a survey CSV file'), decodeDraft(revision.inputsJson).units);
  if (!parsed.ok) throw surveyIssues(parsed.issues);
  return withStoredUpload(bytes, { kind: 'survey-csv', originalName, mediaType: 'text/csv', schemeId: scheme.id, uploadedBy: user.id }, async (transaction, record) => {
    const { revision: current } = await findEditableRevision(user, revisionId, transaction);
    const upload = await record();
    const draft = applySurvey(decodeDraft(current.inputsJson), parsed.sections, { uploadId: upload.id, originalName, rowCount: parsed.rowCount });
    await current.update({ inputsJson: encodeDraft(draft), resultsJson: null, engineVersion: null, wizardStep: 'flows', updatedAt: new Date().toISOString() }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'revision.survey-attached', entityType: 'revision', entityId: current.id, schemeId: scheme.id, details: { number: current.number, uploadId: upload.id, file: originalName, sha256: upload.sha256, sections: parsed.sections.length, rowCount: parsed.rowCount } }, transaction);
    return { revisionId: current.id, uploadId: upload.id, sections: parsed.sections.length, rowCount: parsed.rowCount };
  });
}
