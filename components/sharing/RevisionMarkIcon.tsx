/**
 * The delta triangle of a revision mark as a small inline icon, carrying the revision letter —
 * the same mark the compare view and the plan sheet draw beside each revision cloud.
 * Presentation only.
 */
export function RevisionMarkIcon({ letter, size = 16 }: { letter: string; size?: number }) {
  return (
    <svg viewBox="0 0 20 18" width={size} height={size * 0.9} aria-hidden="true" className="shrink-0">
      <polygon points="10,1 19,17 1,17" fill="none" stroke="currentColor" strokeWidth={1.4} strokeLinejoin="round" />
      <text x={10} y={14.6} textAnchor="middle" fontSize={letter.length > 1 ? 6 : 8} fontFamily="var(--font-mono), monospace" fill="currentColor">{letter}</text>
    </svg>
  );
}
