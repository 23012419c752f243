import { parseArgs } from "node:util";
import type { AnalyzeOptions } from "../analyze-options.js";
import { ENGINE_VERSION } from "../version.js";
import { analyzeCommand } from "./analyze-command.js";
import { CliError } from "./cli-error.js";
import { powerCommand } from "./power-command.js";
import { USAGE } from "./usage.js";
import { ADJUSTMENTS, POLICIES, SCALES } from "../vocabulary/ids.js";

export interface CliIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
}

const PREFIX = "waymark-stats: ";

const defaultIo: CliIo = {
  stdout: (t) => void process.stdout.write(t),
  stderr: (t) => void process.stderr.write(t),
};

function numberOption(name: string, value: string | undefined): number | undefined {
  if (value === undefined) return undefined;
  const x = Number(value);
  if (value.trim() === "" || !Number.isFinite(x))
    throw new CliError(`--${name} needs a number; got '${value}'`, 2);
  return x;
}

function choice<T extends string>(
  name: string,
  value: string | undefined,
  allowed: readonly T[],
): T | undefined {
  if (value === undefined) return undefined;
  if (!(allowed as readonly string[]).includes(value))
    throw new CliError(`--${name} must be one of ${allowed.join(", ")}; got '${value}'`, 2);
  return value as T;
}

/**
 * Entry point of the `waymark-stats` command: parses argv (Node's util.parseArgs), runs the
 * subcommand and returns the exit code — 0 done, 1 input that cannot be analysed, 2 usage
 * error. Every failure is one line on stderr starting "waymark-stats: ", never a stack trace.
 * Example: await main(["analyze", "data.csv", "--group", "row", "--outcome", "mass", "--json"]).
 * Cost: that of the subcommand.
 */
export async function main(argv: readonly string[], io: CliIo = defaultIo): Promise<number> {
  try {
    return run(argv, io);
  } catch (e) {
    if (e instanceof CliError) {
      io.stderr(PREFIX + e.message.replace(/\s*\n\s*/g, " ") + "\n");
      return e.exitCode;
    }
    // Option parsing errors from util.parseArgs carry a code; they are usage errors.
    const code = (e as { code?: string }).code;
    if (typeof code === "string" && code.startsWith("ERR_PARSE_ARGS")) {
      io.stderr(PREFIX + (e as Error).message.replace(/\s*\n\s*/g, " ") + " (see --help)\n");
      return 2;
    }
    io.stderr(
      PREFIX + `internal error: ${(e as Error).message ?? String(e)}`.replace(/\s*\n\s*/g, " ") + "\n",
    );
    return 1;
  }
}

