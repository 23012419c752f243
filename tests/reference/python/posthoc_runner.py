"""Reference values for the post-hoc methods of @waymark/stats.

Reads JSON from stdin, prints JSON. Library functions are used where they exist
(scipy.stats.tukey_hsd, scipy.stats.mannwhitneyu, scipy.stats.ttest_ind,
statsmodels.stats.multitest.multipletests); Games-Howell, Dunn and Hedges' g have no
library function here, so they are written out from their published formulas with
scipy's building blocks (studentized_range, rankdata, norm, gammaln).
"""
import json
import sys

import numpy as np
import scipy
import statsmodels
from scipy import special, stats
from statsmodels.stats.multitest import multipletests

SM_METHOD = {"holm": "holm", "bonferroni": "bonferroni", "bh": "fdr_bh"}


def tukey(case):
    groups = [np.asarray(g, float) for g in case["groups"]]
    res = stats.tukey_hsd(*groups)
    ci = res.confidence_interval(confidence_level=1 - case["alpha"])
    return {"statistic": res.statistic.tolist(), "pvalue": res.pvalue.tolist(),
            "low": ci.low.tolist(), "high": ci.high.tolist()}


def games_howell(case):
    groups = [np.asarray(g, float) for g in case["groups"]]
    k = len(groups)
    out = []
    for i in range(k):
        for j in range(i + 1, k):
            a, b = groups[i], groups[j]
            va, vb = a.var(ddof=1) / len(a), b.var(ddof=1) / len(b)
            diff = a.mean() - b.mean()
            se = np.sqrt((va + vb) / 2)
            df = (va + vb) ** 2 / (va ** 2 / (len(a) - 1) + vb ** 2 / (len(b) - 1))
            q = abs(diff) / se
            crit = stats.studentized_range.ppf(1 - case["alpha"], k, df)
            out.append({"diff": diff, "se": se, "df": df, "q": q,
                        "p": float(stats.studentized_range.sf(q, k, df)),
                        "lower": diff - crit * se, "upper": diff + crit * se})
    return out


def dunn(case):
    groups = [np.asarray(g, float) for g in case["groups"]]
    pooled = np.concatenate(groups)
    n = len(pooled)
    ranks = stats.rankdata(pooled)
    _, counts = np.unique(pooled, return_counts=True)
    ties = float(np.sum(counts.astype(float) ** 3 - counts))
    sigma2 = n * (n + 1) / 12 - ties / (12 * (n - 1))
    bounds = np.cumsum([0] + [len(g) for g in groups])
    mean_ranks = [ranks[bounds[i]:bounds[i + 1]].mean() for i in range(len(groups))]
    pairs = []
    for i in range(len(groups)):
        for j in range(i + 1, len(groups)):
            z = (mean_ranks[i] - mean_ranks[j]) / np.sqrt(sigma2 * (1 / len(groups[i]) + 1 / len(groups[j])))
            u = stats.mannwhitneyu(groups[i], groups[j], alternative="two-sided").statistic
            pairs.append({"z": z, "p": 2 * stats.norm.sf(abs(z)), "u": float(u),
                          "r": 2 * float(u) / (len(groups[i]) * len(groups[j])) - 1})
    padj = multipletests([p["p"] for p in pairs], method=SM_METHOD[case["adjust"]])[1]
    for p, a in zip(pairs, padj):
        p["pAdj"] = float(a)
    return {"meanRanks": mean_ranks, "pairs": pairs}


def welch_control(case):
    groups = [np.asarray(g, float) for g in case["groups"]]
    c = case["control"]
    ctrl = groups[c]
    out = []
    for i, g in enumerate(groups):
        if i == c:
            continue
        r = stats.ttest_ind(g, ctrl, equal_var=False)
        va, vc = g.var(ddof=1) / len(g), ctrl.var(ddof=1) / len(ctrl)
        df = (va + vc) ** 2 / (va ** 2 / (len(g) - 1) + vc ** 2 / (len(ctrl) - 1))
        out.append({"t": float(r.statistic), "p": float(r.pvalue), "df": df})
    padj = multipletests([o["p"] for o in out], method="holm")[1]
    for o, a in zip(out, padj):
        o["pAdj"] = float(a)
    return out


def hedges(case):
    a, b = np.asarray(case["a"], float), np.asarray(case["b"], float)
    df = len(a) + len(b) - 2
    sp = np.sqrt(((len(a) - 1) * a.var(ddof=1) + (len(b) - 1) * b.var(ddof=1)) / df)
    j = np.exp(special.gammaln(df / 2) - special.gammaln((df - 1) / 2)) / np.sqrt(df / 2)
    return {"d": (a.mean() - b.mean()) / sp, "g": j * (a.mean() - b.mean()) / sp}


def main():
    payload = json.load(sys.stdin)
    out = {"versions": {"scipy": scipy.__version__, "statsmodels": statsmodels.__version__, "numpy": np.__version__}}
    out["tukey"] = [tukey(c) for c in payload.get("tukey", [])]
    out["gamesHowell"] = [games_howell(c) for c in payload.get("gamesHowell", [])]
    out["dunn"] = [dunn(c) for c in payload.get("dunn", [])]
    out["welchControl"] = [welch_control(c) for c in payload.get("welchControl", [])]
    out["padjust"] = [multipletests(c["p"], method=SM_METHOD[c["method"]])[1].tolist() for c in payload.get("padjust", [])]
    out["hedges"] = [hedges(c) for c in payload.get("hedges", [])]
    json.dump(out, sys.stdout, default=float)


if __name__ == "__main__":
    main()
