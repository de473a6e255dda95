import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { evaluateCaseOffThread } from '@/lib/engine-pool/engine-pool';
import { InvalidRequestError, UnprocessableError } from '@/lib/http/app-errors';
import { caseIssuesInWords } from '@/lib/case-words/case-issue-words';
import { fieldIssuesFromZod } from '@/lib/http/zod-issues';
import { findEditableRevision } from '@/lib/schemes/scheme-access';
import { parseCase } from '@/lib/validation/parse-case';
import { type HeadPreviewRequest, structureStepSchema } from '@/lib/validation/scheme-schemas';
import { caseFileOf, decodeDraft } from './draft-inputs';
import { withSteps } from './step-of-field';

/**
 * The head over the crest and the control depth for each design flow, from the structure form's unsaved values
 * and the draft's saved channel and flows. The engine does the work; limits, sizing and sensitivity are left out,
 * and so are the case-wide warnings (about limits, banks and the profile), which belong to the results sheet.
 */
export async function previewHead({ request, user }: { request: HeadPreviewRequest; user: SessionUser }) {
  const { revision } = await findEditableRevision(user, request.revisionId);
  const draft = decodeDraft(revision.inputsJson);
  const structure = structureStepSchema(draft.units).safeParse({ control: request.control, existingControl: request.existingControl });
  if (!structure.success) throw new InvalidRequestError(caseIssuesInWords(fieldIssuesFromZod(structure.error), draft));
  const { sizing: _sizing, sensitivity: _sensitivity, existingControl: _existing, ...rest } = caseFileOf(draft);
  const parsed = parseCase({ ...rest, ...structure.data, limits: [] });
  if (!parsed.ok) throw new UnprocessableError('Save the channel and the design flows first: the head over the crest needs them.', withSteps(caseIssuesInWords(parsed.issues, draft)));
  const result = await evaluateCaseOffThread(parsed.value);
  return {
    units: result.units,
    events: result.events.map((e) => ({
      name: e.name,
      discharge: e.discharge,
      head: e.control.head,
      controlDepth: e.control.depth,
      controlLevel: e.control.level,
      structureDepth: e.control.structureDepth,
      criticalDepth: e.criticalDepth,
      normalDepth: e.normalDepthExists ? e.normalDepth : null,
      causesBackwater: e.control.causesBackwater,
      explanation: e.control.explanation,
      weir: e.control.weir,
    })),
  };
}
export type HeadPreview = Awaited<ReturnType<typeof previewHead>>;
