import type { LongSectionData } from '@/lib/revisions/results-sheet';
import type { ChartNumbersProps } from './chart-numbers';

const f = (x: number) => x.toFixed(3);

/** What the long-section draws, as rows: the structure, each limit at both its levels, and the extents. */
export function longSectionNumbers(data: LongSectionData, lengthUnit: string, levelWords: string): Omit<ChartNumbersProps, 'testId'> {
  const u = lengthUnit;
  const rows: string[][] = [];
  if (data.structure) {
    rows.push(['Structure: crest', '0', f(data.structure.crestLevel), `sill ${f(data.structure.sillHeight)} ${u} above the bed at ${f(data.structure.bedLevel)}`]);
  }
  const atControl = data.withScheme[0];
  if (atControl) rows.push(['Water level with the scheme at the structure', '0', f(atControl.y), '']);
  for (const limit of data.limits) {
    rows.push([`${limit.label}: maximum level`, limit.x.toFixed(1), f(limit.maxLevel), '']);
    rows.push([`${limit.label}: maximum level less the freeboard`, limit.x.toFixed(1), f(limit.allowedLevel), `water ${f(limit.waterLevel)}, ${limit.pass ? 'met' : 'exceeded'}`]);
  }
  rows.push(['Extent of impact', data.extentOfImpact.toFixed(1), '', '']);
  if (data.inundationExtent !== null) rows.push(['Extent of inundation', data.inundationExtent.toFixed(1), '', '']);
  return {
    caption: `The numbers in the long-section (levels in ${u} ${levelWords})`,
    columns: [{ label: 'What' }, { label: `Distance upstream (${u})`, numeric: true }, { label: `Level (${u} ${levelWords})`, numeric: true }, { label: 'Note' }],
    rows,
  };
}
