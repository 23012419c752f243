/** Upload progress, announced to assistive technology. */
export function ProgressBar({ fraction, label }: { fraction: number; label: string }) {
  const pct = Math.round(Math.max(0, Math.min(1, Number.isFinite(fraction) ? fraction : 0)) * 100);
  return (
    <div className="flex items-center gap-3">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        className="h-2.5 w-64 overflow-hidden rounded-full bg-panel"
      >
        <div className="h-full bg-spruce transition-[width]" style={{ width: `${pct}%` }} />
      </div>
      <span className="num text-sm">{pct}%</span>
    </div>
  );
}
