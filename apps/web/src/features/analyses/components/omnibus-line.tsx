import { formatBounded, formatDf, formatP, formatStat } from "@/lib/format";
import type { OmnibusNumbers } from "../omnibus";
import { S } from "./stat-symbol";

/** The omnibus result in reporting form: F(2, 27) = 4.21, p = .025, ω² = .17. */
export function OmnibusLine({ o }: { o: OmnibusNumbers }) {
  return (
    <span className="tabular-nums" data-testid="omnibus-line">
      <S>{o.symbol}</S>({o.df.map(formatDf).join(", ")}) = {formatStat(o.stat)}, <S>p</S> {formatP(o.p)}
      {o.effect && (
        <>
          , <S>{o.effect.symbol.charAt(0)}</S>
          {o.effect.symbol.slice(1)} = {formatBounded(o.effect.value)}
          {o.effect.ci && (
            <>
              {" "}
              [{formatBounded(o.effect.ci.lower)}, {formatBounded(o.effect.ci.upper)}]
            </>
          )}
        </>
      )}
    </span>
  );
}
