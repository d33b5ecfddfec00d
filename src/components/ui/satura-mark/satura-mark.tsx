/**
 * Satura's mark, drawn in the page rather than fetched: on a slow link an image request holds one
 * of the browser's six connections while the screen's scripts and data wait for one. The same
 * shapes as public/satura-mark.svg, the installed app's icon and (inlined by the build) the tab's;
 * tests/client/components/satura-mark.test.tsx holds the two together.
 */
export function SaturaMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" focusable="false" className={className}>
      <rect width="32" height="32" rx="7" fill="#1f2a2e" />
      <path d="M7 22c4 0 5-12 9-12s5 12 9 12" fill="none" stroke="#f4efe4" strokeWidth="2.6" strokeLinecap="round" />
      <circle cx="16" cy="10" r="2.2" fill="#e0a458" />
    </svg>
  );
}
