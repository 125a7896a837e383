/** QuietLayer's mark: two calm layers, one over the other (same drawing as public/favicon.svg). */
export function BrandMark({ className = 'size-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <rect width="32" height="32" rx="6" fill="#2d4f6c" />
      <path d="M5 20c4-3 7-3 11 0s7 3 11 0" stroke="#ccece8" strokeWidth="3" fill="none" strokeLinecap="round" />
      <path d="M5 13c4-2 7-2 11 0s7 2 11 0" stroke="#ffffff" strokeWidth="2" fill="none" strokeLinecap="round" opacity=".7" />
    </svg>
  );
}

export function BrandName() {
  return (
    <span className="flex items-center gap-2.5">
      <BrandMark />
      <span className="text-lg font-semibold tracking-tight text-ink">
        Quiet<span className="text-brand">Layer</span>
      </span>
    </span>
  );
}
