import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { seedDemoStudies } from "./demo-studies.js";

// Every sentence the product writes about the demo studies — study status, checks, the plan's
// test and its reasons, the error-rate check, sensitivity analyses, result summaries and the
// report preview — read by the rules of plain English the product promises (common practice):
// test names capitalised, no doubled articles, singular after 1, units exactly as entered.

let sentences: { where: string; text: string }[] = [];
let units: string[] = [];

/** Every string inside a JSON value, with the path it came from. */
function strings(value: unknown, where: string, out: { where: string; text: string }[]) {
  if (typeof value === "string") out.push({ where, text: value });
  else if (Array.isArray(value)) value.forEach((v, i) => strings(v, `${where}[${i}]`, out));
  else if (value && typeof value === "object")
    for (const [k, v] of Object.entries(value)) strings(v, `${where}.${k}`, out);
}

/** Keys whose strings are sentences a person reads (not ids, names or dates). */
const PROSE =
  /\.(text|detail|label|action|reason|reasons|summary|notes|caption|items)(\[\d+\])?$|warnings\[\d+\]$/;

beforeAll(async () => {
  const t = await makeTestApp();
  await seedDemoStudies(t.ds, t.env.demoPassword);
  const analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  const reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
  const all: { where: string; text: string }[] = [];
  const studies = (await analyst.get("/api/studies").expect(200)).body.studies as {
    id: number;
    outcomeUnit: string;
    latestDataset: { id: number } | null;
  }[];
  units = studies.map((s) => s.outcomeUnit).filter((u) => u.length > 0);
  for (const s of studies) {
    strings(s, `study ${s.id}`, all);
    if (s.latestDataset) {
      const checks = await analyst
        .get(`/api/studies/${s.id}/datasets/${s.latestDataset.id}/checks`)
        .expect(200);
      strings({ checks: checks.body.checks, readings: checks.body.readings }, `checks ${s.id}`, all);
    }
    const analyses = (await analyst.get(`/api/studies/${s.id}/analyses`).expect(200)).body.analyses;
    strings(analyses, `analyses ${s.id}`, all);
    const preview = await analyst.get(`/api/studies/${s.id}/report/preview?draft=1`);
    if (preview.status === 200) strings(preview.body, `report ${s.id}`, all);
    const approved = await reviewer.get(`/api/studies/${s.id}/report/preview`);
    if (approved.status === 200) strings(approved.body, `approved report ${s.id}`, all);
  }
  sentences = all.filter((x) => PROSE.test(x.where) && /\s/.test(x.text));
  await t.services.stop();
}, 180_000);

describe("every sentence the product writes for the demo studies", () => {
  it("has enough sentences to mean something", () => {
    expect(sentences.length).toBeGreaterThan(100);
  });

  it("capitalises the names of tests and methods", () => {
    const lower =
      /\b(welch's|kruskal–wallis|tukey–kramer|games–howell|dunn's|dunnett's|shapiro–wilk|brown–forsythe|levene's|bartlett's|hodges–lehmann)\b/;
    expect(sentences.filter((s) => lower.test(s.text))).toEqual([]);
  });

  it("has no doubled articles", () => {
    const doubled = /\b(the|a|an) (the|a|an)\b/i;
    expect(sentences.filter((s) => doubled.test(s.text))).toEqual([]);
  });

  it("puts a singular noun after 1", () => {
    const plural =
      /(?<![\d.,])\b1 (comparisons|values|groups|rows|pairs|tests|runs|versions|comments|analyses)\b/;
    expect(sentences.filter((s) => plural.test(s.text))).toEqual([]);
  });

  it("writes units as they were entered", () => {
    for (const unit of units) {
      const lowered = unit.toLowerCase();
      if (lowered === unit) continue;
      const mangled = new RegExp(`\\(${lowered.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}\\)`);
      expect(sentences.filter((s) => mangled.test(s.text))).toEqual([]);
    }
    expect(sentences.some((s) => units.some((u) => s.text.includes(u)))).toBe(true);
  });

  it("never prints NaN, Infinity, undefined or an object in prose", () => {
    // "F is undefined" is the mathematical statement of a reason, not a leaked value.
    const leaked = /\bNaN\b|Infinity|\[object|(?<!is |are )\bundefined\b/;
    expect(sentences.filter((s) => leaked.test(s.text))).toEqual([]);
  });
});
