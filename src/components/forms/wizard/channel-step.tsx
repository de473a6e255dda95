'use client';

import { useState } from 'react';
import type { CaseUnits } from '@/lib/validation/case-schema';
import type { ChannelStepInput } from '@/lib/validation/scheme-schemas';
import { PrismaticChannelForm } from './prismatic-channel-form';
import { SurveyUpload } from './survey-upload';

type Props = {
  schemeId: string;
  revisionId: string;
  units: CaseUnits;
  reachKind: 'prismatic' | 'surveyed' | null;
  prismatic?: Partial<ChannelStepInput>;
  bankHeight?: number;
  survey: { originalName: string; sections: number } | null;
  backHref: string;
};

/** Step 2: a prismatic section entered by its dimensions, or surveyed cross-sections uploaded as CSV. */
export function ChannelStep({ schemeId, revisionId, units, reachKind, prismatic, bankHeight, survey, backHref }: Props) {
  const [kind, setKind] = useState<'prismatic' | 'surveyed'>(reachKind ?? 'prismatic');
  const length = units === 'US' ? 'ft' : 'm';
  return (
    <div>
      <fieldset className="mb-6">
        <legend className="text-sm font-semibold">How is the channel described?</legend>
        <div className="mt-2 flex flex-wrap gap-6 text-sm">
          <label className="flex items-center gap-2"><input type="radio" name="reach-kind" value="prismatic" checked={kind === 'prismatic'} onChange={() => setKind('prismatic')} /> A prismatic channel: one section shape, slope and n</label>
          <label className="flex items-center gap-2"><input type="radio" name="reach-kind" value="surveyed" checked={kind === 'surveyed'} onChange={() => setKind('surveyed')} /> Surveyed cross-sections from a CSV file</label>
        </div>
      </fieldset>
      {kind === 'prismatic' ? (
        <PrismaticChannelForm schemeId={schemeId} revisionId={revisionId} units={units} defaults={prismatic} bankHeight={bankHeight} backHref={backHref} />
      ) : (
        <SurveyUpload schemeId={schemeId} revisionId={revisionId} lengthUnit={length} current={survey} />
      )}
    </div>
  );
}
