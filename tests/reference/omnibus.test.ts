import { afterAll, describe, expect, it } from "vitest";
import { kruskalWallis } from "../../packages/stats/src/omnibus/kruskal-wallis.js";
import { oneWayAnova } from "../../packages/stats/src/omnibus/one-way-anova.js";
import { welchAnova } from "../../packages/stats/src/omnibus/welch-anova.js";
import { pClose, referenceDatasets, relErr } from "./datasets.js";
import { runPython } from "./python.js";

interface Ref {
  versions: Record<string, string>;
  results: {
    id: string;
    f_oneway: { F: number; p: number };
    welch: { F: number; p: number; df1: number; df2: number };
    kruskal: { H: number; p: number };
    exact: { ssBetween: number; ssWithin: number; F?: number; rSquared?: number };
    exactWelch: { F: number; df2: number; p: number } | null;
  }[];
}

const datasets = referenceDatasets();
// scipy 1.10.1 / statsmodels 0.13.5 (Debian, /usr/bin/python3) via tests/reference/python/omnibus_runner.py,
// read from tests/reference/fixtures/omnibus.json (which records the versions).
const ref = runPython<Ref>("omnibus_runner.py", {
  datasets: datasets.map((d) => ({ id: d.id, groups: d.groups.map((g) => g.values) })),
});
const worst: Record<string, number> = {};
const note = (key: string, e: number) => (worst[key] = Math.max(worst[key] ?? 0, e));

afterAll(() => {
  console.log(`omnibus reference (${JSON.stringify(ref.versions)}) worst errors:`, worst);
});

describe("omnibus tests against scipy 1.10.1 / statsmodels 0.13.5 and exact rational arithmetic", () => {
  for (const d of datasets) {
    const r = ref.results.find((x) => x.id === d.id);
    if (!r) throw new Error(`no reference for ${d.id}`);

    it(`${d.id}: one-way ANOVA F and p vs scipy.stats.f_oneway${d.hard ? " (hard: vs exact Fraction arithmetic)" : ""}`, () => {
      const a = oneWayAnova(d.groups);
      expect(a.available).toBe(true);
      if (!a.available) return;
      // Exact rational SS and F (Python fractions.Fraction on the decimal text): always ≤ 1e-12 here.
      note(
        "anova SS vs exact (rel)",
        Math.max(relErr(a.ssBetween, r.exact.ssBetween), relErr(a.ssWithin, r.exact.ssWithin)),
      );
      expect(relErr(a.ssBetween, r.exact.ssBetween)).toBeLessThan(1e-12);
      expect(relErr(a.ssWithin, r.exact.ssWithin)).toBeLessThan(1e-12);
      expect(relErr(a.F, r.exact.F as number)).toBeLessThan(1e-12);
      if (d.hard) {
        // scipy's f_oneway works from doubles and loses digits here; record how many.
        note(
          "scipy f_oneway F vs exact on hard sets (rel, reference's own error)",
          relErr(r.f_oneway.F, r.exact.F as number),
        );
      } else {
        note("anova F vs f_oneway (rel)", relErr(a.F, r.f_oneway.F));
        note("anova p vs f_oneway (abs)", Math.abs(a.p - r.f_oneway.p));
        expect(relErr(a.F, r.f_oneway.F)).toBeLessThan(1e-9);
        expect(pClose(a.p, r.f_oneway.p)).toBe(true);
      }
    });

    it(`${d.id}: Welch's ANOVA vs statsmodels anova_oneway(use_var="unequal")`, () => {
      const w = welchAnova(d.groups);
      expect(w.available).toBe(true);
      if (!w.available) return;
      expect(w.df1).toBe(r.welch.df1);
      if (d.hard) {
        // statsmodels works from doubles and loses digits on offset data: compare with exact
        // rational Welch (Fraction) instead and record statsmodels' own error.
        const ex = r.exactWelch as NonNullable<typeof r.exactWelch>;
        note("welch F vs exact Fraction on hard sets (rel)", relErr(w.F, ex.F));
        note(
          "statsmodels welch F vs exact on hard sets (rel, reference's own error)",
          relErr(r.welch.F, ex.F),
        );
        expect(relErr(w.F, ex.F)).toBeLessThan(1e-12);
        expect(relErr(w.df2, ex.df2)).toBeLessThan(1e-12);
        expect(pClose(w.p, ex.p)).toBe(true);
        return;
      }
      note("welch F (rel)", relErr(w.F, r.welch.F));
      note("welch df2 (rel)", relErr(w.df2, r.welch.df2));
      note("welch p (abs)", Math.abs(w.p - r.welch.p));
      expect(relErr(w.F, r.welch.F)).toBeLessThan(1e-9);
      expect(relErr(w.df2, r.welch.df2)).toBeLessThan(1e-9);
      expect(pClose(w.p, r.welch.p)).toBe(true);
    });

    it(`${d.id}: Kruskal–Wallis H and p vs scipy.stats.kruskal`, () => {
      const k = kruskalWallis(d.groups, { permutation: false });
      expect(k.available).toBe(true);
      if (!k.available) return;
      note("kruskal H (rel)", relErr(k.H, r.kruskal.H));
      note("kruskal p (abs)", Math.abs(k.p - r.kruskal.p));
      expect(relErr(k.H, r.kruskal.H)).toBeLessThan(1e-9);
      expect(pClose(k.p, r.kruskal.p)).toBe(true);
    });
  }
});
