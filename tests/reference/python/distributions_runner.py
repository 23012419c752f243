"""Reference values for the distribution functions of @waymark/stats.

Reads JSON from stdin, prints JSON. scipy.stats.studentized_range and scipy.stats.ncf give
the library values; mpmath (arbitrary precision) gives independent high-precision values
for far tails (infinite-df range, noncentral F series), where scipy's studentized_range.sf is computed as 1 - cdf.
"""
import json
import sys

import mpmath as mp
import scipy
from scipy import stats


def sr_sf_mp(q, k):
    """P(range of k standard normals > q) at 40 digits (the df = infinity case)."""
    mp.mp.dps = 40
    q = mp.mpf(q)
    inner = mp.quad(lambda z: mp.npdf(z) * (mp.ncdf(z + q) - mp.ncdf(z)) ** (k - 1),
                    [-mp.inf, -q - 4, -q, -q / 2, 0, 4, mp.inf])
    return 1 - k * inner


def ncf_mp(x, d1, d2, lam):
    """Noncentral F cdf and sf at 40 digits by the Poisson-weighted beta series."""
    mp.mp.dps = 25
    x, d1, d2, lam = mp.mpf(x), mp.mpf(d1), mp.mpf(d2), mp.mpf(lam)
    y = d1 * x / (d1 * x + d2)
    mu = lam / 2
    mode = int(mp.floor(mu))
    lo = max(0, mode - int(12 * mp.sqrt(mu + 1)) - 30)
    hi = mode + int(12 * mp.sqrt(mu + 1)) + 30
    cdf = mp.mpf(0)
    sf = mp.mpf(0)
    for j in range(lo, hi + 1):
        w = mp.exp(-mu + j * mp.log(mu) - mp.loggamma(j + 1)) if mu > 0 else mp.mpf(j == 0)
        cdf += w * mp.betainc(d1 / 2 + j, d2 / 2, 0, y, regularized=True)
        sf += w * mp.betainc(d1 / 2 + j, d2 / 2, y, 1, regularized=True)
    return [float(cdf), float(sf)]


def main():
    payload = json.load(sys.stdin)
    out = {"versions": {"scipy": scipy.__version__, "mpmath": mp.__version__}}
    out["sr"] = [[float(stats.studentized_range.cdf(q, k, df)), float(stats.studentized_range.sf(q, k, df))]
                 for q, k, df in payload.get("sr", [])]
    out["srPpf"] = [float(stats.studentized_range.ppf(p, k, df)) for p, k, df in payload.get("srPpf", [])]
    out["srMp"] = [float(sr_sf_mp(q, k)) for q, k in payload.get("srMp", [])]
    out["tSf"] = [float(stats.t.sf(t, df)) for t, df in payload.get("tSf", [])]
    out["ncf"] = [[float(stats.ncf.cdf(x, d1, d2, lam)), float(stats.ncf.sf(x, d1, d2, lam))]
                  for x, d1, d2, lam in payload.get("ncf", [])]
    out["ncfMp"] = [ncf_mp(x, d1, d2, lam) for x, d1, d2, lam in payload.get("ncfMp", [])]
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
