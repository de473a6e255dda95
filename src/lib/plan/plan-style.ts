import type { ParcelCategory } from '@/lib/hydraulics/impact/parcel-impact';

// How the plan shows each impact category, the same on screen and in the letter's PDF: a fill colour from the
// portal's verdict palette, a hatch so the categories differ without colour, and the words of the legend.

/** 'other-land': a neighbour's parcel in a landowner's letter, drawn without its category (it is not theirs to read). */
export type PlanCategory = ParcelCategory | 'not-computed' | 'other-land';

export interface CategoryStyle {
  fill: string;
  stroke: string;
  /** Hatching drawn over the fill: none, lines one way, lines both ways, or dots. */
  hatch: 'none' | 'diagonal' | 'cross' | 'dots';
  words: string;
}

export const PLAN_CATEGORY_STYLES: Record<PlanCategory, CategoryStyle> = {
  affected: { fill: '#e8b9b0', stroke: '#a33a2a', hatch: 'cross', words: 'Affected' },
  'below-threshold': { fill: '#ecdcb4', stroke: '#8a6212', hatch: 'diagonal', words: 'Affected below the threshold' },
  'not-affected': { fill: '#cfe3d2', stroke: '#2f6b3a', hatch: 'none', words: 'Not affected' },
  'outside-reach': { fill: '#ece7db', stroke: '#5d6b70', hatch: 'dots', words: 'Beyond the computed reach' },
  'not-computed': { fill: '#f2eee4', stroke: '#5d6b70', hatch: 'none', words: 'Impact not computed (no revision)' },
  'other-land': { fill: '#ffffff', stroke: '#5d6b70', hatch: 'none', words: 'Other land' },
};

export const PLAN_INK = { river: '#17636b', inundated: '#2a6fd6', extent: '#a33a2a', structure: '#1f2a2e', text: '#1f2a2e', paper: '#faf8f3' } as const;
