import { distance, level } from '@/lib/parcels/format-quantity';
import type { ParcelStrip } from '@/lib/parcels/parcel-strip';

const W = 240;
const H = 72;
const PAD = { left: 4, right: 4, top: 6, bottom: 14 };

function path(points: [number, number][]): string {
  return points.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${x.toFixed(1)},${y.toFixed(1)}`).join(' ');
}

/** A small long-section of one parcel's stretch: distance upstream across, level up; the numbers are also given in words. */
export function ParcelStripSvg({ strip, reference }: { strip: ParcelStrip; reference: string }) {
  const levels = strip.points.flatMap((p) => [p.withScheme, p.withoutScheme, ...(p.ground === null ? [] : [p.ground])]);
  const lo = Math.min(...levels) - 0.05;
  const hi = Math.max(...levels) + 0.05;
  const d0 = strip.points[0].distance;
  const d1 = strip.points[strip.points.length - 1].distance;
  const x = (d: number) => PAD.left + ((d - d0) / (d1 - d0 || 1)) * (W - PAD.left - PAD.right);
  const y = (z: number) => PAD.top + (1 - (z - lo) / (hi - lo)) * (H - PAD.top - PAD.bottom);
  const inside = strip.points.filter((p) => p.distance >= strip.from && p.distance <= strip.to);
  const peakWith = Math.max(...inside.map((p) => p.withScheme));
  const peakWithout = Math.max(...inside.map((p) => p.withoutScheme));
  const ground = inside.find((p) => p.ground !== null)?.ground ?? null;
  const summary = `${reference}, flood ${strip.event}: from ${distance(strip.from)} to ${distance(strip.to)} upstream the water reaches ${level(peakWith)} with the scheme and ${level(peakWithout)} without it${ground === null ? '' : `; ground or bank level ${level(ground)}`}.`;
  return (
    <figure className="m-0">
      <svg viewBox={`0 0 ${W} ${H}`} width={W} height={H} aria-hidden="true" className="block max-w-full">
        <rect x={x(strip.from)} y={PAD.top} width={Math.max(1, x(strip.to) - x(strip.from))} height={H - PAD.top - PAD.bottom} className="fill-accent-wash" />
        <rect x={PAD.left} y={PAD.top} width={W - PAD.left - PAD.right} height={H - PAD.top - PAD.bottom} fill="none" className="stroke-paper-edge" />
        {strip.points.every((p) => p.ground !== null) ? <path d={path(strip.points.map((p) => [x(p.distance), y(p.ground as number)]))} fill="none" className="stroke-verdict-caution" strokeWidth={1.2} strokeDasharray="1.5 2" /> : null}
        <path d={path(strip.points.map((p) => [x(p.distance), y(p.withoutScheme)]))} fill="none" className="stroke-ink" strokeWidth={1} strokeDasharray="4 3" />
        <path d={path(strip.points.map((p) => [x(p.distance), y(p.withScheme)]))} fill="none" className="stroke-accent" strokeWidth={2} />
        <text x={PAD.left} y={H - 3} className="fill-ink-faint text-[8px]">{distance(d0)}</text>
        <text x={W - PAD.right} y={H - 3} textAnchor="end" className="fill-ink-faint text-[8px]">{distance(d1)}</text>
      </svg>
      <figcaption className="sr-only">{summary}</figcaption>
    </figure>
  );
}

export function StripLegend() {
  return (
    <p className="flex flex-wrap gap-x-5 gap-y-1 text-xs text-ink-soft">
      <span><span aria-hidden="true" className="mr-1 inline-block h-0.5 w-5 bg-accent align-middle" />With the scheme</span>
      <span><span aria-hidden="true" className="mr-1 inline-block w-5 border-t border-dashed border-ink align-middle" />Without the scheme</span>
      <span><span aria-hidden="true" className="mr-1 inline-block w-5 border-t-2 border-dotted border-verdict-caution align-middle" />Ground or bank level</span>
      <span><span aria-hidden="true" className="mr-1 inline-block h-3 w-5 bg-accent-wash align-middle" />The parcel</span>
    </p>
  );
}
