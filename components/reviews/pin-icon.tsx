/** The mark of a pinned comment (drawn, so it shows without an emoji font). */
export function PinIcon({ className = "" }: { className?: string }) {
  return (
    <svg aria-hidden viewBox="0 0 16 16" className={`inline-block h-3 w-3 align-[-1px] ${className}`} fill="currentColor">
      <path d="M8 1a4 4 0 0 0-4 4c0 3 4 9.5 4 9.5S12 8 12 5a4 4 0 0 0-4-4Zm0 5.5A1.5 1.5 0 1 1 8 3.5a1.5 1.5 0 0 1 0 3Z" />
    </svg>
  );
}
