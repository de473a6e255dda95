'use client';

import type { ChartData, ChartOptions } from 'chart.js';
import { Scatter } from 'react-chartjs-2';
import type { LongSectionData, XY } from '@/lib/revisions/results-sheet';
import { ChartNumbers } from './chart-numbers';
import { limitLabelsPlugin } from './limit-labels-plugin';
import { longSectionNumbers } from './long-section-numbers';
import { CHART_COLOURS, CHART_FONT, axisTitleLines } from './register-charts';

type Dataset = ChartData<'scatter'>['datasets'][number];

const line = (label: string, data: XY[], colour: string, extra: Partial<Dataset> = {}): Dataset => ({ label, data, showLine: true, borderColor: colour, backgroundColor: colour, borderWidth: 1.5, pointRadius: 0, fill: false, ...extra }) as Dataset;

function marker(label: string, x: number, low: number, high: number, colour: string, dash: number[]): Dataset {
  return line(label, [{ x, y: low }, { x, y: high }], colour, { borderDash: dash, borderWidth: 1.5 });
}

/**
 * The long-section of one event: distance upstream on x, level on y, every line named in words in the legend
 * and told apart by its dash pattern as well as its colour.
 */
type Props = { data: LongSectionData; lengthUnit: string; levelTitle: string; levelWords: string; caption: string; showEnergyLine?: boolean; height?: number };

const limitColours = (limits: LongSectionData['limits']) => limits.map((l) => (l.pass ? CHART_COLOURS.pass : CHART_COLOURS.fail));

export function LongSectionChart({ data, lengthUnit, levelTitle, levelWords, caption, showEnergyLine = false, height = 380 }: Props) {
  const structure = data.structure ? [{ x: 0, y: data.structure.bedLevel }, { x: 0, y: data.structure.crestLevel }] : [];
  const all = [...data.bed, ...data.withScheme, ...data.withoutScheme, ...(data.bank ?? []), ...structure, ...(showEnergyLine ? data.energyLine : []), ...data.limits.flatMap((l) => [{ x: l.x, y: l.maxLevel }, { x: l.x, y: l.allowedLevel }])];
  const low = Math.min(...all.map((p) => p.y));
  const high = Math.max(...all.map((p) => p.y));
  const pad = (high - low) * 0.05;
  const datasets: Dataset[] = [
    line('Bed', data.bed, CHART_COLOURS.bed, { fill: 'start', backgroundColor: CHART_COLOURS.bedFill, borderWidth: 2 }),
    ...(data.bank ? [line('Inundation threshold (bank top)', data.bank, CHART_COLOURS.bank, { borderDash: [8, 3, 2, 3] })] : []),
    ...(data.normalDepthLine ? [line('Normal depth', data.normalDepthLine, CHART_COLOURS.soft, { borderDash: [2, 3] })] : []),
    line('Critical depth', data.criticalDepthLine, CHART_COLOURS.critical, { borderDash: [1, 4], borderWidth: 1 }),
    line('Water level without the scheme', data.withoutScheme, CHART_COLOURS.without, { borderDash: [6, 4] }),
    line('Water level with the scheme', data.withScheme, CHART_COLOURS.accent, { borderWidth: 3 }),
    ...(showEnergyLine ? [line('Energy line (water level plus velocity head)', data.energyLine, CHART_COLOURS.critical, { borderDash: [12, 3, 2, 3, 2, 3], borderWidth: 1 })] : []),
    ...(data.structure ? [line('Structure: sill up to the crest level', structure, CHART_COLOURS.ink, { borderWidth: 7, borderCapStyle: 'butt', clip: 8 })] : []),
    {
      label: 'Flood-level limit: maximum level (bar)',
      data: data.limits.map((l) => ({ x: l.x, y: l.maxLevel })),
      showLine: false,
      pointStyle: 'line',
      pointRadius: 9,
      pointBorderWidth: 3,
      borderColor: limitColours(data.limits),
      backgroundColor: limitColours(data.limits),
    } as Dataset,
    {
      label: 'Less the freeboard: the water must stay below (triangle: met, cross: exceeded)',
      data: data.limits.map((l) => ({ x: l.x, y: l.allowedLevel })),
      showLine: false,
      pointStyle: data.limits.map((l) => (l.pass ? 'triangle' : 'crossRot')),
      pointRadius: 7,
      pointBorderWidth: 2,
      borderColor: limitColours(data.limits),
      backgroundColor: limitColours(data.limits),
    } as Dataset,
    marker('Extent of impact', data.extentOfImpact, low - pad, high + pad, CHART_COLOURS.ink, [10, 4]),
    ...(data.inundationExtent !== null ? [marker('Extent of inundation', data.inundationExtent, low - pad, high + pad, CHART_COLOURS.caution, [3, 3])] : []),
  ];
  const options: ChartOptions<'scatter'> = {
    animation: false,
    maintainAspectRatio: false,
    // Room above the plot for the limits' names, and at the left for the level axis's title.
    layout: { padding: { top: 8, left: 4, right: 8 } },
    interaction: { mode: 'nearest', intersect: false },
    plugins: {
      legend: { position: 'bottom', labels: { font: CHART_FONT, usePointStyle: false, boxWidth: 28 } },
      tooltip: {
        callbacks: {
          label: (c) => {
            const isLimit = c.dataset.label?.startsWith('Flood-level') || c.dataset.label?.startsWith('Less the freeboard');
            const limit = isLimit ? data.limits[c.dataIndex] : null;
            if (limit) return `${limit.label}: maximum ${limit.maxLevel.toFixed(3)} ${lengthUnit}, less the freeboard ${limit.allowedLevel.toFixed(3)} ${lengthUnit}, water ${limit.waterLevel.toFixed(3)} ${lengthUnit} (${limit.pass ? 'met' : 'exceeded'})`;
            return `${c.dataset.label}: ${c.parsed.y?.toFixed(3)} ${lengthUnit} at ${c.parsed.x?.toFixed(0)} ${lengthUnit}`;
          },
        },
      },
    },
    scales: {
      x: { type: 'linear', min: 0, title: { display: true, text: `Distance upstream of the structure (${lengthUnit})`, font: CHART_FONT } },
      y: { type: 'linear', min: low - pad, max: high + pad, title: { display: true, text: axisTitleLines(levelTitle, 44), font: CHART_FONT } },
    },
  };
  return (
    <figure className="rounded border border-paper-edge bg-white/70 p-3">
      <div style={{ height }}>
        <Scatter data={{ datasets }} options={options} plugins={[limitLabelsPlugin(data.limits.map((l) => ({ x: l.x, y: Math.max(l.maxLevel, l.allowedLevel), text: l.label })))]} role="img" aria-label={caption} data-testid="long-section-chart" />
      </div>
      <figcaption className="mt-2 text-sm text-ink-soft">{caption}</figcaption>
      <ChartNumbers testId="long-section-numbers" {...longSectionNumbers(data, lengthUnit, levelWords)} />
    </figure>
  );
}
