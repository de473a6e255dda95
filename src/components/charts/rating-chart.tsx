'use client';

import type { ChartData, ChartOptions } from 'chart.js';
import { Scatter } from 'react-chartjs-2';
import type { StructureRating } from '@/lib/hydraulics/structure-rating';
import { ChartNumbers } from './chart-numbers';
import { limitLabelsPlugin } from './limit-labels-plugin';
import { CHART_COLOURS, CHART_FONT, axisTitleLines } from './register-charts';

type Dataset = ChartData<'scatter'>['datasets'][number];
type Props = { rating: StructureRating; lengthUnit: string; dischargeUnit: string; levelWords: string; height?: number };

const f = (x: number) => x.toFixed(3);

/** The structure's rating: upstream level (left axis) and head over the crest (right axis) against discharge, events marked. */
export function RatingChart({ rating, lengthUnit: u, dischargeUnit, levelWords, height = 320 }: Props) {
  const events = rating.points.filter((p) => p.event !== null);
  const datasets: Dataset[] = [
    { label: 'Water level upstream of the structure', data: rating.points.map((p) => ({ x: p.discharge, y: p.upstreamLevel })), showLine: true, borderColor: CHART_COLOURS.accent, backgroundColor: CHART_COLOURS.accent, borderWidth: 2.5, pointRadius: 0, yAxisID: 'y' } as Dataset,
    { label: 'Head over the crest (right-hand axis)', data: rating.points.map((p) => ({ x: p.discharge, y: p.head })), showLine: true, borderColor: CHART_COLOURS.without, backgroundColor: CHART_COLOURS.without, borderWidth: 1.5, borderDash: [6, 4], pointRadius: 0, yAxisID: 'head' } as Dataset,
    { label: 'The flood events (circles)', data: events.map((p) => ({ x: p.discharge, y: p.upstreamLevel })), showLine: false, pointStyle: 'circle', pointRadius: 6, borderColor: CHART_COLOURS.ink, backgroundColor: CHART_COLOURS.caution, yAxisID: 'y' } as Dataset,
  ];
  if (rating.crestLevel !== null) {
    const ends = [rating.points[0].discharge, rating.points.at(-1)!.discharge];
    datasets.push({ label: 'Crest level', data: ends.map((x) => ({ x, y: rating.crestLevel! })), showLine: true, borderColor: CHART_COLOURS.bed, borderWidth: 1, borderDash: [2, 3], pointRadius: 0, yAxisID: 'y' } as Dataset);
  }
  const options: ChartOptions<'scatter'> = {
    animation: false,
    maintainAspectRatio: false,
    layout: { padding: { top: 8, left: 4, right: 4 } },
    plugins: {
      legend: { position: 'bottom', labels: { font: CHART_FONT, boxWidth: 28 } },
      tooltip: { callbacks: { label: (c) => `${c.dataset.label}: ${c.parsed.y?.toFixed(3)} ${u} at ${c.parsed.x?.toFixed(2)} ${dischargeUnit}` } },
    },
    scales: {
      x: { type: 'linear', min: 0, title: { display: true, text: `Discharge (${dischargeUnit})`, font: CHART_FONT } },
      y: { type: 'linear', position: 'left', title: { display: true, text: axisTitleLines(`Level (${u} ${levelWords})`), font: CHART_FONT } },
      head: { type: 'linear', position: 'right', min: 0, grid: { drawOnChartArea: false }, title: { display: true, text: `Head over the crest (${u})`, font: CHART_FONT } },
    },
  };
  const caption = `Rating of the structure from ${rating.points[0].discharge.toFixed(2)} to ${rating.points.at(-1)!.discharge.toFixed(2)} ${dischargeUnit}, worked out by the engine: ${events.map((p) => `${p.event} at ${p.discharge.toFixed(2)} ${dischargeUnit}, head ${f(p.head)} ${u}, level ${f(p.upstreamLevel)} ${u}`).join('; ')}.`;
  return (
    <figure className="rounded border border-paper-edge bg-white/70 p-3">
      <div style={{ height }}>
        <Scatter data={{ datasets }} options={options} plugins={[limitLabelsPlugin(events.map((p) => ({ x: p.discharge, y: p.upstreamLevel, text: p.event ?? '' })))]} role="img" aria-label={caption} data-testid="rating-chart" />
      </div>
      <figcaption className="mt-2 text-sm text-ink-soft">{caption}{rating.points.some((p) => !p.controls) ? ' Where the crest is too low to control a flow, the level is the channel’s own and the head is shown as 0.' : ''}</figcaption>
      <ChartNumbers
        testId="rating-numbers"
        caption={`The numbers in the rating (levels in ${u} ${levelWords})`}
        columns={[{ label: `Discharge (${dischargeUnit})`, numeric: true }, { label: `Head over the crest (${u})`, numeric: true }, { label: `Upstream level (${u})`, numeric: true }, { label: 'Event' }]}
        rows={rating.points.map((p) => [p.discharge.toFixed(3), f(p.head), f(p.upstreamLevel), p.event ?? (p.controls ? '' : 'crest does not control')])}
      />
    </figure>
  );
}
