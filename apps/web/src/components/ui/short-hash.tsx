import { Copy } from "lucide-react";
import { useState } from "react";

/** A long hash shortened to its first 12 characters, the full value on hover and one click to copy. */
export function ShortHash({ hash, label = "hash" }: { hash: string; label?: string }) {
  const [copied, setCopied] = useState(false);
  if (!hash) return <span className="text-ink-soft">—</span>;
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(hash);
      setCopied(true);
      setTimeout(() => setCopied(false), 1500);
    } catch {
      setCopied(false);
    }
  };
  return (
    <span className="inline-flex items-center gap-1">
      <abbr title={hash} className="num no-underline" data-testid="short-hash">
        {hash.slice(0, 12)}…
      </abbr>
      <button
        type="button"
        onClick={copy}
        className="rounded p-0.5 text-ink-soft hover:bg-panel hover:text-ink"
        aria-label={`Copy the full ${label}`}
      >
        <Copy aria-hidden="true" className="h-3.5 w-3.5" />
      </button>
      {copied && (
        <span role="status" className="text-xs text-spruce">
          copied
        </span>
      )}
    </span>
  );
}
