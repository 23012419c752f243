/**
 * Every limit a person can run into, defined once: the API enforces them, the web's forms show
 * them (character counters, hints) from the same numbers.
 */
export const LIMITS = {
  title: 200,
  objective: 4000,
  outcomeName: 120,
  outcomeUnit: 40,
  factorName: 120,
  levelName: 120,
  minLevels: 2,
  /** Waymark compares at most this many groups. */
  maxLevels: 20,
  /** α lies in (0, alphaMax]: above .20 is not a usual significance level (common practice). */
  alphaMax: 0.2,
  /** A deviation from the plan's primary test needs a written justification at least this long. */
  minJustification: 20,
  maxJustification: 4000,
  comment: 4000,
  minSignatureMeaning: 5,
  maxSignatureMeaning: 300,
  maxStepComments: 20,
  email: 254,
  password: 200,
  displayName: 120,
  columnName: 200,
  /** Cohen's f above this is not a plausible planning effect. */
  maxEffectF: 5,
  minTargetPower: 0.5,
  maxTargetPower: 0.999,
  /** Power calculator bounds. */
  maxPowerGroups: 50,
  maxPowerN: 100_000,
} as const;

/** The one wording of the α rule, for every form and every 4xx. */
export const ALPHA_MESSAGE = "α must be above 0 and at most .20 (higher is not a usual significance level)";
