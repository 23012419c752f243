"""The scipy/statsmodels side of bench/run-bench.mjs: the same analysis work on the same values.

Reads a float64 file (group sizes in the JSON argument), times the work inside Python with
time.perf_counter (so interpreter start-up and data loading are excluded), and prints JSON
with the median and every run, for two work lists:

- "same": what analyze() computes on these data (1,000,000 values in 10 groups; at this size
  analyze() skips Shapiro–Wilk, Hodges–Lehmann intervals and the error-rate simulation, so
  this does too), each with the scipy/statsmodels function a scipy user would call, or the
  published formula on numpy where no library function exists:
  per group describe, percentiles 25/50/75, bias-corrected skew and kurtosis, the t interval
  of the mean; f_oneway with the 95% interval of eta squared by inverting ncf.cdf (brentq);
  anova_oneway(use_var="unequal") and anova_oneway(use_var="unequal", trim_frac=0.2); kruskal;
  levene (mean and median); bartlett; the SD ratio; tukey_hsd with confidence_interval();
  Games–Howell (Welch df per pair, studentized_range.sf and .ppf); Dunn's test (rankdata of
  the pooled values, tie-corrected z per pair, norm.sf, Holm via multipletests); per pair
  Hedges' g and the Mann–Whitney U (searchsorted on the sorted groups); Tukey's fences and
  studentized residuals beyond 3 (counts); Grubbs-type fences (t.ppf per group, counts);
  the normal Q–Q points (sorted pooled residuals at 1,000 Blom positions, norm.ppf).
- "subset": the smaller list this benchmark used before (f_oneway, anova_oneway(unequal),
  kruskal, levene mean/median, bartlett, tukey_hsd without intervals, per-group describe,
  percentiles, skew, kurtosis), kept for comparison with earlier figures.
"""
import json
import statistics
import sys
import time

import numpy as np
import scipy
import statsmodels
from scipy import optimize, stats
from statsmodels.stats.multitest import multipletests
from statsmodels.stats.oneway import anova_oneway


def subset(groups):
    stats.f_oneway(*groups)
    anova_oneway(groups, use_var="unequal")
    stats.kruskal(*groups)
    stats.levene(*groups, center="mean")
    stats.levene(*groups, center="median")
    stats.bartlett(*groups)
    stats.tukey_hsd(*groups)
    for g in groups:
        stats.describe(g)
        np.percentile(g, [25, 50, 75])
        stats.skew(g, bias=False)
        stats.kurtosis(g, bias=False)


def eta_squared_ci(F, df1, df2, level=0.95):
    n_total = df1 + df2 + 1
    lo_target, hi_target = 1 - (1 - level) / 2, (1 - level) / 2

    def root(target):
        f = lambda nc: stats.ncf.cdf(F, df1, df2, nc) - target
        if f(0) < 0:
            return 0.0
        hi = max(1.0, F * df1)
        while f(hi) > 0:
            hi *= 2
        return optimize.brentq(f, 0, hi, xtol=1e-10)

    lam_l, lam_u = root(lo_target), root(hi_target)
    return lam_l / (lam_l + n_total), lam_u / (lam_u + n_total)


