'use client';

import type { ChartData, ChartOptions } from 'chart.js';
import { Scatter } from 'react-chartjs-2';
import type { RoutingChartData, TimePoint } from '@/lib/routing-sheet/routing-chart-data';
import { CHART_COLOURS, CHART_FONT } from './register-charts';

type Dataset = ChartData<'scatter'>['datasets'][number];

const series = (label: string, data: TimePoint[], colour: string, axis: 'discharge' | 'level', extra: Partial<Dataset> = {}): Dataset =>
  ({ label, data, yAxisID: axis, showLine: true, borderColor: colour, backgroundColor: colour, borderWidth: 2, pointRadius: 0, fill: false, ...extra }) as Dataset;

const peak = (label: string, point: TimePoint, colour: string, axis: 'discharge' | 'level', style: string): Dataset =>
  ({ label, data: [point], yAxisID: axis, showLine: false, pointStyle: style, pointRadius: 6, pointBorderWidth: 2, borderColor: colour, backgroundColor: 'rgba(255,255,255,0.9)' }) as Dataset;

type Props = { data: RoutingChartData; dischargeUnit: string; levelTitle: string; lengthUnit: string; caption: string; height?: number };

/**
 * A flood routed through the reservoir: inflow and outflow on the left axis (discharge), the reservoir level on the
 * right axis, time in hours along the bottom. Lines are told apart by dash pattern as well as colour.
 */
export function RoutingChart({ data, dischargeUnit, levelTitle, lengthUnit, caption, height = 340 }: Props) {
  const datasets: Dataset[] = [
    series('Inflow to the reservoir', data.inflow, CHART_COLOURS.without, 'discharge', { borderDash: [6, 4] }),
    series('Outflow over the structure', data.outflow, CHART_COLOURS.accent, 'discharge', { borderWidth: 3 }),
    series('Reservoir level (right-hand axis)', data.level, CHART_COLOURS.bed, 'level', { borderDash: [2, 3] }),
    peak('Peak inflow', data.peaks.inflow, CHART_COLOURS.without, 'discharge', 'rect'),
    peak('Peak outflow', data.peaks.outflow, CHART_COLOURS.accent, 'discharge', 'circle'),
    peak('Peak reservoir level', data.peaks.level, CHART_COLOURS.bed, 'level', 'triangle'),
  ];
  const levels = data.level.map((p) => p.y);
  const low = Math.min(...levels);
  const high = Math.max(...levels);
  const pad = Math.max((high - low) * 0.1, 0.05);
  const options: ChartOptions<'scatter'> = {
    animation: false,
    maintainAspectRatio: false,
    interaction: { mode: 'nearest', intersect: false },
    plugins: {
      legend: { position: 'bottom', labels: { font: CHART_FONT, boxWidth: 28 } },
      tooltip: {
        callbacks: {
          label: (c) => {
            const isLevel = c.dataset.yAxisID === 'level';
            return `${c.dataset.label}: ${c.parsed.y?.toFixed(3)} ${isLevel ? lengthUnit : dischargeUnit} at ${c.parsed.x?.toFixed(2)} h`;
          },
        },
      },
    },
    scales: {
      x: { type: 'linear', min: 0, title: { display: true, text: 'Time from the start of the inflow (hours)', font: CHART_FONT } },
      discharge: { type: 'linear', position: 'left', min: 0, title: { display: true, text: `Discharge (${dischargeUnit})`, font: CHART_FONT } },
      level: { type: 'linear', position: 'right', min: low - pad, max: high + pad, grid: { drawOnChartArea: false }, title: { display: true, text: levelTitle, font: CHART_FONT } },
    },
  };
  return (
    <figure className="rounded border border-paper-edge bg-white/70 p-3">
      <div style={{ height }}>
        <Scatter data={{ datasets }} options={options} role="img" aria-label={caption} data-testid="routing-chart" />
      </div>
      <figcaption className="mt-2 text-sm text-ink-soft">{caption}</figcaption>
    </figure>
  );
}
