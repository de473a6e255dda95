'use client';

import { useEffect, useState } from 'react';

/** The value once it has stopped changing for `delay` ms: the live head is asked for after typing pauses. */
export function useDebounced<T>(value: T, delay: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delay);
    return () => clearTimeout(timer);
  }, [value, delay]);
  return settled;
}
