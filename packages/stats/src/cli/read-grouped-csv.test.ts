import { describe, expect, it } from "vitest";
import { analyze } from "../analyze.js";
import { readGroupedCsv } from "./read-grouped-csv.js";

// Property (stated in read-grouped-csv.ts): the command line hands a cell over as a number only
// when the engine reads the same decimal from the number as from the text, so analyze() on
// the streamed groups equals analyze() on the cells' text, number for number.
function textGroups(csv: string, delimiter = ","): { name: string; values: string[]; rows: number[] }[] {
  const lines = csv.split("\n");
  const groups = new Map<string, { name: string; values: string[]; rows: number[] }>();
  lines.slice(1).forEach((line, i) => {
    if (line.trim() === "") return;
    const [g = "", y = ""] = line.split(delimiter);
    const entry = groups.get(g) ?? { name: g, values: [], rows: [] };
    groups.set(g, entry);
    entry.values.push(y.trim());
    entry.rows.push(i + 2);
  });
  return [...groups.values()];
}

const cases: Record<string, string> = {
  decimals: "g,y\nA,1.25\nA,2.5\nA,3\nB,4.75\nB,5.125\nB,-0.5\nC,6\nC,7.25\nC,8.5\nA,NA\n",
  // Whole numbers ending in zeros read as 12·10² from text but 1200·10⁰ from a number: alone
  // they set the decimal scale, so they must stay text here.
  wholeHundreds: "g,y\nA,1200\nA,1500\nA,900\nB,2000\nB,2100\nB,1800\nC,3000\nC,2600\nC,3300\n",
  wholeWithDecimals: "g,y\nA,1200\nA,1500.5\nA,900\nB,2000\nB,2100.25\nB,1800\nC,3000\nC,2600\nC,3300.75\n",
  // More than 15 significant digits: the engine's exact BigInt path reads the text.
  longMantissas:
    "g,y\nA,1000000000000.4123456\nA,1000000000000.3\nA,1000000000000.5\nB,1000000000000.71\nB,1000000000000.9\nB,1000000000000.8\nC,1000000000001.2\nC,1000000000001.1\nC,1000000000000.95\n",
  trailingZeros: "g,y\nA,1.50\nA,2.500\nA,3.0\nB,4.10\nB,5.20\nB,6.000\nC,7.70\nC,8.80\nC,9.90\n",
  exponents: "g,y\nA,1e3\nA,2.5e2\nA,3E1\nB,40\nB,0.5\nB,-0\nC,1e-3\nC,7\nC,12.5e-1\n",
};

describe("readGroupedCsv hands analyze() the same decimals as the text", () => {
  it.each(Object.entries(cases))("%s", (_, csv) => {
    const streamed = readGroupedCsv(csv, "g", "y");
    const fromText = textGroups(csv);
    expect(JSON.stringify(analyze({ groups: streamed.groups }))).toBe(
      JSON.stringify(analyze({ groups: fromText })),
    );
  });

  it("keeps every row's line number and counts missing cells (quoted file, CRLF line ends)", () => {
    const csv = 'g,y\r\n"A","1.5"\r\nA,2\r\n"B",NA\r\nB,3.25\r\n,4\r\n';
    const r = readGroupedCsv(csv, "g", "y");
    expect(r.delimiter).toBe(",");
    expect(r.skippedNoGroup).toEqual([6]);
    expect(r.groups.map((g) => ({ name: g.name, values: Array.from(g.values), rows: g.rows }))).toEqual([
      { name: "A", values: [1.5, 2], rows: [2, 3] },
      { name: "B", values: [NaN, 3.25], rows: [4, 5] },
    ]);
  });
});
