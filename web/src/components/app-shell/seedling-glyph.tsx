/**
 * Homeground's seedling: two leaves over a curved ground line. Drawn in currentColor so the
 * wordmark's colour token decides its colour; decorative, the word beside it carries the name.
 */
export function SeedlingGlyph({ size = 28, className }: { size?: number; className?: string }) {
  return (
    <svg
      className={className}
      width={size}
      height={size}
      viewBox="0 0 32 32"
      aria-hidden="true"
      focusable="false"
      fill="none"
      stroke="currentColor"
      strokeWidth={2.2}
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      <path d="M16 25.5V14" />
      <path d="M16 16.5c-1-4.6-4.6-7.2-9.2-7.2.4 4.7 3.9 7.5 9.2 7.2z" fill="currentColor" />
      <path d="M16 13.5c.8-4.5 4.1-7.1 9-7.3-.2 4.9-3.5 7.5-9 7.3z" fill="currentColor" />
      <path d="M4 27.5c7.3-3.4 16.7-3.4 24 0" />
    </svg>
  );
}
