/**
 * The Sidewise mark: a tire in side view with a dimension line across its diameter. The app's icons
 * (app/icon.svg, and app/favicon.ico and app/apple-icon.png drawn from it) show the same mark: redraw them when it changes.
 */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <circle cx="16" cy="16" r="13" fill="none" stroke="currentColor" strokeWidth="3" />
      <circle cx="16" cy="16" r="6.5" fill="none" stroke="currentColor" strokeWidth="1.25" />
      <path d="M1 29.5h30M1 27.5v4M31 27.5v4" stroke="currentColor" strokeWidth="1" />
    </svg>
  );
}
