import { reasonOf } from "@/lib/result-values";

/** Where a statistic could not be computed: the reason, in place of the number. */
export function UnavailableNote({ what, value }: { what: string; value: unknown }) {
  return (
    <p className="rounded-md border border-ink/15 bg-paper px-3 py-2 text-sm text-ink-soft">
      <span className="font-medium text-ink">{what} could not be computed.</span>{" "}
      {reasonOf(value, "The server did not send this part.")}
    </p>
  );
}
