import { readFileSync } from "node:fs";
import { analyze, type AnalysisResult } from "../analyze.js";
import type { AnalyzeOptions } from "../analyze-options.js";
import { StatsInputError } from "../errors.js";
import { parseDecimal } from "../numeric/parse-decimal.js";
import { CliError } from "./cli-error.js";
import { readGroupedCsv, type GroupedCsv } from "./read-grouped-csv.js";
import { textReport } from "./text-report.js";

export interface AnalyzeArgs {
  file: string;
  group: string;
  outcome: string;
  json: boolean;
  options: AnalyzeOptions;
}

export interface CommandOutput {
  stdout: string;
  warnings: string[];
}

/**
 * `waymark-stats analyze`: reads the CSV, hands the text cells to analyze(), and renders the
 * JSON or the text report. Input problems become one CliError line; warnings from the
 * analysis (missing values, zero-variance groups) are returned for stderr.
 * Cost: dominated by CSV parsing and analyze().
 */
export function analyzeCommand(args: AnalyzeArgs): CommandOutput {
  let text: string;
  try {
    text = readFileSync(args.file, "utf8");
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new CliError(
      code === "ENOENT"
        ? `cannot read '${args.file}': no such file`
        : code === "EISDIR"
          ? `cannot read '${args.file}': it is a directory`
          : `cannot read '${args.file}': ${(e as Error).message}`,
    );
  }
  const csv = readGroupedCsv(text, args.group, args.outcome);
  if (csv.refused.length > 0) {
    const named = csv.refused
      .slice(0, 3)
      .map((r) => `line ${r.line}: ${r.reading.message}`)
      .join("; ");
    const more = csv.refused.length > 3 ? `; and ${csv.refused.length - 3} more` : "";
    throw new CliError(`'${args.outcome}' holds values that cannot be read as numbers: ${named}${more}`);
  }
  const warnings: string[] = [];
  if (csv.skippedNoGroup.length) {
    warnings.push(
      `${csv.skippedNoGroup.length} row${csv.skippedNoGroup.length === 1 ? "" : "s"} without a value in '${args.group}' skipped (line ${csv.skippedNoGroup.slice(0, 3).join(", ")}${csv.skippedNoGroup.length > 3 ? ", …" : ""})`,
    );
  }
  if (csv.groups.length < 2) {
    throw new CliError(
      `'${args.group}' has ${csv.groups.length === 0 ? "no groups" : `only one group ('${csv.groups[0]?.name}')`}; a comparison needs at least two`,
    );
  }
  let result: AnalysisResult;
  try {
    result = analyze({ groups: csv.groups, options: args.options });
  } catch (e) {
    if (e instanceof StatsInputError) throw new CliError(describeInputProblem(e, csv, args.outcome));
    throw e;
  }
  const allSame = result.groups.every((g) => g.n > 0 && g.min === g.max && g.min === result.groups[0]?.min);
  if (allSame) {
    throw new CliError(
      `every value of '${args.outcome}' is ${result.groups[0]?.min}; with no variation there is nothing to compare, so none of the tests can run`,
    );
  }
  warnings.push(...result.warnings);
  const stdout = args.json
    ? JSON.stringify(result) + "\n"
    : textReport(result, { group: args.group, outcome: args.outcome, file: args.file });
  return { stdout, warnings };
}

/** Rewrites engine messages in the file's terms: CSV line numbers and column names. */
function describeInputProblem(e: StatsInputError, csv: GroupedCsv, outcome: string): string {
  const message = e.message;
  if (message.startsWith("The outcome must be numeric") || message.startsWith("The outcome must be finite")) {
    const wantInfinite = message.startsWith("The outcome must be finite");
    const bad: string[] = [];
    let total = 0;
    for (const g of csv.groups) {
      g.values.forEach((v, i) => {
        const kind = parseDecimal(String(v)).kind;
        if ((wantInfinite && kind === "infinite") || (!wantInfinite && kind === "not-numeric")) {
          total++;
          if (bad.length < 3) bad.push(`line ${g.rows?.[i]} ('${String(v).trim()}')`);
        }
      });
    }
    const more = total > bad.length ? ` and ${total - bad.length} more` : "";
    return wantInfinite
      ? `'${outcome}' must hold finite numbers; infinite values at ${bad.join(", ")}${more}`
      : `'${outcome}' must hold numbers (decimal point, e.g. 4.25); not a number at ${bad.join(", ")}${more}`;
  }
  const lower = message.charAt(0).toLowerCase() + message.slice(1);
  return lower.replace(/^the analysis needs/, "the comparison needs");
}
