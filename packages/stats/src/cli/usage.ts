/** The --help text: subcommands and their options. */
export const USAGE = `waymark-stats — compare an outcome across independent groups

Usage:
  waymark-stats analyze FILE.csv --group COLUMN --outcome COLUMN [options]
  waymark-stats power --groups K --effect-f F (--n N | --power P) [--alpha A] [--json]
  waymark-stats --help | --version

analyze options:
  --group COLUMN       column holding the group labels
  --outcome COLUMN     column holding the measured outcome (decimal point)
  --alpha A            significance level, default 0.05
  --adjust METHOD      holm (default), bonferroni or bh, for rank comparisons
  --control LEVEL      the control group, for comparisons against it
  --policy POLICY      classic-first (default) or welch-first; the primary test
                       follows from these answers before the data are read
  --scale SCALE        continuous (default) or ordinal
  --question Q         means (default): are the group averages equal?
                       larger-values: does some group tend to have larger values?
  --planned-sizes S    equal or unequal (default): did the plan put the same
                       number of units in every group?
  --seed N             seed of the error-rate simulation, default 1
  --json               print the full result as one JSON object

power options:
  --groups K           number of groups (at least 2)
  --effect-f F         effect size as Cohen's f
  --n N                values per group: report the power
  --power P            target power: report the values per group needed
  --alpha A            significance level, default 0.05
  --json               print the result as one JSON object

Exit codes: 0 done (warnings go to stderr), 1 the data cannot be analysed, 2 usage error.
`;
