/** Two painted bars on a post: a trail waymark. */
export function WaymarkLogo({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="6" fill="#1F4D45" />
      <rect x="9" y="7" width="14" height="6" rx="1" fill="#F3EFE8" />
      <rect x="9" y="15" width="14" height="6" rx="1" fill="#D9961A" />
      <rect x="15" y="21" width="2" height="5" fill="#F3EFE8" />
    </svg>
  );
}
