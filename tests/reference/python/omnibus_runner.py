"""Reference values for the omnibus tests of @waymark/stats (one-way ANOVA, Welch, Kruskal–Wallis).

Reads JSON {"datasets": [{"id", "groups": [[values...], ...]}]} from stdin, prints JSON.
Values may be JSON numbers (parsed to doubles, the same doubles the engine sees) or decimal
strings. Library values: scipy.stats.f_oneway, statsmodels.stats.oneway.anova_oneway
(use_var="unequal", Welch 1951), scipy.stats.kruskal. Exact values: the sums of squares and
F computed in rational arithmetic (fractions.Fraction) from the decimal text, the same
standard the NIST StRD certified values follow; used where doubles lose digits (large offsets).
"""
import json
import sys
from fractions import Fraction

import numpy as np
import scipy
import statsmodels
from scipy import stats
from statsmodels.stats.oneway import anova_oneway


def exact_anova(groups):
    """SS between, SS within and F in exact rational arithmetic."""
    fr = [[Fraction(str(v)) if isinstance(v, str) else Fraction(v) for v in g] for g in groups]
    n_total = sum(len(g) for g in fr)
    grand = sum(sum(g) for g in fr) / n_total
    means = [sum(g) / len(g) for g in fr]
    ssb = sum(len(g) * (m - grand) ** 2 for g, m in zip(fr, means))
    ssw = sum(sum((x - m) ** 2 for x in g) for g, m in zip(fr, means))
    k = len(fr)
    out = {"ssBetween": float(ssb), "ssWithin": float(ssw)}
    if ssw != 0:
        out["F"] = float((ssb / (k - 1)) / (ssw / (n_total - k)))
        out["rSquared"] = float(ssb / (ssb + ssw))
    return out


def exact_welch(groups):
    """Welch (1951) F and df2 in exact rational arithmetic; p from scipy.stats.f.sf at those values."""
    fr = [[Fraction(str(v)) if isinstance(v, str) else Fraction(v) for v in g] for g in groups]
    k = len(fr)
    stats_ = []
    for g in fr:
        n = len(g)
        m = sum(g) / n
        var = sum((x - m) ** 2 for x in g) / (n - 1)
        if var == 0:
            return None
        stats_.append((n, m, var))
    w = [n / v for n, m, v in stats_]
    W = sum(w)
    xw = sum(wi * m for wi, (n, m, v) in zip(w, stats_)) / W
    lam = sum((1 - wi / W) ** 2 / (n - 1) for wi, (n, m, v) in zip(w, stats_))
    F = (sum(wi * (m - xw) ** 2 for wi, (n, m, v) in zip(w, stats_)) / (k - 1)) / (1 + Fraction(2 * (k - 2)) * lam / (k * k - 1))
    df2 = Fraction(k * k - 1) / (3 * lam)
    return {"F": float(F), "df2": float(df2), "p": float(stats.f.sf(float(F), k - 1, float(df2)))}


def main():
    payload = json.load(sys.stdin)
    results = []
    for ds in payload["datasets"]:
        groups = [np.array([float(v) for v in g], dtype=float) for g in ds["groups"]]
        f = stats.f_oneway(*groups)
        w = anova_oneway(groups, use_var="unequal")
        kw = stats.kruskal(*groups)
        results.append({
            "id": ds["id"],
            "f_oneway": {"F": float(f.statistic), "p": float(f.pvalue)},
            "welch": {"F": float(w.statistic), "p": float(w.pvalue), "df1": float(w.df[0]), "df2": float(w.df[1])},
            "kruskal": {"H": float(kw.statistic), "p": float(kw.pvalue)},
            "exact": exact_anova(ds["groups"]),
            "exactWelch": exact_welch(ds["groups"]),
        })
    json.dump({"versions": {"scipy": scipy.__version__, "statsmodels": statsmodels.__version__, "numpy": np.__version__},
               "results": results}, sys.stdout)


main()
