import type { ParcelCategory } from '@/lib/hydraulics/impact/parcel-impact';
import { StatusIcon } from '@/components/ui/status-icon';

// The impact category in words and an icon as well as colour.
const CATEGORIES: Record<ParcelCategory, { label: string; className: string }> = {
  affected: { label: 'Affected', className: 'text-verdict-fail border-verdict-fail' },
  'below-threshold': { label: 'Affected below the threshold', className: 'text-verdict-caution border-verdict-caution' },
  'not-affected': { label: 'Not affected', className: 'text-verdict-pass border-verdict-pass' },
  'outside-reach': { label: 'Beyond the computed reach', className: 'text-ink-faint border-paper-edge' },
};

export function CategoryLabel({ category }: { category: ParcelCategory }) {
  const c = CATEGORIES[category];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-2 py-0.5 text-xs ${c.className}`}>
      <StatusIcon name={category} />
      {c.label}
    </span>
  );
}

export const CATEGORY_WORDS: Record<ParcelCategory, string> = Object.fromEntries(Object.entries(CATEGORIES).map(([k, v]) => [k, v.label])) as Record<ParcelCategory, string>;
