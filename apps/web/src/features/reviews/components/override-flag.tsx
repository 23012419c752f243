import { AttentionMarker } from "@/components/ui/attention-marker";

/** Whether the analyst overrode the recommended test: the amber marker with words, or plain text. */
export function OverrideFlag({ override }: { override: boolean }) {
  return override ? <AttentionMarker>Override</AttentionMarker> : <span className="text-ink-soft">None</span>;
}
