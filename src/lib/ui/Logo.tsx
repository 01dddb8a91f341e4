/**
 * Quadrant's mark: a rounded square cut into four quadrants, the upper-right one filled, with a small
 * basepoint in the lower-left. Drawn inline so it follows the palette and needs no request.
 */
export function LogoMark({ size = 28, title }: { size?: number; title?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role={title ? 'img' : undefined} aria-hidden={title ? undefined : true} aria-label={title}>
      <rect x="2" y="2" width="28" height="28" rx="5" fill="var(--color-surface)" stroke="var(--color-ink)" strokeWidth="2.5" />
      <path d="M16 3.5v25M3.5 16h25" stroke="var(--color-ink)" strokeWidth="2" />
      <path d="M17 3.25h8a3.75 3.75 0 0 1 3.75 3.75v8H17z" fill="var(--color-accent)" />
      <circle cx="9.5" cy="22.5" r="2.4" fill="var(--color-focus)" />
    </svg>
  );
}

/** Mark plus wordmark. */
export function Logo({ size = 28 }: { size?: number }) {
  return (
    <span className="inline-flex items-center gap-2.5">
      <LogoMark size={size} />
      <span className="text-lg font-semibold tracking-tight text-ink">Quadrant</span>
    </span>
  );
}
