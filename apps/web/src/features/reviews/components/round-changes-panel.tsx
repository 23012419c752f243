import type { ReviewRound } from "@waymark/contract";

/**
 * From round 2 on: what changed since the round before (data version, test, deviation, key
 * numbers), as the server compared the two rounds' stored analyses.
 */
export function RoundChangesPanel({ round }: { round: ReviewRound | undefined }) {
  const c = round?.changes;
  if (!round || !c) return null;
  return (
    <section
      aria-labelledby="round-changes-title"
      data-testid="round-changes"
      className="mb-6 rounded-lg border-l-4 border-lake bg-paper p-4 shadow-sm"
    >
      <h2 id="round-changes-title" className="font-semibold text-spruce">
        What changed since round {c.sinceRound}
      </h2>
      <ul className="mt-2 list-disc pl-5 text-sm">
        {c.summary.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      {c.keyNumbers.length > 0 && (
        <div className="mt-3 overflow-x-auto">
          <table className="text-sm">
            <caption className="sr-only">
              Key numbers, round {c.sinceRound} and round {round.round}
            </caption>
            <thead className="text-left text-ink-soft">
              <tr>
                <th className="py-1 pr-4 font-medium"></th>
                <th className="py-1 pr-4 font-medium">Round {c.sinceRound}</th>
                <th className="py-1 font-medium">Round {round.round}</th>
              </tr>
            </thead>
            <tbody>
              {c.keyNumbers.map((k) => (
                <tr key={k.name} className={k.before !== k.after ? "font-semibold" : ""}>
                  <th scope="row" className="py-0.5 pr-4 text-left font-normal">
                    {k.name}
                  </th>
                  <td className="num py-0.5 pr-4">{k.before ?? "not computed"}</td>
                  <td className="num py-0.5">{k.after ?? "not computed"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
