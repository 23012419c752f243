import { formatDf, formatP, formatStat } from "@/lib/format";
import { isAvailable, num, reasonOf, type Maybe } from "@/lib/result-values";
import type { BartlettPart, LevenePart as FTestPart, SdRatio as SdRatioDetail } from "@waymark/stats/result";
import { AttentionMark } from "@/components/ui/attention-mark";
import { S } from "./stat-symbol";

/** The usual rule of thumb: a largest-to-smallest SD ratio above 2 (common practice). */
export const SD_RATIO_LIMIT = 2;

function FRow({ label, part, alpha }: { label: string; part: Maybe<FTestPart> | undefined; alpha: number }) {
  const ok = isAvailable(part) && num(part.F) !== null && num(part.p) !== null;
  return (
    <tr className="border-t border-ink/10">
      <th scope="row" className="py-1 pr-4 text-left font-medium">
        {label}
      </th>
      <td className="num py-1">
        {ok ? (
          <>
            <S>F</S>({formatDf(part.df1)}, {formatDf(part.df2)}) = {formatStat(part.F)}, <S>p</S>{" "}
            {formatP(part.p)}
            {part.p < alpha && <AttentionMark label="below α" />}
          </>
        ) : (
          <span className="font-sans text-ink-soft">{reasonOf(part)}</span>
        )}
      </td>
    </tr>
  );
}

export function sdRatioValue(
  x: Maybe<number | SdRatioDetail> | undefined,
): { ratio: number; detail?: SdRatioDetail } | null {
  if (typeof x === "number") return Number.isFinite(x) ? { ratio: x } : null;
  if (isAvailable(x) && x && typeof x === "object" && num(x.ratio) !== null)
    return { ratio: x.ratio, detail: x };
  return null;
}

/** Brown–Forsythe, Levene and Bartlett tests of equal spread, and the SD ratio. */
export function SpreadTable({
  brownForsythe,
  levene,
  bartlett,
  sdRatio,
  alpha,
}: {
  brownForsythe: Maybe<FTestPart>;
  levene: Maybe<FTestPart>;
  bartlett: Maybe<BartlettPart>;
  sdRatio: Maybe<number | SdRatioDetail>;
  alpha: number;
}) {
  const ratio = sdRatioValue(sdRatio);
  const bOk = isAvailable(bartlett) && num(bartlett.statistic) !== null && num(bartlett.p) !== null;
  return (
    <div className="relative max-w-full overflow-x-auto">
      <table className="text-sm">
        <tbody>
          <FRow label="Brown–Forsythe (median-centred)" part={brownForsythe} alpha={alpha} />
          <FRow label="Levene (mean-centred)" part={levene} alpha={alpha} />
          <tr className="border-t border-ink/10">
            <th scope="row" className="py-1 pr-4 text-left font-medium">
              Bartlett
            </th>
            <td className="num py-1">
              {bOk ? (
                <>
                  <S>χ</S>²({formatDf(bartlett.df)}) = {formatStat(bartlett.statistic)}, <S>p</S>{" "}
                  {formatP(bartlett.p)}
                  {bartlett.p < alpha && <AttentionMark label="below α" />}
                </>
              ) : (
                <span className="font-sans text-ink-soft">{reasonOf(bartlett)}</span>
              )}
            </td>
          </tr>
          <tr className="border-t border-ink/10">
            <th scope="row" className="py-1 pr-4 text-left font-medium">
              Largest SD ÷ smallest SD
            </th>
            <td className="num py-1">
              {ratio ? (
                <>
                  {formatStat(ratio.ratio)}
                  {ratio.detail?.largest && ratio.detail.smallest && (
                    <span className="font-sans text-ink-soft">
                      {" "}
                      ({ratio.detail.largest.group} ÷ {ratio.detail.smallest.group})
                    </span>
                  )}
                  {ratio.ratio > SD_RATIO_LIMIT && <AttentionMark label="above 2" />}
                </>
              ) : (
                <span className="font-sans text-ink-soft">{reasonOf(sdRatio)}</span>
              )}
            </td>
          </tr>
        </tbody>
      </table>
    </div>
  );
}
