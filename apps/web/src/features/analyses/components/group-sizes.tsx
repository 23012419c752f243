import { GroupSwatch } from "./group-swatch";
import { AttentionMark } from "@/components/ui/attention-mark";

/** n per group, with very small groups marked. */
export function GroupSizes({ groups }: { groups: { name: string; n: number }[] }) {
  return (
    <ul className="flex flex-wrap gap-3 text-sm">
      {groups.map((g, i) => (
        <li key={g.name} className="inline-flex items-center gap-1.5 rounded bg-stone px-2 py-1">
          <GroupSwatch index={i} /> {g.name}: <span className="font-semibold tabular-nums">n = {g.n}</span>
          {g.n < 5 && <AttentionMark label="fewer than 5" />}
        </li>
      ))}
    </ul>
  );
}
