/**
 * The amber marker for something that needs a second look (an override, a failed check). It
 * always carries words, so it never relies on colour alone.
 */
export function AttentionMarker({ children, className = "" }: { children: string; className?: string }) {
  return (
    <span
      className={`inline-flex items-center gap-1.5 rounded-sm bg-amber-100 px-1.5 py-0.5 text-xs font-semibold text-amber-800 ring-1 ring-amber/60 ${className}`}
    >
      <span aria-hidden="true" className="inline-block h-2 w-2 rotate-45 bg-amber" />
      {children}
    </span>
  );
}
