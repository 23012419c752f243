"""Reference values for the assumption checks of @waymark/stats.

Reads JSON {"datasets": [{"id", "groups": [[...], ...]}], "samples": [{"id", "values": [...]}]}
from stdin, prints JSON. scipy.stats.levene(center="mean") is Levene (1960);
scipy.stats.levene(center="median") is Brown & Forsythe (1974); scipy.stats.bartlett is
Bartlett (1937); scipy.stats.shapiro is Royston's AS R94. Note: scipy 1.10.1's shapiro
returns single-precision (float32) W and p, so it can confirm about 7 significant digits.
"""
import json
import sys

import numpy as np
import scipy
from scipy import stats


def main():
    payload = json.load(sys.stdin)
    out = {"versions": {"scipy": scipy.__version__, "numpy": np.__version__}, "datasets": [], "samples": []}
    for ds in payload.get("datasets", []):
        groups = [np.array(g, dtype=float) for g in ds["groups"]]
        lm = stats.levene(*groups, center="mean")
        lmed = stats.levene(*groups, center="median")
        b = stats.bartlett(*groups)
        residuals = np.concatenate([g - g.mean() for g in groups])
        entry = {
            "id": ds["id"],
            "leveneMean": {"F": float(lm.statistic), "p": float(lm.pvalue)},
            "leveneMedian": {"F": float(lmed.statistic), "p": float(lmed.pvalue)},
            "bartlett": {"statistic": float(b.statistic), "p": float(b.pvalue)},
        }
        if 3 <= residuals.size <= 5000:
            sw = stats.shapiro(residuals)
            entry["shapiroResiduals"] = {"W": float(sw.statistic), "p": float(sw.pvalue)}
        out["datasets"].append(entry)
    for s in payload.get("samples", []):
        sw = stats.shapiro(np.array(s["values"], dtype=float))
        out["samples"].append({"id": s["id"], "W": float(sw.statistic), "p": float(sw.pvalue)})
    json.dump(out, sys.stdout)


main()
