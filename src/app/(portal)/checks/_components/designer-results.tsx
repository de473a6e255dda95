import type { ReactNode } from 'react';
import Link from 'next/link';
import { engineTextInWords } from '@/lib/case-words/case-issue-words';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { unitWords } from '@/lib/revisions/draft-inputs';
import { eventRouting } from '@/lib/routing-sheet/event-routing';
import { longSectionData, sectionOutline } from '@/lib/revisions/results-sheet';
import { stepTableAfflux, stepTableColumns } from '@/lib/revisions/step-table-csv';
import type { SheetRating } from '@/lib/revisions/rating-for-sheet';
import type { CaseInput } from '@/lib/validation/case-schema';
import { RatingChart } from '@/components/charts/rating-chart';
import { StatusIcon } from '@/components/ui/status-icon';
import { ProfileViews } from '../../schemes/[id]/results/profile-views';
import { RoutingSection } from '../../schemes/[id]/results/routing-section';
import { SensitivityTable } from '../../schemes/[id]/results/sensitivity-table';
import { StepTable } from '../../schemes/[id]/results/step-table';

type Props = {
  input: CaseInput;
  results: CaseResult;
  eventIndex: number;
  datum: string | null;
  /** The page's own address, to which `?event=` is added. */
  href: string;
  stepTableCsvHref: string;
  /** The structure's rating, worked out now by the engine from the frozen inputs (a rating is not stored). */
  rating?: SheetRating;
};

function Part({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="mb-8">
      <h3 id={id} className="mb-2 font-semibold">{title}</h3>
      {children}
    </section>
  );
}

/** The stored results as the designer saw them on the results sheet: long-section and cross-section, the routing of a routed event, warnings, sensitivity and step table. */
export function DesignerResults({ input, results, eventIndex, datum, href, stepTableCsvHref, rating }: Props) {
  const event = results.events[eventIndex];
  const routing = eventRouting(event);
  const u = unitWords(input.units).length;
  const caption = `${event.name}: stored water level with the scheme ${event.control.level.toFixed(3)} ${u} at the structure, falling back to the level without it by ${event.extent.distanceUpstream.toFixed(0)} ${u} upstream. ${event.limits.filter((l) => l.pass).length} of ${event.limits.length} limits met.`;
  return (
    <div data-testid="designer-results">
      {results.events.length > 1 ? (
        <nav aria-label="Events of the stored results" className="mb-4 flex flex-wrap gap-2 text-sm">
          {results.events.map((e, i) => (
            <Link key={e.name} href={`${href}?event=${i}`} scroll={false} aria-current={i === eventIndex ? 'page' : undefined} className={`rounded border px-3 py-1 ${i === eventIndex ? 'border-accent bg-accent-wash font-semibold' : 'border-paper-edge'}`}>
              {e.name} <StatusIcon name={e.verdict === 'pass' ? 'pass' : 'fail'} className="ml-1" /><span className="sr-only"> {e.verdict}</span>
            </Link>
          ))}
        </nav>
      ) : null}
      <Part id="h-stored-long-section" title={`Long-section and cross-section: ${event.name}`}>
        <ProfileViews data={longSectionData(input, event)} profile={event.profile} outline={sectionOutline(input)} lengthUnit={u} levelTitle={`Level (${u} ${datum ? `above ${datum}` : 'above the datum'})`} levelWords={datum ? `above ${datum}` : 'above the datum'} caption={caption} />
      </Part>
      {routing ? <RoutingSection event={event} routing={routing} caseUnits={input.units} units={unitWords(input.units)} datum={datum} csvHref={stepTableCsvHref.replace('/step-table?', '/routing-table?')} /> : null}
      {rating && rating.status !== 'none' ? (
        <Part id="h-stored-rating" title="Rating of the structure (worked out now by the engine)">
          {rating.status === 'rated' ? <RatingChart rating={rating.rating} lengthUnit={u} dischargeUnit={unitWords(input.units).discharge} levelWords={datum ? `above ${datum}` : 'above the datum'} /> : <p className="text-sm text-ink-soft">The rating could not be worked out: {rating.reason}</p>}
        </Part>
      ) : null}
      <Part id="h-stored-warnings" title={`Warnings (${results.warnings.length})`}>
        {results.warnings.length === 0 ? <p className="text-sm text-ink-soft">None.</p> : <ul className="space-y-1 text-sm">{results.warnings.map((w) => <li key={w}><StatusIcon name="caution" className="mr-1 text-verdict-caution" />{engineTextInWords(w, input)}</li>)}</ul>}
      </Part>
      <Part id="h-stored-sensitivity" title="Sensitivity">
        {results.sensitivity ? <SensitivityTable sensitivity={results.sensitivity} limits={input.limits.map((l) => l.label)} lengthUnit={u} /> : <p className="text-sm text-ink-soft">The designer did not ask for sensitivity runs.</p>}
      </Part>
      <Part id="h-stored-steps" title={`Step table: ${event.name}`}>
        <StepTable rows={event.profile} columns={stepTableColumns(input.units)} afflux={stepTableAfflux(event)} lengthUnit={u} csvHref={stepTableCsvHref} eventName={event.name} />
      </Part>
    </div>
  );
}
