'use client';

import { Chart, Filler, Legend, LineController, LineElement, LinearScale, PointElement, ScatterController, Tooltip } from 'chart.js';

// Only the pieces the long-section and cross-section views use; registered once per page.
Chart.register(LineController, ScatterController, LineElement, PointElement, LinearScale, Filler, Legend, Tooltip);

// A canvas cannot read CSS variables, so the charts take the page's own resolved font (IBM Plex Sans) from the body.
if (typeof window !== 'undefined' && document.body) {
  Chart.defaults.font.family = getComputedStyle(document.body).fontFamily;
  Chart.defaults.color = '#4a5a60';
  // A canvas keeps the screen's size when printed; redrawn to the page's width it fits A4 (Chart.js docs, "Printing").
  const resizeAll = () => Object.values(Chart.instances).forEach((chart) => chart.resize());
  window.addEventListener('beforeprint', resizeAll);
  window.addEventListener('afterprint', resizeAll);
}

export const CHART_COLOURS = {
  ink: '#1f2a2e',
  soft: '#7d8b90',
  accent: '#17636b',
  bed: '#8a6f4d',
  bedFill: 'rgba(138, 111, 77, 0.18)',
  bank: '#5f7d3a',
  water: 'rgba(23, 99, 107, 0.28)',
  without: '#4a5a60',
  critical: '#a33a2a',
  pass: '#2f6b3a',
  fail: '#a33a2a',
  caution: '#8a6212',
} as const;

export const CHART_FONT = { size: 12 } as const;

/**
 * An axis title that stays whole on a short chart: a long one ("Level (m above Wendle Valley local datum)") is set on
 * two lines, broken after "above", rather than running past the plot and being cut off.
 */
export function axisTitleLines(text: string, maxOneLine = 28): string | string[] {
  if (text.length <= maxOneLine) return text;
  const at = text.indexOf(' above ');
  return at > 0 ? [text.slice(0, at + ' above'.length), text.slice(at + ' above '.length)] : text;
}
