/** Statistical significance is not practical importance. */
export function SignificanceNote({ outcome, unit }: { outcome: string; unit: string }) {
  return (
    <aside aria-labelledby="sig-note-title" className="rounded-md bg-panel p-4 text-sm">
      <h4 id="sig-note-title" className="font-semibold">
        Statistical and practical significance
      </h4>
      <p className="mt-1 max-w-prose">
        A small p-value says a difference this large would be unlikely if the groups did not differ; it does
        not say the difference is big enough to matter. Judge that from the differences and their intervals
        {unit ? ` in ${unit}` : ""}, and from the effect size, against what counts as a meaningful change in{" "}
        {outcome}. A result that is not statistically significant does not show that the groups are the same.
      </p>
    </aside>
  );
}
