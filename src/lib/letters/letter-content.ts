import type { ParcelFlooding } from '@/lib/hydraulics/impact/parcel-impact';
import { discharge, distance, metres } from '@/lib/parcels/format-quantity';
import type { LetterImpact } from './letter-impact';

type LetterEvent = LetterImpact['events'][number];

function floodingSentence(e: LetterEvent, groundLevel: number | null): string {
  const against = e.floodingJudgedBy === 'ground-level' ? `the lowest ground level of your land (${metres(groundLevel ?? 0)} above datum)` : 'the top of the river bank';
  const w = e.withScheme as ParcelFlooding | null;
  const wo = e.withoutScheme as ParcelFlooding | null;
  if (!w || !wo) return 'We have no ground or bank level for your land, so we cannot say whether it would be under water.';
  if (w.inundatedLength === 0 && wo.inundatedLength === 0) return `With and without the scheme the water would stay below ${against}.`;
  const without = wo.inundatedLength === 0 ? 'none of your river frontage would be under water' : `${distance(wo.inundatedLength)} of your river frontage would be under water, up to ${metres(wo.maxDepth)} deep`;
  const withScheme = w.inundatedLength === 0 ? 'none would be' : `${distance(w.inundatedLength)} would be, up to ${metres(w.maxDepth)} deep`;
  return `Judged against ${against}: without the scheme ${without}; with the scheme ${withScheme}.`;
}

/** One paragraph per flood event, in plain words with the engine's numbers and their units. */
export function eventParagraph(e: LetterEvent, impact: LetterImpact): string {
  const flood = `In the flood "${e.event}" (a river flow of ${discharge(e.dischargeM3s)})`;
  if (e.category === 'outside-reach') return `${flood}, your land lies upstream of the stretch of river we calculated, so we have no figures for it.`;
  const partial = e.assessed && e.assessed.to < impact.parcel.distanceToM ? ` Our calculation covers your land only as far as ${distance(e.assessed.to)} upstream of the structure.` : '';
  if (e.category === 'not-affected') return `${flood}, the scheme would not change the river level beside your land. ${floodingSentence(e, impact.parcel.groundLevelM)}${partial}`;
  const rise =
    e.category === 'below-threshold'
      ? `${flood}, the scheme would raise the river level beside your land by at most ${metres(e.maxAfflux, 3)}, less than the ${metres(impact.impactThresholdM, 2)} we count as an impact.`
      : `${flood}, the scheme would raise the river level beside your land by up to ${metres(e.maxAfflux)}, greatest at ${distance(e.maxAffluxAt)} upstream of the structure. ` +
        `The rise is ${metres(e.affluxAtFrom)} at the downstream end of your land (${distance(impact.parcel.distanceFromM)}) and ${metres(e.affluxAtTo)} at its upstream end (${distance(e.assessed?.to ?? impact.parcel.distanceToM)}).`;
  return `${rise} ${floodingSentence(e, impact.parcel.groundLevelM)}${partial}`;
}

export function cautionText(impact: LetterImpact): string {
  return (
    `These figures are estimates, calculated by ${impact.methods.join(', ')} from the information entered for the scheme (calculation engine version ${impact.engineVersion}). ` +
    'They support, and never replace, the judgement of a licensed engineer and the local codes and regulations that apply. Actual flood levels depend on conditions no calculation can foresee.'
  );
}

/** The short text of the e-mail that carries the letter as a PDF. */
export function emailText({ ownerName, subject, impact, preliminary, organisation }: { ownerName: string; subject: string; impact: LetterImpact; preliminary: boolean; organisation?: string }): string {
  const governing = impact.events[impact.governingEvent];
  return [
    `Dear ${ownerName},`,
    '',
    `Please find attached our letter "${subject}"${preliminary ? ' (PRELIMINARY: the figures are from a design that has not yet been independently checked and may change)' : ''}.`,
    governing ? `In short: ${eventParagraph(governing, impact)}` : '',
    '',
    cautionText(impact),
    '',
    impact.certificate ? `The design was checked independently and certified: certificate ${impact.certificate.number}. You can check that it is genuine and still in force at ${impact.certificate.verificationUrl}\n` : '',
    'The attached letter explains how to respond. You can reply to this e-mail.',
    organisation ? `\n${organisation}` : '',
  ].join('\n');
}
