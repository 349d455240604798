interface LogoProps {
  size?: number;
  withWord?: boolean;
}

/** Our mark: an envelope in profile riding on its rail, with the mount hanging below. */
export function Logo({ size = 28, withWord = true }: LogoProps) {
  return (
    <span className="inline-flex items-center gap-2" data-testid="logo">
      <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true" focusable="false">
        <ellipse cx="16" cy="12" rx="13" ry="7" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M26 9 L31 5 M26 15 L31 19" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
        <line x1="6" y1="21" x2="24" y2="21" stroke="#1d7f7a" strokeWidth="2.5" strokeLinecap="round" />
        <rect x="13" y="19" width="6" height="4" rx="1" fill="#1d7f7a" />
        <line x1="16" y1="23" x2="16" y2="30" stroke="currentColor" strokeWidth="1.5" />
      </svg>
      {withWord && <span className="font-display text-lg font-bold tracking-tight">Trimrail</span>}
    </span>
  );
}
