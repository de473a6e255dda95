import type { ReactNode } from 'react';
import { ScrollRegion } from './scroll-region';

export interface DataColumn {
  label: ReactNode;
  /** Numbers are right-aligned, heading and cells alike. */
  numeric?: boolean;
}

const CAPTION_STYLES = {
  hidden: 'sr-only',
  note: 'mb-1 text-left text-xs text-ink-faint',
  title: 'mb-2 text-left text-lg font-semibold',
} as const;

/**
 * The portal's table frame: a named scroller the keyboard can reach, the caption (which names the table for screen
 * readers, shown as a note or a title, or hidden), and one row of column headings. The rows come as children.
 */
export function DataTable({ caption, captionStyle = 'hidden', columns, children }: { caption: string; captionStyle?: keyof typeof CAPTION_STYLES; columns: readonly DataColumn[]; children: ReactNode }) {
  return (
    <ScrollRegion label={caption}>
      <table className="w-full border-collapse text-sm">
        <caption className={CAPTION_STYLES[captionStyle]}>{caption}</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            {columns.map((column, i) => (
              <th key={i} scope="col" className={`py-2 ${i < columns.length - 1 ? 'pr-3' : ''} ${column.numeric ? 'text-right' : ''}`}>{column.label}</th>
            ))}
          </tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </ScrollRegion>
  );
}
