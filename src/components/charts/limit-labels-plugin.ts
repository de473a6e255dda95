import type { Chart, Plugin } from 'chart.js';
import { CHART_COLOURS } from './register-charts';

export interface LabelledMark {
  x: number;
  y: number;
  text: string;
}

/**
 * Writes each limit's name beside its mark on the canvas. Neighbouring names are stepped up and down in turn, so that
 * limits close together along the reach stay readable; names near the right edge are written to the mark's left.
 */
export function limitLabelsPlugin(marks: readonly LabelledMark[]): Plugin<'scatter'> {
  return {
    id: 'sillmarkLimitLabels',
    afterDatasetsDraw(chart: Chart) {
      const { ctx, chartArea, scales } = chart;
      ctx.save();
      ctx.font = `12px ${getComputedStyle(chart.canvas).fontFamily}`;
      ctx.fillStyle = CHART_COLOURS.ink;
      ctx.textBaseline = 'middle';
      [...marks].sort((a, b) => a.x - b.x).forEach((mark, i) => {
        const px = scales.x.getPixelForValue(mark.x);
        const py = scales.y.getPixelForValue(mark.y) - 14 - (i % 3) * 14;
        const width = ctx.measureText(mark.text).width;
        const right = px + 8 + width <= chartArea.right;
        ctx.textAlign = right ? 'left' : 'right';
        ctx.fillText(mark.text, right ? px + 8 : px - 8, Math.max(chartArea.top + 6, py));
      });
      ctx.restore();
    },
  };
}
