/** Sillmark's mark: a sill on the bed, the water heading up behind it and falling over the crest (as src/app/icon.svg). */
export function BrandMark({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg viewBox="0 0 64 64" aria-hidden="true" focusable="false" className={className}>
      <rect width="64" height="64" rx="12" fill="#17636b" />
      <path d="M8 46 H27 V31 H37 V46 H56" fill="none" stroke="#faf8f3" strokeWidth="5" strokeLinejoin="round" strokeLinecap="round" />
      <path d="M8 22 H26 C32 22 35 25 39 34 C41 39 45 41 56 41" fill="none" stroke="#9fd3d6" strokeWidth="4" strokeLinecap="round" />
    </svg>
  );
}
