import type { ReactNode } from 'react';

/**
 * A wide table's horizontal scroller: named, focusable so it scrolls from the keyboard, and positioned so screen-reader-only
 * text inside it cannot widen the page. A shadow at an edge (`scroll-cue`) shows that there is more to scroll to.
 */
export function ScrollRegion({ label, children, className = '' }: { label: string; children: ReactNode; className?: string }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={`scroll-cue relative overflow-x-auto ${className}`}>
      {children}
    </div>
  );
}
