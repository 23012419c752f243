import { Copy } from "lucide-react";
import { useState } from "react";

/** A SHA-256 shortened to 12 characters; the full digest on hover and one click to copy it. */
export function ShaDigest({ sha }: { sha: string }) {
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(sha);
      setCopied(true);
      setTimeout(() => setCopied(false), 1500);
    } catch {
      setCopied(false);
    }
  };
  return (
    <span className="inline-flex items-center gap-1">
      <abbr title={sha} className="num no-underline">
        {sha.slice(0, 12)}…
      </abbr>
      <button type="button" onClick={copy} className="rounded p-0.5 text-ink-soft hover:bg-panel hover:text-ink" aria-label={`Copy the full SHA-256 ${sha}`}>
        <Copy aria-hidden="true" className="h-3.5 w-3.5" />
      </button>
      {copied && <span role="status" className="text-xs text-spruce">copied</span>}
    </span>
  );
}
