import type { StudyContext } from "../../../modules/studies/study.entity.js";
import type { DesignAnswers } from "../../../modules/studies/design.js";
import type { OmnibusTest } from "@waymark/stats";
import { seededRandom } from "./seeded-random.js";

/** An invented demo study: its details, design answers, plan and a generated CSV. */
export interface DemoScenario {
  title: string;
  objective: string;
  outcomeName: string;
  outcomeUnit: string;
  factorName: string;
  levels: string[];
  controlLevel: string | null;
  context: StudyContext;
  design: DesignAnswers;
  effectF: number;
  fileName: string;
  csv: string;
  /** The test this scenario is built to land on; a test checks the engine agrees. */
  expectedTest: OmnibusTest;
}

function toCsv(header: [string, string], rows: [string, number][], decimals: number): string {
  const q = (s: string) => `"${s.replace(/"/g, '""')}"`;
  return (
    [header.map(q).join(","), ...rows.map(([g, v]) => `${q(g)},${v.toFixed(decimals)}`)].join("\n") + "\n"
  );
}

/** Materials lab: four curing methods, equal planned sizes, similar spread → classic ANOVA under a classic-first plan. */
function curing(): DemoScenario {
  const r = seededRandom(4141);
  const methods: [string, number][] = [
    ["Moist room", 41.5],
    ["Lime-water tank", 42.4],
    ["Sealed membrane", 39.2],
    ["Steam, 60 °C", 43.6],
  ];
  const rows: [string, number][] = [];
  for (const [m, mean] of methods) for (let i = 0; i < 10; i++) rows.push([m, mean + 1.8 * r.normal()]);
  return {
    title: "Compressive strength of test cylinders under four curing methods",
    objective:
      "Find out whether the curing method changes the 28-day compressive strength of the plant's standard concrete mix, before choosing the method for next season's precast beams.",
    outcomeName: "28-day compressive strength",
    outcomeUnit: "MPa",
    factorName: "Curing method",
    levels: methods.map((m) => m[0]),
    controlLevel: "Moist room",
    context: "safety-critical",
    design: {
      independence: "independent",
      scale: "continuous",
      question: "means",
      groupSizes: "equal",
      hasControl: "yes",
      comparisons: "all-pairs",
      assignment: "randomized",
    },
    effectF: 0.5,
    fileName: "cylinder-strength.csv",
    csv: toCsv(["Curing method", "Strength (MPa)"], rows, 1),
    expectedTest: "anova",
  };
}

/** Contact centre: a question about average times, unequal group sizes by design → Welch's ANOVA from the plan. */
function routing(): DemoScenario {
  const r = seededRandom(7310);
  const rules: [string, number, number, number][] = [
    ["Round robin", 312, 38, 52],
    ["Skills match", 288, 84, 37],
    ["Longest idle", 331, 131, 31],
  ];
  const rows: [string, number][] = [];
  for (const [rule, mean, sd, n] of rules)
    for (let i = 0; i < n; i++) rows.push([rule, Math.max(60, mean + sd * r.normal())]);
  return {
    title: "Call handling time under three routing rules",
    objective:
      "Compare the average handling time of support calls under the three routing rules piloted in October, to decide which rule to keep.",
    outcomeName: "Handling time",
    outcomeUnit: "s",
    factorName: "Routing rule",
    levels: rules.map((x) => x[0]),
    controlLevel: null,
    context: "general",
    design: {
      independence: "independent",
      scale: "continuous",
      question: "means",
      groupSizes: "unequal",
      hasControl: "no",
      comparisons: "all-pairs",
      assignment: "convenience",
    },
    effectF: 0.25,
    fileName: "handling-times.csv",
    csv: toCsv(["Routing rule", "Handling time (s)"], rows, 0),
    expectedTest: "welch",
  };
}

/** Greenhouse: the question is whether longer light tends to give taller seedlings (skewed, a few extreme plants) → Kruskal–Wallis from the plan. */
function seedlings(): DemoScenario {
  const r = seededRandom(2207);
  const schedules: [string, number][] = [
    ["12 h light", 3.2],
    ["16 h light", 3.5],
    ["20 h light", 3.35],
  ];
  const rows: [string, number][] = [];
  for (const [s, logMean] of schedules) {
    for (let i = 0; i < 12; i++) rows.push([s, Math.exp(logMean + 0.35 * r.normal())]);
  }
  // A few plants that bolted: the kind of extreme values a greenhouse log really holds.
  rows.push(["16 h light", 118.4], ["20 h light", 131.9]);
  return {
    title: "Seedling height under three light schedules",
    objective:
      "Check whether tomato seedlings grown under a longer daily light schedule tend to be taller at transplant, to set the schedule for the spring batch.",
    outcomeName: "Seedling height",
    outcomeUnit: "mm",
    factorName: "Light schedule",
    levels: schedules.map((s) => s[0]),
    controlLevel: "12 h light",
    context: "general",
    design: {
      independence: "independent",
      scale: "continuous",
      question: "larger-values",
      groupSizes: "equal",
      hasControl: "yes",
      comparisons: "vs-control",
      assignment: "randomized",
    },
    effectF: 0.4,
    fileName: "seedling-heights.csv",
    csv: toCsv(["Light schedule", "Height (mm)"], rows, 1),
    expectedTest: "kruskal-wallis",
  };
}

export function demoScenarios(): DemoScenario[] {
  return [curing(), routing(), seedlings()];
}
