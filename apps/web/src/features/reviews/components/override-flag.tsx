import { AttentionMarker } from "@/components/ui/attention-marker";

/** Whether the analyst deviated from the plan's primary test: the amber marker with words, or plain text. */
export function OverrideFlag({ override }: { override: boolean }) {
  return override ? (
    <AttentionMarker>Deviation</AttentionMarker>
  ) : (
    <span className="text-ink-soft">None</span>
  );
}
