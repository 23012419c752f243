import { AttentionMarker } from "./attention-marker";

/** The amber marker placed beside the number that needs a second look (the app's shared marker). */
export function AttentionMark({ label }: { label: string }) {
  return <AttentionMarker className="ml-1.5 align-middle">{label}</AttentionMarker>;
}