def same(groups):
    k = len(groups)
    n = np.array([len(g) for g in groups], dtype=float)
    means = np.array([g.mean() for g in groups])
    var = np.array([g.var(ddof=1) for g in groups])
    quart = []
    for g in groups:
        stats.describe(g)
        quart.append(np.percentile(g, [25, 50, 75]))
        stats.skew(g, bias=False)
        stats.kurtosis(g, bias=False)
        stats.t.interval(0.95, len(g) - 1, loc=g.mean(), scale=stats.sem(g))
    f = stats.f_oneway(*groups)
    eta_squared_ci(f.statistic, k - 1, int(n.sum()) - k)
    anova_oneway(groups, use_var="unequal")
    anova_oneway(groups, use_var="unequal", trim_frac=0.2)
    stats.kruskal(*groups)
    stats.levene(*groups, center="mean")
    stats.levene(*groups, center="median")
    stats.bartlett(*groups)
    np.sqrt(var.max() / var.min())
    # Tukey–Kramer with its simultaneous intervals.
    tk = stats.tukey_hsd(*groups)
    tk.confidence_interval(0.95)
    # Games–Howell, Dunn, Hedges' g and Mann–Whitney U per pair.
    pooled = np.concatenate(groups)
    ranks = stats.rankdata(pooled)
    N = len(pooled)
    _, tie_counts = np.unique(pooled, return_counts=True)
    tie = 1 - (tie_counts**3 - tie_counts).sum() / (N**3 - N)
    mean_ranks, start = [], 0
    for g in groups:
        mean_ranks.append(ranks[start:start + len(g)].mean())
        start += len(g)
    sorted_groups = [np.sort(g) for g in groups]
    dunn_p = []
    for i in range(k):
        for j in range(i + 1, k):
            va, vb = var[i] / n[i], var[j] / n[j]
            se = np.sqrt((va + vb) / 2)
            df = (va + vb) ** 2 / (va**2 / (n[i] - 1) + vb**2 / (n[j] - 1))
            q = abs(means[i] - means[j]) / se
            stats.studentized_range.sf(q, k, df)
            stats.studentized_range.ppf(0.95, k, df)
            z = (mean_ranks[i] - mean_ranks[j]) / np.sqrt(N * (N + 1) / 12 * tie * (1 / n[i] + 1 / n[j]))
            dunn_p.append(2 * stats.norm.sf(abs(z)))
            sp = np.sqrt(((n[i] - 1) * var[i] + (n[j] - 1) * var[j]) / (n[i] + n[j] - 2))
            (means[i] - means[j]) / sp * (1 - 3 / (4 * (n[i] + n[j]) - 9))
            a, b = sorted_groups[i], sorted_groups[j]
            left = np.searchsorted(b, a, "left")
            right = np.searchsorted(b, a, "right")
            left.sum() + 0.5 * (right - left).sum()
    multipletests(dunn_p, method="holm")
    # Outliers: Tukey's fences, studentized residuals beyond 3, Grubbs-type fences.
    msw = ((n - 1) * var).sum() / (N - k)
    for g, (q1, _, q3), m, s2, ng in zip(groups, quart, means, var, n):
        iqr = q3 - q1
        np.count_nonzero((g < q1 - 1.5 * iqr) | (g > q3 + 1.5 * iqr))
        np.count_nonzero((g < q1 - 3 * iqr) | (g > q3 + 3 * iqr))
        np.count_nonzero(np.abs(g - m) > 3 * np.sqrt(msw * (1 - 1 / ng)))
        t = stats.t.ppf(1 - 0.05 / (2 * ng), ng - 2)
        crit = (ng - 1) / np.sqrt(ng) * np.sqrt(t * t / (ng - 2 + t * t))
        np.count_nonzero(np.abs((g - m) / np.sqrt(s2)) > crit)
    # Normal Q–Q points of the pooled residuals.
    residuals = np.sort(np.concatenate([g - m for g, m in zip(groups, means)]))
    idx = np.round(1 + np.arange(1000) * (N - 1) / 999).astype(int)
    residuals[idx - 1]
    stats.norm.ppf((idx - 0.375) / (N + 0.25))


def timed(work, groups, runs):
    work(groups)  # warm-up
    times = []
    for _ in range(runs):
        t0 = time.perf_counter()
        work(groups)
        times.append((time.perf_counter() - t0) * 1000)
    return {"medianMs": statistics.median(times), "runsMs": times}


def main():
    path, sizes, runs = sys.argv[1], json.loads(sys.argv[2]), int(sys.argv[3])
    data = np.fromfile(path, dtype="<f8")
    groups, start = [], 0
    for n in sizes:
        groups.append(data[start:start + n])
        start += n
    json.dump({"same": timed(same, groups, runs), "subset": timed(subset, groups, runs),
               "versions": {"scipy": scipy.__version__, "statsmodels": statsmodels.__version__, "numpy": np.__version__}}, sys.stdout)


main()
