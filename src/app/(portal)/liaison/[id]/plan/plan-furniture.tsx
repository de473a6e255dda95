import { distance } from '@/lib/parcels/format-quantity';
import type { PlanDrawing } from '@/lib/plan/plan-drawing';
import { PLAN_INK } from '@/lib/plan/plan-style';

/** Grid north is up: the plan is drawn in the projected system's own easting and northing. */
export function NorthArrow({ x, y }: { x: number; y: number }) {
  return (
    <g transform={`translate(${x},${y})`} aria-hidden="true">
      <path d="M0,-18 L7,8 L0,3 L-7,8 Z" fill={PLAN_INK.text} />
      <text y={22} textAnchor="middle" fontSize={12} fill={PLAN_INK.text}>N</text>
    </g>
  );
}

export function ScaleBar({ bar, x, y }: { bar: PlanDrawing['scaleBar']; x: number; y: number }) {
  const half = bar.length / 2;
  return (
    <g transform={`translate(${x},${y})`} aria-hidden="true">
      <rect width={half} height={5} fill={PLAN_INK.text} />
      <rect x={half} width={half} height={5} fill={PLAN_INK.paper} stroke={PLAN_INK.text} strokeWidth={0.8} />
      <text y={-4} fontSize={11} fill={PLAN_INK.text}>0</text>
      <text x={bar.length} y={-4} textAnchor="end" fontSize={11} fill={PLAN_INK.text}>{distance(bar.metres)}</text>
    </g>
  );
}
