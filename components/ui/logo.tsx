/** The Tankwright mark: a tank outline with a water line and a rising bubble. */
export function Logo({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect x="3" y="6" width="26" height="20" rx="3" fill="none" stroke="currentColor" strokeWidth="2.2" />
      <path d="M4.5 13 q3.5 -2.5 7 0 t7 0 t7 0 t2 -1" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      <circle cx="21" cy="19" r="1.8" fill="currentColor" />
      <circle cx="17.5" cy="22" r="1.1" fill="currentColor" />
    </svg>
  );
}
