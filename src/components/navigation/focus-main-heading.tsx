'use client';

import { usePathname } from 'next/navigation';
import { useEffect, useRef } from 'react';

/**
 * After a page change inside the portal, moves the keyboard focus (and a screen reader) to the new page's main
 * heading, as a full page load would start at the top. The first render keeps the browser's own focus.
 */
export function FocusMainHeading() {
  const pathname = usePathname();
  const previous = useRef(pathname);
  useEffect(() => {
    if (previous.current === pathname) return;
    previous.current = pathname;
    const heading = document.querySelector<HTMLElement>('main h1');
    if (!heading) return;
    if (!heading.hasAttribute('tabindex')) heading.setAttribute('tabindex', '-1');
    heading.focus({ preventScroll: false });
  }, [pathname]);
  return null;
}