function run(argv: readonly string[], io: CliIo): number {
  const [command, ...rest] = argv;
  if (command === undefined) throw new CliError("no command given; use analyze or power (see --help)", 2);
  if (command === "--help" || command === "-h" || command === "help") {
    io.stdout(USAGE);
    return 0;
  }
  if (command === "--version" || command === "-v") {
    io.stdout(`waymark-stats ${ENGINE_VERSION}\n`);
    return 0;
  }
  if (command === "analyze") {
    const { values, positionals } = parseArgs({
      args: [...rest],
      allowPositionals: true,
      strict: true,
      options: {
        group: { type: "string" },
        outcome: { type: "string" },
        alpha: { type: "string" },
        adjust: { type: "string" },
        control: { type: "string" },
        policy: { type: "string" },
        scale: { type: "string" },
        question: { type: "string" },
        "planned-sizes": { type: "string" },
        seed: { type: "string" },
        json: { type: "boolean", default: false },
        help: { type: "boolean", default: false },
      },
    });
    if (values.help) {
      io.stdout(USAGE);
      return 0;
    }
    if (positionals.length !== 1)
      throw new CliError(
        positionals.length === 0
          ? "analyze needs the CSV file to read (see --help)"
          : `analyze takes one file; got ${positionals.length}`,
        2,
      );
    if (!values.group)
      throw new CliError("analyze needs --group COLUMN (the column with the group labels)", 2);
    if (!values.outcome)
      throw new CliError("analyze needs --outcome COLUMN (the column with the measured values)", 2);
    const alpha = numberOption("alpha", values.alpha);
    if (alpha !== undefined && !(alpha > 0 && alpha < 1))
      throw new CliError(`--alpha must be between 0 and 1; got ${values.alpha}`, 2);
    const options: AnalyzeOptions = {};
    if (alpha !== undefined) options.alpha = alpha;
    const adjust = choice("adjust", values.adjust, ADJUSTMENTS);
    if (adjust) options.adjust = adjust;
    const policy = choice("policy", values.policy, POLICIES);
    if (policy) options.policy = policy;
    const scale = choice("scale", values.scale, SCALES);
    if (scale) options.scale = scale;
    const question = choice("question", values.question, ["means", "larger-values"] as const);
    if (question) options.question = question;
    const plannedSizes = choice("planned-sizes", values["planned-sizes"], ["equal", "unequal"] as const);
    if (plannedSizes) options.plannedSizes = plannedSizes;
    if (values.seed !== undefined) {
      const seed = Number(values.seed);
      if (!Number.isSafeInteger(seed) || seed < 0)
        throw new CliError(`--seed must be a non-negative integer; got '${values.seed}'`, 2);
      options.errorRateCheck = { seed };
    }
    if (values.control !== undefined) options.control = values.control;
    const out = analyzeCommand({
      file: positionals[0] as string,
      group: values.group,
      outcome: values.outcome,
      json: values.json === true,
      options,
    });
    for (const w of out.warnings) io.stderr(`${PREFIX}warning: ${w}\n`);
    io.stdout(out.stdout);
    return 0;
  }
  if (command === "power") {
    const { values, positionals } = parseArgs({
      args: [...rest],
      allowPositionals: false,
      strict: true,
      options: {
        groups: { type: "string" },
        "effect-f": { type: "string" },
        alpha: { type: "string" },
        n: { type: "string" },
        power: { type: "string" },
        json: { type: "boolean", default: false },
        help: { type: "boolean", default: false },
      },
    });
    void positionals;
    if (values.help) {
      io.stdout(USAGE);
      return 0;
    }
    const k = numberOption("groups", values.groups);
    const f = numberOption("effect-f", values["effect-f"]);
    const alpha = numberOption("alpha", values.alpha) ?? 0.05;
    const n = numberOption("n", values.n);
    const power = numberOption("power", values.power);
    if (k === undefined) throw new CliError("power needs --groups K", 2);
    if (f === undefined) throw new CliError("power needs --effect-f F (Cohen's f)", 2);
    if ((n === undefined) === (power === undefined))
      throw new CliError(
        "power needs exactly one of --n N (to get the power) or --power P (to get the sample size)",
        2,
      );
    if (!Number.isInteger(k) || k < 2)
      throw new CliError(`--groups must be a whole number of at least 2; got ${values.groups}`, 2);
    if (!(f > 0)) throw new CliError(`--effect-f must be positive; got ${values["effect-f"]}`, 2);
    if (!(alpha > 0 && alpha < 1))
      throw new CliError(`--alpha must be between 0 and 1; got ${values.alpha}`, 2);
    if (n !== undefined && !(Number.isInteger(n) && n >= 2))
      throw new CliError(`--n must be a whole number of at least 2; got ${values.n}`, 2);
    if (power !== undefined && !(power > 0 && power < 1))
      throw new CliError(`--power must be between 0 and 1; got ${values.power}`, 2);
    io.stdout(
      powerCommand({
        k,
        f,
        alpha,
        ...(n !== undefined ? { n } : {}),
        ...(power !== undefined ? { power } : {}),
        json: values.json === true,
      }),
    );
    return 0;
  }
  throw new CliError(`unknown command '${command}'; use analyze or power (see --help)`, 2);
}
