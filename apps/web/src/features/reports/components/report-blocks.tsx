import { TriangleAlert } from "lucide-react";
import type { ReactNode } from "react";
import { clean, cleanCell } from "../report-text";
import type { Block, Run } from "@waymark/contract";

const NUMERIC = /^[−\-–<>=≤≥.\d\s,%()[\]]+$|^[<>=]\s?[−\-.\d]/;
const IMAGE = /^data:image\/png;base64,[A-Za-z0-9+/=]+$/;

function Runs({ runs }: { runs: Run[] }) {
  return (
    <>
      {runs.map((r, i) => {
        let node: ReactNode = clean(r.text);
        if (r.italic) node = <em>{node}</em>;
        if (r.bold) node = <strong>{node}</strong>;
        return <span key={i}>{node}</span>;
      })}
    </>
  );
}

function Heading({ level, text }: { level: 1 | 2 | 3; text: string }) {
  // The page has its own title, so the report's levels sit one below it.
  if (level === 1) return <h2 className="text-2xl font-semibold text-ink">{clean(text)}</h2>;
  if (level === 2)
    return <h3 className="mt-4 border-b border-ink/15 pb-1 text-xl font-semibold text-ink">{clean(text)}</h3>;
  return <h4 className="mt-2 text-base font-semibold text-ink">{clean(text)}</h4>;
}

function BlockView({ block, index }: { block: Block; index: number }) {
  switch (block.type) {
    case "heading":
      return <Heading level={block.level} text={block.text} />;
    case "paragraph":
      return (
        <p className="max-w-prose leading-relaxed">
          <Runs runs={Array.isArray(block.runs) ? block.runs : []} />
        </p>
      );
    case "table": {
      const id = `report-table-${index}`;
      // A column of numbers (after the first, which names the row) lines up on the right, header too.
      const numeric = block.header.map(
        (_, c) =>
          c > 0 &&
          block.rows.length > 0 &&
          block.rows.every((row) => cleanCell(row[c]) === "—" || NUMERIC.test(cleanCell(row[c]))),
      );
      return (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse text-sm" aria-describedby={id}>
            <caption id={id} className="mb-1 text-left text-sm font-medium">
              {clean(block.caption)}
            </caption>
            <thead>
              <tr className="border-y-2 border-ink/60">
                {block.header.map((h, i) => (
                  <th
                    key={i}
                    scope="col"
                    className={`px-2 py-1.5 font-semibold ${numeric[i] ? "text-right" : "text-left"}`}
                  >
                    {cleanCell(h)}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="border-b-2 border-ink/60">
              {block.rows.map((row, r) => (
                <tr key={r} className="border-b border-ink/10 last:border-0">
                  {row.map((cell, c) => {
                    const text = cleanCell(cell);
                    return (
                      <td key={c} className={`px-2 py-1.5 ${numeric[c] ? "num text-right" : ""}`}>
                        {text}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      );
    }
    case "figure":
      return (
        <figure className="flex flex-col gap-1">
          {block.image && IMAGE.test(block.image) ? (
            <img
              src={block.image}
              alt={clean(block.caption)}
              className="max-w-full rounded border border-ink/10 bg-white"
            />
          ) : (
            <p className="rounded border border-dashed border-ink/30 p-4 text-sm text-ink-soft">
              The figure is in the DOCX.
            </p>
          )}
          <figcaption className="text-sm text-ink-soft">{clean(block.caption)}</figcaption>
        </figure>
      );
    case "caution":
      return (
        <p className="flex max-w-prose gap-2 rounded-md border-l-4 border-amber bg-amber-100 p-3 text-sm">
          <TriangleAlert aria-hidden="true" className="mt-0.5 h-4 w-4 shrink-0 text-amber-800" />
          <span>{clean(block.text)}</span>
        </p>
      );
    case "references":
      return (
        <ol className="flex list-none flex-col gap-1.5 pl-0 text-sm">
          {block.items.map((item, i) => (
            <li key={i} className="pl-6 -indent-6">
              {clean(item)}
            </li>
          ))}
        </ol>
      );
    default:
      return null;
  }
}

/** The report rendered from its blocks: the same content the DOCX carries, as plain text nodes. */
export function ReportBlocks({ blocks }: { blocks: Block[] }) {
  return (
    <article
      className="flex flex-col gap-3 rounded-lg bg-paper p-6 shadow-sm sm:p-10"
      data-testid="report-preview"
      aria-label="Report preview"
    >
      {blocks.map((b, i) => (
        <BlockView key={i} block={b} index={i} />
      ))}
    </article>
  );
}
