import type { ReactNode } from 'react';
import Link from 'next/link';
import { engineTextInWords } from '@/lib/case-words/case-issue-words';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { longSectionData, sectionOutline } from '@/lib/revisions/results-sheet';
import { eventRouting } from '@/lib/routing-sheet/event-routing';
import type { SheetRating } from '@/lib/revisions/rating-for-sheet';
import { stepTableAfflux, stepTableColumns } from '@/lib/revisions/step-table-csv';
import type { CaseInput } from '@/lib/validation/case-schema';
import type { Governing } from '@/lib/validation/scheme-schemas';
import { RatingChart } from '@/components/charts/rating-chart';
import { StatusIcon } from '@/components/ui/status-icon';
import { CrestSizingPanel } from './crest-sizing-panel';
import { EventFacts } from './event-facts';
import { ProfileViews } from './profile-views';
import { RoutingSection } from './routing-section';
import { SensitivityTable } from './sensitivity-table';
import { StepTable } from './step-table';
import { VerdictSummary } from './verdict-summary';

type Props = {
  scheme: { id: string; reference: string };
  revision: { id: string; number: number };
  input: CaseInput;
  result: CaseResult;
  eventIndex: number;
  governing: Governing;
  datum: string | null;
  units: { length: string; discharge: string };
  rating: SheetRating;
  editable: boolean;
};

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="mb-10">
      <h2 id={id} className="mb-3 text-lg font-semibold">{title}</h2>
      {children}
    </section>
  );
}

/** The results in the order a checker reads them: verdict, long-section, numbers, sizing, warnings, sensitivity, steps. */
export function ResultsSheet({ scheme, revision, input, result, eventIndex, governing, datum, units, rating, editable }: Props) {
  const event = result.events[eventIndex];
  const routing = eventRouting(event);
  const u = units.length;
  const levelWords = datum ? `above ${datum}` : 'above the datum';
  const levelTitle = `Level (${u} ${levelWords})`;
  const data = longSectionData(input, event);
  const base = `/schemes/${scheme.id}/results?revision=${revision.number}`;
  const caption = `${event.name}: water level with the scheme ${event.control.level.toFixed(3)} ${u} at the structure, falling back to the level without it by ${event.extent.distanceUpstream.toFixed(0)} ${u} upstream (extent of impact). ${event.limits.filter((l) => l.pass).length} of ${event.limits.length} limits met.`;
  const control = input.control.type === 'weir' ? input.control : null;
  return (
    <>
      <VerdictSummary result={result} lengthUnit={u} governingName={typeof governing === 'number' ? (result.events[governing]?.name ?? null) : null} />
      {result.events.length > 1 ? (
        <nav aria-label="Events" className="mb-4 flex flex-wrap gap-2 text-sm">
          {result.events.map((e, i) => (
            <Link key={e.name} href={`${base}&event=${i}`} aria-current={i === eventIndex ? 'page' : undefined} className={`rounded border px-3 py-1 ${i === eventIndex ? 'border-accent bg-accent-wash font-semibold' : 'border-paper-edge'}`}>
              {e.name} <StatusIcon name={e.verdict === 'pass' ? 'pass' : 'fail'} className="ml-1" /><span className="sr-only"> {e.verdict}</span>
            </Link>
          ))}
        </nav>
      ) : null}
      <Section id="long-section-heading" title={`Long-section: ${event.name}`}>
        <ProfileViews data={data} profile={event.profile} outline={sectionOutline(input)} lengthUnit={u} levelTitle={levelTitle} levelWords={levelWords} caption={caption} />
      </Section>
      <Section id="facts-heading" title={`Key numbers: ${event.name}`}>
        <EventFacts event={event} units={units} />
      </Section>
      {routing ? <RoutingSection event={event} routing={routing} caseUnits={input.units} units={units} datum={datum} csvHref={`/api/schemes/${scheme.id}/routing-table?revision=${revision.number}&event=${eventIndex}`} /> : null}
      {rating.status !== 'none' ? (
        <Section id="rating-heading" title="Rating of the structure">
          {rating.status === 'rated' ? <RatingChart rating={rating.rating} lengthUnit={u} dischargeUnit={units.discharge} levelWords={levelWords} /> : <p className="text-sm text-ink-soft">The rating could not be worked out: {rating.reason}</p>}
        </Section>
      ) : null}
      {result.sizing ? (
        <Section id="sizing-heading" title="Crest sizing">
          <CrestSizingPanel revisionId={revision.id} vary={result.sizing.vary} value={result.sizing.value} reason={result.sizing.reason} governing={result.sizing.governing ?? null} current={control ? (control[result.sizing.vary] ?? null) : null} lengthUnit={u} editable={editable} />
        </Section>
      ) : null}
      <Section id="warnings-heading" title={`Warnings (${result.warnings.length})`}>
        {result.warnings.length === 0 ? <p className="text-sm text-ink-soft">None.</p> : <ul className="space-y-1 text-sm">{result.warnings.map((w) => <li key={w}><StatusIcon name="caution" className="mr-1 text-verdict-caution" />{engineTextInWords(w, input)}</li>)}</ul>}
      </Section>
      {result.sensitivity ? (
        <Section id="sensitivity-heading" title="Sensitivity">
          <SensitivityTable sensitivity={result.sensitivity} limits={input.limits.map((l) => l.label)} lengthUnit={u} />
        </Section>
      ) : null}
      <Section id="steps-heading" title={`Step table: ${event.name}`}>
        <StepTable rows={event.profile} columns={stepTableColumns(input.units)} afflux={stepTableAfflux(event)} lengthUnit={u} csvHref={`/api/schemes/${scheme.id}/step-table?revision=${revision.number}&event=${eventIndex}`} eventName={event.name} />
      </Section>
      <p className="flex flex-wrap gap-6 text-sm">
        <a className="text-accent underline" href={`/api/schemes/${scheme.id}/calculation-sheet?revision=${revision.number}`} target="_blank" rel="noopener">Printable draft calculation sheet (PDF, marked DRAFT)</a>
        <a className="text-accent underline" href={`/api/schemes/${scheme.id}/case-file?revision=${revision.number}`} download>Download as a case file</a>
        <span className="text-ink-faint">Engine {result.engineVersion}</span>
      </p>
    </>
  );
}
