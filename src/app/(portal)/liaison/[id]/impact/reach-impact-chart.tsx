'use client';

import type { ChartData, ChartOptions } from 'chart.js';
import { useState } from 'react';
import { Scatter } from 'react-chartjs-2';
import type { ReachLongSection } from '@/lib/parcels/reach-long-section';
import { CHART_COLOURS, CHART_FONT } from '@/components/charts/register-charts';

type Dataset = ChartData<'scatter'>['datasets'][number];
type Span = { reference: string; from: number; to: number; affected: boolean };

const line = (label: string, data: { x: number; y: number | null }[], colour: string, extra: Partial<Dataset> = {}): Dataset =>
  ({ label, data, showLine: true, borderColor: colour, backgroundColor: colour, borderWidth: 1.5, pointRadius: 0, fill: false, spanGaps: false, ...extra }) as Dataset;

/** The reach's long-section for one event, with each parcel's frontage marked along the bottom. */
export function ReachImpactChart({ sections, parcels }: { sections: ReachLongSection[]; parcels: Span[] }) {
  const [index, setIndex] = useState(sections.length - 1);
  const section = sections[index];
  const levels = section.points.flatMap((p) => [p.withScheme, p.withoutScheme, ...(p.bank === null ? [] : [p.bank])]);
  const low = Math.min(...levels);
  const high = Math.max(...levels);
  const pad = (high - low) * 0.08;
  // Frontages that touch would merge into one bar: neighbours along the reach alternate between two lanes.
  const lane = new Map([...parcels].sort((a, b) => a.from - b.from || a.to - b.to).map((p, i) => [p, i % 2]));
  const band = (affected: boolean) => parcels.filter((p) => p.affected === affected).flatMap((p) => {
    const y = low - pad * (lane.get(p) === 0 ? 0.35 : 0.75);
    return [{ x: p.from, y }, { x: p.to, y }, { x: p.to, y: null }];
  });
  const datasets: Dataset[] = [
    ...(section.points.every((p) => p.bank !== null) ? [line('Top of bank', section.points.map((p) => ({ x: p.distance, y: p.bank })), CHART_COLOURS.bank, { borderDash: [8, 3, 2, 3] })] : []),
    line('Water level without the scheme', section.points.map((p) => ({ x: p.distance, y: p.withoutScheme })), CHART_COLOURS.without, { borderDash: [6, 4] }),
    line('Water level with the scheme', section.points.map((p) => ({ x: p.distance, y: p.withScheme })), CHART_COLOURS.accent, { borderWidth: 3 }),
    line('Affected parcels (bar along the bottom)', band(true), CHART_COLOURS.fail, { borderWidth: 5, borderCapStyle: 'butt' }),
    line('Other parcels (dashed bar along the bottom)', band(false), CHART_COLOURS.soft, { borderWidth: 5, borderDash: [6, 3], borderCapStyle: 'butt' }),
  ];
  const options: ChartOptions<'scatter'> = {
    animation: false,
    maintainAspectRatio: false,
    plugins: { legend: { position: 'bottom', labels: { font: CHART_FONT, boxWidth: 28 } }, tooltip: { callbacks: { label: (c) => `${c.dataset.label}: ${c.parsed.y?.toFixed(2)} m at ${c.parsed.x?.toFixed(0)} m` } } },
    scales: {
      x: { type: 'linear', min: 0, title: { display: true, text: 'Distance upstream of the structure (m)', font: CHART_FONT } },
      y: { type: 'linear', suggestedMin: low - pad * 1.1, suggestedMax: high + pad, title: { display: true, text: 'Level (m above the datum)', font: CHART_FONT } },
    },
  };
  const caption = `Long-section for the flood "${section.event}": water level with and without the scheme along the reach, and the parcels' frontages along the bottom. The table below gives every number.`;
  return (
    <figure className="mb-8 rounded border border-paper-edge bg-white/70 p-3">
      <fieldset className="mb-2 flex flex-wrap gap-4 text-sm">
        <legend className="sr-only">Flood event shown</legend>
        {sections.map((s, i) => (
          <label key={s.event} className="flex items-center gap-1">
            <input type="radio" name="impact-event" checked={i === index} onChange={() => setIndex(i)} /> {s.event}
          </label>
        ))}
      </fieldset>
      <div style={{ height: 320 }}>
        <Scatter data={{ datasets }} options={options} role="img" aria-label={caption} />
      </div>
      <figcaption className="mt-2 text-sm text-ink-soft">{caption}</figcaption>
    </figure>
  );
}
