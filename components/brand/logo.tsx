// Loopwright mark: a closed loop with a flow (red) and a return (blue) half.
export function Logo({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <path d="M6 16a10 10 0 0 1 20 0" fill="none" stroke="#c8322b" strokeWidth="3.5" strokeLinecap="round" />
      <path d="M26 16a10 10 0 0 1-20 0" fill="none" stroke="#2b5fc8" strokeWidth="3.5" strokeLinecap="round" />
      <circle cx="16" cy="16" r="3.5" fill="#b4632b" />
    </svg>
  );
}
