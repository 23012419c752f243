"""Reference values for planning (power, sample size) and the eta-squared interval.

Reads JSON from stdin, prints JSON. statsmodels.stats.power.FTestAnovaPower gives power and
sample size (its nobs is the TOTAL sample size); the eta-squared interval is inverted with
scipy.optimize.brentq on scipy.stats.ncf.cdf, independently of our root finder.
"""
import json
import sys

import scipy
import statsmodels
from scipy import optimize, stats
from statsmodels.stats.power import FTestAnovaPower


def eta_ci(case):
    f, d1, d2, level = case["F"], case["df1"], case["df2"], case["level"]
    alpha = 1 - level
    n = d1 + d2 + 1

    def lam(target):
        g = lambda nc: stats.ncf.cdf(f, d1, d2, nc) - target
        if stats.f.cdf(f, d1, d2) <= target:
            return 0.0
        hi = 10.0
        while g(hi) > 0:
            hi *= 2
        return optimize.brentq(g, 0, hi, xtol=1e-12, rtol=1e-14)

    lo, hi = lam(1 - alpha / 2), lam(alpha / 2)
    return {"lower": lo / (lo + n), "upper": hi / (hi + n), "lambdaLower": lo, "lambdaUpper": hi}


def main():
    payload = json.load(sys.stdin)
    an = FTestAnovaPower()
    out = {"versions": {"scipy": scipy.__version__, "statsmodels": statsmodels.__version__}}
    out["power"] = [float(an.power(effect_size=c["f"], nobs=c["nobs"], alpha=c["alpha"], k_groups=c["k"]))
                    for c in payload.get("power", [])]
    out["solve"] = [float(an.solve_power(effect_size=c["f"], nobs=None, alpha=c["alpha"], power=c["power"], k_groups=c["k"]))
                    for c in payload.get("solve", [])]
    out["etaCi"] = [eta_ci(c) for c in payload.get("etaCi", [])]
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
