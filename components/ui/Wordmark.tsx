// Baywright's mark: a bay in plan, bare-metal outline with a copper dimension tick above it.
import { palette } from '@/lib/look';

/** `wordClassName`: the name's own classes (the app bar hides it on a phone, keeping the mark). */
export function Wordmark({ className = '', wordClassName = '' }: { className?: string; wordClassName?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 font-semibold tracking-tight ${className}`}>
      <svg width="26" height="18" viewBox="0 0 26 18" aria-hidden="true">
        <path d="M2 4h22M2 2.5v3M24 2.5v3" stroke={palette.copper} strokeWidth="1.2" fill="none" />
        <rect x="2" y="8" width="22" height="9" fill="none" stroke={palette.ink} strokeWidth="1.8" />
        <rect x="4" y="10" width="7" height="5" fill="none" stroke={palette.ink} strokeWidth="0.8" />
        <path d="M14 10l4 5M17 10l4 5" stroke={palette.ink} strokeWidth="0.6" />
      </svg>
      <span className={wordClassName}>Baywright</span>
    </span>
  );
}
