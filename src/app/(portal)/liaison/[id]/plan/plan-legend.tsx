import { PLAN_CATEGORY_STYLES, PLAN_INK, type PlanCategory } from '@/lib/plan/plan-style';
import { HatchPatterns, hatchId } from './plan-hatches';

const Swatch = ({ category }: { category: PlanCategory }) => (
  <svg width={22} height={14} aria-hidden="true" className="mr-1 inline-block align-middle">
    <HatchPatterns prefix={`legend-${category}`} size={6} />
    <rect x={0.5} y={0.5} width={21} height={13} fill={`url(#${hatchId(`legend-${category}`, category)})`} stroke={PLAN_CATEGORY_STYLES[category].stroke} />
  </svg>
);

const Line = ({ colour, width, dash }: { colour: string; width: number; dash?: string }) => (
  <svg width={22} height={14} aria-hidden="true" className="mr-1 inline-block align-middle">
    <line x1={1} y1={7} x2={21} y2={7} stroke={colour} strokeWidth={width} strokeDasharray={dash} strokeLinecap="round" />
  </svg>
);

/** The key to the plan, in words beside each colour, hatch and line. */
export function PlanLegend({ categories }: { categories: PlanCategory[] }) {
  return (
    <div className="text-xs text-ink-soft">
      <h3 className="mb-1 text-sm font-semibold text-ink">Key</h3>
      <ul className="grid gap-1">
        {categories.map((c) => <li key={c}><Swatch category={c} />{PLAN_CATEGORY_STYLES[c].words}</li>)}
        <li><Line colour={PLAN_INK.river} width={2} />River centreline, chainage from the structure</li>
        <li><Line colour={PLAN_INK.inundated} width={6} />Water above the bank with the scheme</li>
        <li><Line colour={PLAN_INK.extent} width={2} dash="5 3" />Extent of impact (rise at or above the threshold)</li>
        <li><svg width={22} height={14} aria-hidden="true" className="mr-1 inline-block align-middle"><rect x={7} y={3} width={8} height={8} fill={PLAN_INK.structure} /></svg>The structure (chainage 0 m)</li>
      </ul>
    </div>
  );
}
