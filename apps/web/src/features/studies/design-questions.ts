import type { DesignAnswers, DesignQuestion as DesignKey } from "@waymark/contract";

export interface DesignOption {
  value: string;
  label: string;
  detail: string;
}

export interface DesignQuestion {
  key: DesignKey;
  question: string;
  why: string;
  options: DesignOption[];
  /** Shown when the analyst answers "not sure": what to find out, and what Waymark assumes meanwhile. */
  notSure: { findOut: string; assume: string };
  /** Short form of each answer for the summary. */
  short: Record<string, string>;
}

const UNSURE: DesignOption = { value: "unsure", label: "Not sure", detail: "Tell me what to find out" };

export const DESIGN_QUESTIONS: DesignQuestion[] = [
  {
    key: "independence",
    question: "Was each unit measured in one group only?",
    why: "The tests here assume every measurement comes from its own unit, unrelated to the units in the other groups.",
    options: [
      {
        value: "independent",
        label: "Yes, independent groups",
        detail: "Each specimen, person or plot belongs to exactly one group.",
      },
      {
        value: "paired",
        label: "No, the same or matched units appear in several groups",
        detail: "For example the same people measured before and after, or matched sets split across groups.",
      },
      UNSURE,
    ],
    notSure: {
      findOut:
        "Ask whoever collected the data whether any unit was measured more than once, or whether units were deliberately matched in sets across the groups (same batch, same person, same day block).",
      assume:
        "Waymark assumes nothing here: whether the groups are independent decides whether these methods apply at all, so the plan cannot be locked until you know. Your other answers are kept meanwhile.",
    },
    short: {
      independent: "Independent groups",
      paired: "Same or matched units",
      unsure: "Not sure yet (blocks the plan)",
    },
  },
  {
    key: "scale",
    question: "Is the outcome a measured quantity or an ordered rating?",
    why: "Means and standard deviations make sense for measured quantities; ratings on a short ordered scale call for a rank-based test.",
    options: [
      {
        value: "continuous",
        label: "A measured quantity",
        detail: "Strength in MPa, a concentration, a time: equal steps mean equal differences.",
      },
      {
        value: "ordinal",
        label: "An ordered rating",
        detail: "A score from 1 to 5, a severity grade: the order matters, the distances may not.",
      },
      UNSURE,
    ],
    notSure: {
      findOut:
        "Check how the outcome is recorded: does it have a physical unit and many possible values, or a handful of ordered categories?",
      assume:
        "Waymark treats the outcome as a measured quantity. The checks on the data inform the reading and the sensitivity analyses; they do not change the test the plan names.",
    },
    short: {
      continuous: "Measured quantity",
      ordinal: "Ordered rating",
      unsure: "Not sure (treated as measured)",
    },
  },
  {
    key: "question",
    question: "What should the comparison tell you about a measured outcome?",
    why: "The question decides the primary test before any data are seen: a question about averages is answered by Welch's ANOVA, a question about which group tends to have larger values by the Kruskal–Wallis test. The checks on the data never switch one for the other.",
    options: [
      {
        value: "means",
        label: "Whether the average amounts differ",
        detail: "For example the mean strength or the mean handling time of each group.",
      },
      {
        value: "larger-values",
        label: "Whether one group tends to have larger values",
        detail: "Which group's values tend to lie above another's, without asking about averages.",
      },
      UNSURE,
    ],
    notSure: {
      findOut:
        "Ask what decision the result feeds: a cost, dose or total over many units depends on the averages; a question of which option usually does better is about larger values.",
      assume: "Waymark plans a comparison of averages (Welch's ANOVA), the more common question.",
    },
    short: {
      means: "Average amounts",
      "larger-values": "Which group tends to be larger",
      unsure: "Not sure (averages)",
    },
  },
  {
    key: "groupSizes",
    question: "Does the plan put the same number of units in every group?",
    why: "Classic one-way ANOVA holds its error rate best when the groups are the same size; with unequal sizes the plan uses Welch's ANOVA for a question about averages.",
    options: [
      { value: "equal", label: "Yes, the same number in every group", detail: "A balanced design." },
      {
        value: "unequal",
        label: "No, the groups differ in size",
        detail: "For example whatever arrived in each group during the study period.",
      },
      UNSURE,
    ],
    notSure: {
      findOut: "Look at how units are allocated: a fixed number per group, or as they come.",
      assume: "Waymark assumes unequal sizes, the cautious reading.",
    },
    short: { equal: "Equal sizes", unequal: "Unequal sizes", unsure: "Not sure (unequal)" },
  },
  {
    key: "hasControl",
    question: "Is one of the groups a control or reference?",
    why: "Comparing each group only with a control needs fewer comparisons than comparing every pair, so each comparison keeps more power.",
    options: [
      {
        value: "yes",
        label: "Yes",
        detail: "One group is the standard, the untreated or the current practice.",
      },
      { value: "no", label: "No", detail: "All groups are on an equal footing." },
      UNSURE,
    ],
    notSure: {
      findOut:
        "Look at the objective: is the question “is anything better than what we do now?” (a control) or “how do these options differ from one another?” (no control).",
      assume: "Waymark assumes there is no control group and plans comparisons of every pair.",
    },
    short: { yes: "Yes", no: "No", unsure: "Not sure (assumed none)" },
  },
  {
    key: "comparisons",
    question: "Which comparisons answer your question?",
    why: "The follow-up comparisons are chosen before the data are seen, so the error rate over all of them can be held at α.",
    options: [
      {
        value: "all-pairs",
        label: "Every pair of groups",
        detail: "For k groups that is k(k − 1)/2 comparisons.",
      },
      {
        value: "vs-control",
        label: "Each group against the control",
        detail: "k − 1 comparisons; needs a control group.",
      },
      UNSURE,
    ],
    notSure: {
      findOut:
        "Decide with the study's owner which differences would change a decision. If only the difference from the control matters, compare with the control.",
      assume: "Waymark plans comparisons of every pair, the wider and more conservative family.",
    },
    short: {
      "all-pairs": "Every pair",
      "vs-control": "Each against the control",
      unsure: "Not sure (every pair)",
    },
  },
  {
    key: "assignment",
    question: "How did units end up in their groups?",
    why: "Random assignment lets a difference be read as caused by the grouping; otherwise it shows an association that other factors may explain.",
    options: [
      {
        value: "randomized",
        label: "Assigned at random",
        detail: "A random draw decided each unit's group.",
      },
      {
        value: "convenience",
        label: "Assigned as they came",
        detail: "Units were put into groups by availability, order or convenience.",
      },
      {
        value: "observational",
        label: "The groups already existed",
        detail: "Units were observed in the groups they were in, not assigned.",
      },
      UNSURE,
    ],
    notSure: {
      findOut: "Ask how each unit's group was decided, and whether a random draw was recorded.",
      assume:
        "Waymark words the results as associations between group and outcome, not as effects of the grouping.",
    },
    short: {
      randomized: "At random",
      convenience: "As they came",
      observational: "Groups already existed",
      unsure: "Not sure (read as association)",
    },
  },
];

/** Index of the first unanswered question, or the number of questions when all are answered. */
export function firstUnanswered(design: DesignAnswers): number {
  const i = DESIGN_QUESTIONS.findIndex((q) => design[q.key] === undefined);
  return i === -1 ? DESIGN_QUESTIONS.length : i;
}
