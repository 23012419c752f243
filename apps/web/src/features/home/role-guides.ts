import type { Role } from "@/lib/roles";

/** The steps every study walks through, and who carries each one. */
export const TRAIL: { step: string; owner: Role; what: string }[] = [
  {
    step: "Design questions",
    owner: "analyst",
    what: "Independent groups? Continuous or ordinal outcome? A control group?",
  },
  {
    step: "Plan and sample size",
    owner: "analyst",
    what: "Test policy, post-hoc method, α and n per group, locked before data.",
  },
  {
    step: "Data",
    owner: "analyst",
    what: "Upload a versioned CSV or XLSX and see what was read and excluded.",
  },
  { step: "Checks", owner: "analyst", what: "Normality, spread and outliers, each with a plain reading." },
  {
    step: "Test choice",
    owner: "analyst",
    what: "The test the locked plan decided, with its reasons and where the checks speak against it.",
  },
  { step: "Results", owner: "analyst", what: "Omnibus test, matched post-hoc comparisons and effect sizes." },
  {
    step: "Review and sign-off",
    owner: "reviewer",
    what: "A senior reviewer approves with an electronic signature or asks for changes.",
  },
  {
    step: "Report",
    owner: "writer",
    what: "A methods-and-results section as a DOCX, from the approved record.",
  },
];

export const ROLE_GUIDES: Record<Role, { title: string; summary: string; duties: string[] }> = {
  analyst: {
    title: "You carry a study from question to result",
    summary:
      "You answer the design questions, lock the analysis plan before seeing the data, upload the data, read the assumption checks, run the test the plan decided and submit it for review; if the reviewer sends it back, you reply to each comment at its step.",
    duties: [
      "Pre-specify the plan: the test policy, the matched post-hoc method and α are fixed with a timestamp when you lock it.",
      "Run a test other than the planned one only with a written reason: it is a deviation from the plan, and the reviewer and the report show it.",
      "Read effect sizes beside p-values: statistical significance is not the same as practical importance.",
    ],
  },
  reviewer: {
    title: "You decide whether an analysis is fit to leave the team",
    summary:
      "You see each submitted study's plan and when it was locked, the design answers, the checks, the planned test and any deviation from it, and the results; from the second round on, what changed since the last one. You approve with your password as an electronic signature, or send it back with comments.",
    duties: [
      "Check that the plan was locked before the data arrived.",
      "Look hardest at deviations from the plan and at checks that speak against the planned test.",
      "You cannot approve a study you created or analysed.",
    ],
  },
  writer: {
    title: "You turn approved analyses into report text",
    summary:
      "Once a reviewer has signed off a study, you download its methods-and-results section as a DOCX: design, plan, decision rule, tests, tables, figures, sign-off and references, generated from the stored record and never retyped.",
    duties: [
      "Reports exist only for approved studies; drafts are marked as not approved on every page.",
      "Every download is recorded in the audit trail.",
    ],
  },
  admin: {
    title: "You look after the people and the rules",
    summary:
      "You invite people by e-mail, give them their role, deactivate accounts that should no longer sign in, and set the organization's test policy: classic-first or Welch-first, the default α and the default p-value adjustment.",
    duties: [
      "An admin cannot approve a study they worked on, and cannot sign as someone else.",
      "The last admin cannot be removed or demoted.",
    ],
  },
};
