'use client';

import { type ReactNode, useState } from 'react';
import type { PlanParcelFigures } from '@/lib/plan/parcel-plan-view';
import type { PlanDrawing } from '@/lib/plan/plan-drawing';
import { PLAN_CATEGORY_STYLES, PLAN_INK } from '@/lib/plan/plan-style';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { ParcelFigures, hectares } from './parcel-figures';
import { NorthArrow, ScaleBar } from './plan-furniture';
import { HatchPatterns, hatchId } from './plan-hatches';

/** The plan with its parcels to choose (click, or Tab and Enter), the chosen parcel's figures, and the same parcels as a list. */
export function PlanMap({ drawing, parcels, event, label, children }: { drawing: PlanDrawing; parcels: PlanParcelFigures[]; event: string; label: string; children: ReactNode }) {
  const [chosen, setChosen] = useState<string | null>(null);
  const selected = parcels.find((p) => p.reference === chosen) ?? null;
  const choose = (reference: string) => setChosen((c) => (c === reference ? null : reference));
  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(16rem,1fr)]">
      <figure className="m-0 min-w-0">
        <svg viewBox={`0 0 ${drawing.width} ${drawing.height}`} role="group" aria-label={label} className="block h-auto w-full rounded border border-paper-edge" style={{ background: PLAN_INK.paper }}>
          <HatchPatterns prefix="plan" />
          {drawing.parcels.map((p) => (
            <path
              key={p.reference}
              d={p.path}
              role="button"
              tabIndex={0}
              aria-label={`${p.reference}: ${PLAN_CATEGORY_STYLES[p.category].words}`}
              aria-pressed={chosen === p.reference}
              data-category={p.category}
              fill={`url(#${hatchId('plan', p.category)})`}
              fillRule="evenodd"
              stroke={PLAN_CATEGORY_STYLES[p.category].stroke}
              strokeWidth={chosen === p.reference ? 3 : 1}
              className="cursor-pointer outline-none focus-visible:stroke-[4]"
              onClick={() => choose(p.reference)}
              onKeyDown={(e) => {
                if (e.key === 'Enter' || e.key === ' ') {
                  e.preventDefault();
                  choose(p.reference);
                }
              }}
            />
          ))}
          <g aria-hidden="true" pointerEvents="none">
            {drawing.inundated.map((d, i) => <path key={i} d={d} fill="none" stroke={PLAN_INK.inundated} strokeOpacity={0.45} strokeWidth={9} strokeLinecap="round" />)}
            <path d={drawing.river} fill="none" stroke={PLAN_INK.river} strokeWidth={2} />
            {drawing.extent ? <path d={drawing.extent} fill="none" stroke={PLAN_INK.extent} strokeWidth={2} strokeDasharray="6 4" transform="translate(0,-5)" /> : null}
            {drawing.structure ? <rect x={drawing.structure[0] - 5} y={drawing.structure[1] - 5} width={10} height={10} fill={PLAN_INK.structure} /> : null}
            {drawing.parcels.map((p) => <text key={p.reference} x={p.labelAt[0]} y={p.labelAt[1]} textAnchor="middle" dominantBaseline="middle" fontSize={11} fill={PLAN_INK.text} className="num">{p.reference}</text>)}
            <NorthArrow x={drawing.width - 30} y={36} />
            <ScaleBar bar={drawing.scaleBar} x={24} y={drawing.height - 18} />
          </g>
        </svg>
        <figcaption className="mt-1 text-xs text-ink-soft">Choose a parcel on the plan (click it, or Tab to it and press Enter) or in the list to see its figures.</figcaption>
        <div className="mt-4">{children}</div>
      </figure>
      <div className="min-w-0">
        <section aria-live="polite" aria-label="The chosen parcel" className="mb-4 rounded border border-paper-edge p-3">
          {selected ? <ParcelFigures parcel={selected} event={event} /> : <p className="text-sm text-ink-soft">No parcel chosen.</p>}
        </section>
        <ScrollRegion label="Parcels on the plan">
          <table className="w-full border-collapse text-sm">
            <caption className="mb-1 text-left text-sm font-semibold">Parcels on the plan</caption>
            <thead>
              <tr className="border-b border-paper-edge text-left text-ink-soft">
                <th scope="col" className="py-1 pr-2">Parcel</th>
                <th scope="col" className="py-1 pr-2">Impact</th>
                <th scope="col" className="py-1 text-right">Area</th>
              </tr>
            </thead>
            <tbody>
              {parcels.map((p) => (
                <tr key={p.reference} className="border-b border-paper-edge" data-testid={`plan-parcel-${p.reference}`} data-category={p.category}>
                  <th scope="row" className="py-1 pr-2 text-left font-normal">
                    <button type="button" className="num text-accent underline" aria-pressed={chosen === p.reference} onClick={() => choose(p.reference)}>{p.reference}</button>
                  </th>
                  <td className="py-1 pr-2">{PLAN_CATEGORY_STYLES[p.category].words}{p.inRegister ? null : <span className="block text-xs text-verdict-fail">not in the current register</span>}</td>
                  <td className="num py-1 text-right whitespace-nowrap">{hectares(p.areaM2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      </div>
    </div>
  );
}
