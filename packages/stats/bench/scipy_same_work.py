"""The scipy/statsmodels side of bench/run-bench.mjs: the same analysis work on the same values.

Reads a float64 file (group sizes in the JSON argument), times the work inside Python with
time.perf_counter (so interpreter start-up and data loading are excluded), and prints JSON
with the median and every run. Work: scipy.stats.f_oneway, statsmodels anova_oneway
(use_var="unequal"), scipy.stats.kruskal, scipy.stats.levene (center="mean" and "median"),
scipy.stats.bartlett, scipy.stats.tukey_hsd, and per-group descriptives
(scipy.stats.describe, numpy.percentile, skew and kurtosis with bias=False).
"""
import json
import statistics
import sys
import time

import numpy as np
import scipy
import statsmodels
from scipy import stats
from statsmodels.stats.oneway import anova_oneway


def work(groups):
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


def main():
    path, sizes, runs = sys.argv[1], json.loads(sys.argv[2]), int(sys.argv[3])
    data = np.fromfile(path, dtype="<f8")
    groups, start = [], 0
    for n in sizes:
        groups.append(data[start:start + n])
        start += n
    work(groups)  # warm-up
    times = []
    for _ in range(runs):
        t0 = time.perf_counter()
        work(groups)
        times.append((time.perf_counter() - t0) * 1000)
    json.dump({"medianMs": statistics.median(times), "runsMs": times,
               "versions": {"scipy": scipy.__version__, "statsmodels": statsmodels.__version__, "numpy": np.__version__}}, sys.stdout)


main()
