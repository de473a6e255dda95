'use client';

import type { ChartData, ChartOptions } from 'chart.js';
import { Scatter } from 'react-chartjs-2';
import type { XY } from '@/lib/revisions/results-sheet';
import { ChartNumbers } from './chart-numbers';
import { CHART_COLOURS, CHART_FONT, axisTitleLines } from './register-charts';
import { isWet, withWaterEdges } from './wetted-stations';

export interface CrossSectionProps {
  /** Ground (or pipe invert) left to right. */
  ground: XY[];
  /** Pipe crown, for a circular section. */
  cover?: XY[] | null;
  waterLevel?: number | null;
  bankStations?: [number, number] | null;
  lengthUnit: string;
  /** What the y axis measures, e.g. "Level (m above the datum)" or "Height above the bed (m)". */
  yTitle: string;
  /** One sentence for screen readers, and shown as the figure's caption. */
  caption: string;
  height?: number;
}

// The water is a level line sampled at the ground's own stations, with the water's edges added, and filled only where
// it lies above the ground, so wet and dry stretches come out right without computing any area here.
export function CrossSectionChart({ ground: surveyed, cover = null, waterLevel = null, bankStations = null, lengthUnit, yTitle, caption, height = 220 }: CrossSectionProps) {
  const stationed = waterLevel === null ? { points: surveyed, added: surveyed.map(() => false) } : withWaterEdges(surveyed, waterLevel);
  const ground = stationed.points;
  const levels = [...ground, ...(cover ?? [])].map((p) => p.y);
  const top = Math.max(...levels, waterLevel ?? -Infinity);
  const bottom = Math.min(...levels);
  const coverAt = (x: number) => (cover ? Math.min(...cover.filter((c) => Math.abs(c.x - x) < 1e-9).map((c) => c.y), Infinity) : Infinity);
  const datasets: ChartData<'scatter'>['datasets'] = [
    { label: 'Ground', data: ground, showLine: true, borderColor: CHART_COLOURS.bed, backgroundColor: CHART_COLOURS.bedFill, borderWidth: 2, pointRadius: surveyed.length > 30 ? 0 : stationed.added.map((a) => (a ? 0 : 2)), fill: cover ? false : 'start', order: 2 },
  ];
  if (cover) datasets.push({ label: 'Pipe crown', data: cover, showLine: true, borderColor: CHART_COLOURS.bed, borderWidth: 2, pointRadius: 0, fill: false, order: 3 });
  if (waterLevel !== null) {
    datasets.push({
      label: `Water level ${waterLevel.toFixed(3)} ${lengthUnit}`,
      data: ground.map((p) => ({ x: p.x, y: Math.min(waterLevel, coverAt(p.x)) })),
      showLine: true,
      borderColor: CHART_COLOURS.accent,
      borderWidth: 1.5,
      pointRadius: 0,
      // The level line is drawn only where it is over water, not across dry ground beside the channel.
      segment: { borderColor: (s) => (isWet(ground[s.p0DataIndex], ground[s.p1DataIndex], waterLevel) ? CHART_COLOURS.accent : 'rgba(0,0,0,0)') },
      fill: { target: 0, above: CHART_COLOURS.water, below: 'rgba(0,0,0,0)' },
      order: 1,
    });
  }
  if (bankStations) {
    for (const [i, station] of bankStations.entries()) {
      datasets.push({ label: i === 0 ? 'Bank stations (dashed)' : 'Right bank', data: [{ x: station, y: bottom }, { x: station, y: top }], showLine: true, borderColor: CHART_COLOURS.bank, borderDash: [4, 4], borderWidth: 1, pointRadius: 0 });
    }
  }
  const options: ChartOptions<'scatter'> = {
    animation: false,
    maintainAspectRatio: false,
    layout: { padding: { left: 4, top: 4 } },
    plugins: {
      legend: { labels: { font: CHART_FONT, filter: (item) => item.text !== 'Right bank' } },
      tooltip: { callbacks: { label: (c) => `${c.dataset.label}: station ${c.parsed.x?.toFixed(2)} ${lengthUnit}, ${c.parsed.y?.toFixed(3)} ${lengthUnit}` } },
    },
    scales: {
      x: { type: 'linear', title: { display: true, text: `Station across the section (${lengthUnit})`, font: CHART_FONT } },
      y: { type: 'linear', title: { display: true, text: axisTitleLines(yTitle), font: CHART_FONT }, suggestedMax: top + (top - bottom) * 0.08 },
    },
  };
  return (
    <figure className="rounded border border-paper-edge bg-white/70 p-3">
      <div style={{ height }}>
        <Scatter data={{ datasets }} options={options} role="img" aria-label={caption} />
      </div>
      <figcaption className="mt-2 text-xs text-ink-soft">{caption}</figcaption>
      <ChartNumbers
        caption={`The numbers in the cross-section (${yTitle})`}
        columns={[{ label: `Station (${lengthUnit})`, numeric: true }, { label: `Ground (${lengthUnit})`, numeric: true }, { label: 'Note' }]}
        rows={ground.map((p, i) => [p.x.toFixed(2), p.y.toFixed(3), stationed.added[i] ? 'water’s edge' : ''])}
      />
    </figure>
  );
}
