import type { Metadata } from 'next';
import { z } from 'zod';
import { numberFromOneQuery, readQuery } from '@/lib/http/query-params';
import { discharge, distance } from '@/lib/parcels/format-quantity';
import { parcelPlanView } from '@/lib/plan/parcel-plan-view';
import type { PlanCategory } from '@/lib/plan/plan-style';
import { MAX_PLAN_FILE_BYTES } from '@/lib/validation/input-limits';
import { CautionNote } from '@/components/ui/caution-note';
import { EmptyState } from '@/components/ui/empty-state';
import { buttonClassName, inputClassName } from '@/components/ui/form-field';
import { UnreadableAddress } from '@/components/ui/unreadable-address';
import { orNotFound, requireLiaisonPage } from '../../_components/scheme-page-access';
import { PlanFormats } from './plan-formats';
import { PlanLegend } from './plan-legend';
import { PlanMap } from './plan-map';
import { PlanUploadForm } from './plan-upload-form';

export const metadata: Metadata = { title: 'Plan of the parcels' };

const planQuery = z.object({ event: numberFromOneQuery('the flood event').optional() });

export default async function PlanPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  const { user, access } = await requireLiaisonPage(id, `/liaison/${id}/plan`);
  const read = readQuery(planQuery, await searchParams);
  if (!read.ok) return <UnreadableAddress issues={read.issues} plainHref={`/liaison/${id}/plan`} plainLabel="Open the plan" />;
  const view = await orNotFound(() => parcelPlanView({ user, schemeId: id, event: read.data.event, width: 960 }));
  const eventName = view.events[view.event - 1]?.name ?? 'no event';
  const categories = [...new Set(view.parcels.map((p) => p.category))] as PlanCategory[];
  return (
    <>
      {view.plan && view.drawing ? (
        <>
          <div className="mb-4 flex flex-wrap items-end justify-between gap-4">
            <p className="max-w-3xl text-sm text-ink-soft">
              Plan version <span className="num">{view.plan.version}</span> from {view.plan.originalName}, in {view.plan.coordinateSystem}; grid north is up.
              {view.revision ? <> Impact from revision <span className="num">{view.revision.number}</span> ({view.revision.status}{view.revision.preliminary ? ', preliminary' : ''}); each parcel shows its worst category over all events. The river marks show {eventName}: water above the bank along <span className="num">{distance(view.inundatedLengthM)}</span>{view.extentToM !== null ? <>, a rise of <span className="num">{view.impactThresholdM.toFixed(3)} m</span> or more as far as <span className="num">{distance(view.extentToM)}</span> upstream</> : ', no rise at or above the threshold'}.</> : ' No revision yet, so no impact is shown.'}
            </p>
            {view.events.length > 1 ? (
              <form method="get" className="flex items-end gap-2">
                <div>
                  <label htmlFor="plan-event" className="block text-sm font-semibold">Flood event on the river</label>
                  <select id="plan-event" name="event" defaultValue={String(view.event)} className={inputClassName}>
                    {view.events.map((e, i) => <option key={e.name} value={i + 1}>{e.name} ({discharge(e.dischargeM3s)})</option>)}
                  </select>
                </div>
                <button type="submit" className={buttonClassName}>Show</button>
              </form>
            ) : null}
          </div>
          <PlanMap drawing={view.drawing} parcels={view.parcels} event={eventName} label={`Plan of the parcels, ${view.parcels.length} outlines, coloured by impact`}>
            <PlanLegend categories={categories.length ? categories : ['not-computed']} />
            {view.withoutOutline.length ? <p className="mt-3 text-sm text-ink-soft">Parcels of the register without an outline (shown in the register and impact table only): <span className="num">{view.withoutOutline.join(', ')}</span>.</p> : null}
          </PlanMap>
        </>
      ) : (
        <EmptyState title="No plan of the parcels yet.">{access === 'manage' ? 'Upload their outlines below to see where they are.' : 'A landowner liaison officer uploads the outlines.'} The register and the impact table work without one.</EmptyState>
      )}
      {access === 'manage' ? (
        <section className="mt-10 grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(14rem,2fr)]">
          <div>
            <h2 className="mb-3 text-lg font-semibold">{view.plan ? 'Upload a new plan' : 'Upload the plan'}</h2>
            <PlanUploadForm schemeId={id} limitBytes={MAX_PLAN_FILE_BYTES} />
          </div>
          <PlanFormats />
        </section>
      ) : null}
      <CautionNote className="mt-8" />
    </>
  );
}
