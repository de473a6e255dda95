import { distance, metres } from '@/lib/parcels/format-quantity';
import type { PlanParcelFigures } from '@/lib/plan/parcel-plan-view';
import { PLAN_CATEGORY_STYLES } from '@/lib/plan/plan-style';

export const hectares = (m2: number) => `${(m2 / 10_000).toLocaleString('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 2 })} ha`;
const span = (s: { from: number; to: number } | null) => (s ? `${distance(s.from)} – ${distance(s.to)}` : 'not known');
const length = (m: number | null) => (m === null ? 'not known' : m === 0 ? 'dry' : distance(m));

/** The figures of one parcel, shown when it is chosen on the plan or in the list. */
export function ParcelFigures({ parcel, event }: { parcel: PlanParcelFigures; event: string }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
      <dt className="text-ink-soft">Parcel</dt>
      <dd className="num font-semibold">{parcel.reference}{parcel.ownerName ? <span className="block font-sans font-normal">{parcel.ownerName}</span> : null}</dd>
      <dt className="text-ink-soft">Impact</dt>
      <dd>{PLAN_CATEGORY_STYLES[parcel.category].words}</dd>
      <dt className="text-ink-soft">Area of the outline</dt>
      <dd className="num">{hectares(parcel.areaM2)}</dd>
      <dt className="text-ink-soft">Along the river (outline)</dt>
      <dd className="num">{span(parcel.outlineChainage)}</dd>
      <dt className="text-ink-soft">Frontage (register)</dt>
      <dd className="num">{span(parcel.frontage)}</dd>
      <dt className="text-ink-soft">Greatest rise, {event}</dt>
      <dd className="num">{parcel.maxAffluxM === null ? 'not assessed' : metres(parcel.maxAffluxM, 3)}</dd>
      <dt className="text-ink-soft">Under water, without → with</dt>
      <dd className="num">{length(parcel.inundatedWithoutM)} → {length(parcel.inundatedWithM)}</dd>
    </dl>
  );
}
